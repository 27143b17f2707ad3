import type { Route } from "./+types/api.v1.me";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/** `GET /api/v1/me` → `{id, email, name, role}`. */
export const loader = apiHandler(async ({ request }: Route.LoaderArgs) => {
  const user = await requireUser(request);
  return Response.json({ id: user.id, email: user.email, name: user.name, role: user.role });
});

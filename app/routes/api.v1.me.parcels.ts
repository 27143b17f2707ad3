import type { Route } from "./+types/api.v1.me.parcels";
import { listAgentWork, toWorkItemJson } from "~/models/work-list.server";
import { WorkQuerySchema } from "~/schemas/decision-schemas";
import { ACCESS } from "~/utils/access";
import { apiError, zodDetails } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/** `GET /api/v1/me/parcels?status=a,b&projectId=&released=1` (land agent) → `{parcels: [...]}`: only the parcels assigned to you. */
export const loader = apiHandler(async ({ request }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.workList });
  const query = WorkQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) throw apiError("unprocessable", "The query has invalid fields.", zodDetails(query.error));
  const { status, projectId, released } = query.data;
  return Response.json({ parcels: listAgentWork(user.id, { status, projectId, includeReleased: released === "1" }).map(toWorkItemJson) });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));

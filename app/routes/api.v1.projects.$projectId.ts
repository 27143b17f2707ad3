import type { Route } from "./+types/api.v1.projects.$projectId";
import { findProjectForUser, toProjectJson } from "~/models/projects.server";
import { IdParamSchema } from "~/schemas/layer-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/** `GET /api/v1/projects/:projectId` → the project; 404 when the caller is not a member. */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const id = IdParamSchema.safeParse(params.projectId);
  const project = id.success ? findProjectForUser(id.data, user) : undefined;
  if (!project) throw apiError("not_found", "No such project, or you are not a member of it.");
  return Response.json(toProjectJson(project));
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));

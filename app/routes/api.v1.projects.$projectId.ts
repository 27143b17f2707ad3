import type { Route } from "./+types/api.v1.projects.$projectId";
import { ProjectPatchSchema, saveProjectTakeRules } from "~/models/project-rules.server";
import { toProjectJson } from "~/models/projects.server";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireProjectParam } from "~/utils/project-lookup.server";

/** `GET /api/v1/projects/:projectId` → the project; 404 when the caller is not a member. */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  return Response.json(toProjectJson(requireProjectParam(params.projectId, user)));
});

/**
 * `PATCH /api/v1/projects/:projectId {takeRules}` (planner or admin) → the project. Rules merge
 * key by key; `null` clears a rule back to the default; every alternative's impacts are then
 * recomputed under the new rules. Membership is checked before the body is read.
 */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  if (request.method.toUpperCase() !== "PATCH") throw apiError("method_not_allowed", "Use GET or PATCH on this path.", undefined, { Allow: "GET, PATCH" });
  const user = await requireUser(request, { roles: ACCESS.editProjectRules });
  const project = requireProjectParam(params.projectId, user);
  const body = await readJsonBody(request, ProjectPatchSchema);
  return Response.json(toProjectJson(saveProjectTakeRules(project, body.takeRules, user)));
});

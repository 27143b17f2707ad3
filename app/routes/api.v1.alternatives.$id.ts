import type { Route } from "./+types/api.v1.alternatives.$id";
import { readImpacts } from "~/models/alternative-impacts.server";
import { saveAlternativeChecked } from "~/models/alternative-service.server";
import { toAlternativeJson } from "~/models/alternatives.server";
import { AlternativeUpdateSchema } from "~/schemas/alternative-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/** `GET /api/v1/alternatives/:id` → alignment, corridor, rules, version, status and the summary of its impacts. */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  return Response.json(toAlternativeJson(alternative, { summary: readImpacts(alternative, project).summary }));
});

/** `PUT /api/v1/alternatives/:id {version, …changes}` → 200 with the new version, or 409 with the current one. */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "PUT");
  const user = await requireUser(request, { roles: ACCESS.editAlternatives });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const body = await readJsonBody(request, AlternativeUpdateSchema);
  const outcome = saveAlternativeChecked(alternative, project, body, user.id);
  if (outcome.kind === "conflict") {
    throw apiError("conflict", `This alternative was saved by someone else since version ${body.version}; it is now version ${outcome.current.version}. Reload it before saving again — nothing was overwritten.`, {
      yourVersion: body.version,
      currentVersion: outcome.current.version,
    });
  }
  return Response.json(toAlternativeJson(outcome.alternative, { summary: outcome.summary }));
});

import type { Route } from "./+types/api.v1.alternatives.$id.assignments";
import { assignParcels } from "~/models/parcel-assignments.server";
import { listProjectCases, toCaseJson } from "~/models/parcel-cases.server";
import { findPreferred } from "~/models/preferred-alternatives.server";
import { AssignmentsSchema } from "~/schemas/decision-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { publicBaseUrl } from "~/utils/env.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/** `GET /api/v1/alternatives/:id/assignments` → `{alternativeId, version, cases: [...]}` of the preferred alternative; 409 when it is not the preferred one. */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.decisions });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const preferred = findPreferred(project.id);
  if (!preferred || preferred.alternativeId !== alternative.id) throw apiError("conflict", `${alternative.name} is not the project's preferred alternative.`);
  return Response.json({ alternativeId: alternative.id, version: preferred.version, units: project.units, cases: listProjectCases(project.id).map(toCaseJson) });
});

/**
 * `PUT /api/v1/alternatives/:id/assignments {assignments: [{parcelId, agentEmail}]}` or `{split: "even", parcelIds?}`
 * (manager) → 200 `{changed, notified, cases}`; every agent whose list changed is mailed.
 */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "PUT");
  const user = await requireUser(request, { roles: ACCESS.assignParcels });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const body = await readJsonBody(request, AssignmentsSchema);
  const outcome = assignParcels(alternative, project, body, user, publicBaseUrl(request));
  return Response.json({ alternativeId: alternative.id, version: outcome.preferred.version, changed: outcome.changed, notified: outcome.mailed.length, cases: outcome.cases.map(toCaseJson) });
});

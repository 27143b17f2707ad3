import type { Route } from "./+types/api.v1.alternatives.$id.sweep";
import { sweepCurve } from "~/calculations/curve-sweep";
import { evaluationInputsOf, takeSessionFor } from "~/models/alternative-impacts.server";
import { SweepSchema } from "~/schemas/alternative-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/**
 * `POST /api/v1/alternatives/:id/sweep {pointIndex, vary, from, to, steps}` →
 * `{steps: [{value, takeArea, estimatedCost, parcelsAffected, displacements, checks}], minimumRadius}`.
 * Nothing is saved: the planner applies the value they choose with a normal PUT.
 */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const user = await requireUser(request, { roles: ACCESS.projects });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const body = await readJsonBody(request, SweepSchema);
  const result = sweepCurve(evaluationInputsOf(alternative, project), body, takeSessionFor(project));
  return Response.json({ alternativeId: alternative.id, version: alternative.version, pointIndex: body.pointIndex, vary: body.vary, ...result });
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

import type { Route } from "./+types/api.v1.alternatives.$id.preview";
import { toParcelImpactJson } from "~/calculations/impact-json";
import { computeTakeOutlines } from "~/calculations/take-outlines";
import { evaluationInputsOf, landSessionFor } from "~/models/alternative-impacts.server";
import { evaluateAlternative } from "~/calculations/evaluate-alternative";
import { AlternativePreviewSchema } from "~/schemas/alternative-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/**
 * `POST /api/v1/alternatives/:id/preview {alignment, corridor?, rules?, designSpeed?, speedUnit?, emaxPercent?, acceptedChecks?}` → the alignment's
 * geometry and checks, the takes and summary, and drawable outlines, for inputs not yet saved.
 */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const user = await requireUser(request, { roles: ACCESS.projects });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const body = await readJsonBody(request, AlternativePreviewSchema);
  const inputs = evaluationInputsOf(
    {
      alignment: body.alignment,
      corridor: body.corridor ?? alternative.corridor,
      rules: body.rules ?? alternative.rules,
      designSpeed: body.designSpeed ?? alternative.designSpeed,
      speedUnit: body.speedUnit ?? alternative.speedUnit,
      emaxPercent: body.emaxPercent ?? alternative.emaxPercent,
      acceptedChecks: body.acceptedChecks ?? alternative.acceptedChecks,
    },
    project,
  );
  const { session, land } = landSessionFor(project);
  const evaluation = evaluateAlternative(inputs, session);
  const { elements, curves, stations, length, centerline } = evaluation.geometry;
  return Response.json({
    geometry: { length, elements, curves, stations },
    centerline,
    checks: evaluation.checks,
    staleAcceptances: evaluation.staleAcceptances,
    summary: evaluation.summary,
    parcels: evaluation.takes.parcels.map(toParcelImpactJson),
    warnings: evaluation.takes.warnings,
    outlines: body.geometry ? computeTakeOutlines(elements, inputs.corridor, evaluation.takes.parcels, land.parcels) : null,
  });
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

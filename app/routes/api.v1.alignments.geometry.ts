import type { Route } from "./+types/api.v1.alignments.geometry";
import { applyCheckAcceptances } from "~/calculations/check-acceptances";
import { computeAlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import { AlignmentGeometryRequestSchema } from "~/schemas/alignment-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/**
 * `POST /api/v1/alignments/geometry {alignment, design?, offsets?, chordTolerance?}` →
 * `{elements, length, stations, checks, centerline, curves, offsets}` in the alignment's units.
 */
export const action = apiHandler(async ({ request }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  await requireUser(request, { roles: ACCESS.calculator });
  const body = await readJsonBody(request, AlignmentGeometryRequestSchema);
  const geometry = computeAlignmentGeometry(body.alignment, { design: body.design, offsets: body.offsets, chordTolerance: body.chordTolerance });
  const reviewed = applyCheckAcceptances(geometry.checks, body.acceptedChecks);
  return Response.json({ ...geometry, checks: reviewed.checks, staleAcceptances: reviewed.stale });
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

import type { Route } from "./+types/api.v1.alternatives.$id.decision";
import { STATE_LABELS } from "~/calculations/alternative-lifecycle";
import { toAlternativeJson } from "~/models/alternatives.server";
import { decideAlternative } from "~/models/decisions.server";
import { DecisionSchema } from "~/schemas/decision-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { publicBaseUrl } from "~/utils/env.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/**
 * `POST /api/v1/alternatives/:id/decision {decision: "approve" | "return", comment, version?, split?, assignments?}`
 * (manager) → 200 `{alternative, decision, preferred, parcels, notified}`; 409 unless it awaits a decision
 * (also when another manager decided first).
 */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const user = await requireUser(request, { roles: ACCESS.decideAlternatives });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const body = await readJsonBody(request, DecisionSchema);
  const assign = body.split ? { split: body.split } : body.assignments?.length ? { assignments: body.assignments } : undefined;
  const outcome = decideAlternative(alternative, project, user, { decision: body.decision, comment: body.comment, version: body.version, assign }, publicBaseUrl(request));
  const p = outcome.preferred;
  return Response.json({
    alternative: toAlternativeJson(outcome.alternative, { statusLabel: STATE_LABELS[outcome.alternative.status] }),
    decision: body.decision,
    preferred: p ? { id: p.id, alternativeId: p.alternativeId, version: p.version, takeResultId: p.takeResultId, approvedAt: p.approvedAt.toISOString(), comment: p.comment } : null,
    parcels: outcome.parcels,
    notified: outcome.mailed.length,
  });
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

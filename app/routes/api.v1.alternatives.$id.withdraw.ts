import type { Route } from "./+types/api.v1.alternatives.$id.withdraw";
import { STATE_LABELS } from "~/calculations/alternative-lifecycle";
import { toAlternativeJson } from "~/models/alternatives.server";
import { withdrawSubmission } from "~/models/decisions.server";
import { WithdrawSchema } from "~/schemas/decision-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/** `POST /api/v1/alternatives/:id/withdraw {comment?}` (planner) → 200 the alternative, back to draft; 409 unless it awaits a decision. */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const user = await requireUser(request, { roles: ACCESS.submitAlternatives });
  const { alternative } = requireAlternativeParam(params.id, user);
  const body = await readJsonBody(request, WithdrawSchema);
  const { alternative: withdrawn } = withdrawSubmission(alternative, user, body.comment);
  return Response.json(toAlternativeJson(withdrawn, { statusLabel: STATE_LABELS[withdrawn.status] }));
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

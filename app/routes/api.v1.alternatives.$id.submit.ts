import type { Route } from "./+types/api.v1.alternatives.$id.submit";
import { STATE_LABELS } from "~/calculations/alternative-lifecycle";
import { toAlternativeJson } from "~/models/alternatives.server";
import { submitAlternative } from "~/models/decisions.server";
import { SubmitSchema } from "~/schemas/decision-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { publicBaseUrl } from "~/utils/env.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/** `POST /api/v1/alternatives/:id/submit {comment?}` (planner) → 200 the alternative, now awaiting a decision; 409 from any other state than draft or returned. */
export const action = apiHandler(async ({ request, params }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const user = await requireUser(request, { roles: ACCESS.submitAlternatives });
  const { alternative, project } = requireAlternativeParam(params.id, user);
  const body = await readJsonBody(request, SubmitSchema);
  const { alternative: submitted, summary } = submitAlternative(alternative, project, user, body.comment, publicBaseUrl(request));
  return Response.json(toAlternativeJson(submitted, { statusLabel: STATE_LABELS[submitted.status], summary }));
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

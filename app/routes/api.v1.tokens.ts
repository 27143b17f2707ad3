import type { Route } from "./+types/api.v1.tokens";
import { issueApiToken } from "~/models/api-tokens.server";
import { recordAuditEvent } from "~/models/audit.server";
import { TokenRequestSchema } from "~/schemas/account-schemas";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { SignInError, verifyCredentials } from "~/utils/auth.server";

/** `POST /api/v1/tokens {email, password, label?}` → `201 {token}`; the token is shown only here. */
export const action = apiHandler(async ({ request }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const body = await readJsonBody(request, TokenRequestSchema);
  let user;
  try {
    user = await verifyCredentials(body.email, body.password);
  } catch (error) {
    if (!(error instanceof SignInError)) throw error;
    if (error.retryAfterSeconds) {
      return apiError("too_many_requests", error.message, undefined, { "Retry-After": String(error.retryAfterSeconds) });
    }
    return apiError("unauthorized", error.message);
  }
  const label = body.label ?? `API token ${new Date().toISOString().slice(0, 10)}`;
  const { id, token } = issueApiToken(user.id, label);
  recordAuditEvent({ actorId: user.id, action: "api-token.created", subject: label, details: { tokenId: id } });
  return Response.json({ token, id, label }, { status: 201 });
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

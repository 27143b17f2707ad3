import type { Route } from "./+types/api.v1.invitations";
import { AccountConflictError, inviteUser } from "~/models/accounts.server";
import { InviteSchema } from "~/schemas/account-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { publicBaseUrl } from "~/utils/env.server";
import { requireUser } from "~/utils/permissions.server";

/** `POST /api/v1/invitations {email, role}` (admin) → `201`; the invitation mail is queued with it. */
export const action = apiHandler(async ({ request }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  const admin = await requireUser(request, { roles: ACCESS.manageUsers });
  const body = await readJsonBody(request, InviteSchema);
  try {
    const invited = inviteUser(body, admin, publicBaseUrl(request));
    return Response.json({ ...invited, status: "invited" }, { status: 201 });
  } catch (error) {
    if (error instanceof AccountConflictError) return apiError("conflict", error.message);
    throw error;
  }
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

import type { Route } from "./+types/api.v1.curves.compound";
import { buildCompoundCurveReport } from "~/calculations/compound-curve-report";
import { CompoundCurveRequestSchema } from "~/schemas/curve-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/** `POST /api/v1/curves/compound {units, given: {...}, pcStation?}` → `{solutions: [...]}` or 422 naming what is missing or in conflict. */
export const action = apiHandler(async ({ request }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  await requireUser(request, { roles: ACCESS.calculator });
  const body = await readJsonBody(request, CompoundCurveRequestSchema);
  return Response.json(buildCompoundCurveReport(body));
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

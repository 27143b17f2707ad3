import type { Route } from "./+types/api.v1.curves.simple";
import { buildSimpleCurveReport } from "~/calculations/simple-curve-report";
import { SimpleCurveRequestSchema } from "~/schemas/curve-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/** `POST /api/v1/curves/simple {units, radius | degree + definition, delta, piStation?, stakingInterval?}`. */
export const action = apiHandler(async ({ request }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  await requireUser(request, { roles: ACCESS.calculator });
  const body = await readJsonBody(request, SimpleCurveRequestSchema);
  return Response.json(buildSimpleCurveReport(body));
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

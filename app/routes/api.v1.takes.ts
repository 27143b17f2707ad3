import type { Route } from "./+types/api.v1.takes";
import { readBuildingFeatures, readParcelFeatures, type LandProblem } from "~/calculations/feature-collection-land";
import { toParcelImpactJson } from "~/calculations/impact-json";
import { computeTakeOutlines } from "~/calculations/take-outlines";
import { resolveTakeRules } from "~/calculations/take-rules";
import { buildAlignment } from "~/geometry/build-alignment";
import { computeTakes } from "~/geometry/take-compute";
import { StatelessTakesSchema } from "~/schemas/alternative-schemas";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler, readJsonBody, requireMethod } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/** Parcel sets for scripts can be large: up to 16 MB of GeoJSON. */
const MAX_TAKES_BODY = 16 * 1024 * 1024;

/**
 * `POST /api/v1/takes {units, alignment, corridor, parcels, buildings?, rules?}` → `{corridorArea,
 * parcels, totals}`; `?geometry=true` adds the corridor and each take's polygon. Stores nothing.
 */
export const action = apiHandler(async ({ request }: Route.ActionArgs) => {
  requireMethod(request, "POST");
  await requireUser(request, { roles: ACCESS.takesApi });
  const body = await readJsonBody(request, StatelessTakesSchema, MAX_TAKES_BODY);
  const problems: LandProblem[] = [];
  const parcels = readParcelFeatures(body.parcels.features, problems);
  const buildings = readBuildingFeatures(body.buildings?.features ?? [], problems);
  if (problems.length) throw apiError("unprocessable", "Some parcels or buildings cannot be used.", problems.slice(0, 100));
  const elements = buildAlignment({ ...body.alignment, units: body.units }).elements;
  const rules = resolveTakeRules(body.units, body.rules);
  const result = computeTakes({ elements, corridor: body.corridor, parcels, buildings, rules });
  const withGeometry = new URL(request.url).searchParams.get("geometry") === "true";
  return Response.json({
    units: body.units,
    corridorArea: result.corridorArea,
    easementArea: result.easementArea,
    parcels: result.parcels.map(toParcelImpactJson),
    totals: result.totals,
    warnings: result.warnings,
    corridorSelfOverlaps: result.corridorSelfOverlaps,
    ...(withGeometry ? { geometry: computeTakeOutlines(elements, body.corridor, result.parcels, parcels) } : {}),
  });
});

export const loader = apiHandler(async () => apiError("method_not_allowed", "Use POST on this path.", undefined, { Allow: "POST" }));

import type { Route } from "./+types/api.v1.alternatives.$id.impacts";
import { toParcelImpactJson } from "~/calculations/impact-json";
import { downloadAlternativeImpacts, readImpactQuery } from "~/documents/impact-downloads.server";
import { readImpacts } from "~/models/alternative-impacts.server";
import { ACCESS } from "~/utils/access";
import { apiError } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";
import { requireAlternativeParam } from "~/utils/project-lookup.server";

/**
 * `GET /api/v1/alternatives/:id/impacts` → `{summary, parcels: [...]}`, in the project's units;
 * `?format=csv|xlsx|geojson|shapefile` streams the impact table as that file instead.
 */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const query = readImpactQuery(request);
  const { alternative, project } = requireAlternativeParam(params.id, user);
  if (query.format !== "json") return downloadAlternativeImpacts(alternative, project, { ...query, format: query.format });
  const impacts = readImpacts(alternative, project);
  return Response.json({
    alternativeId: alternative.id,
    version: impacts.version,
    units: project.units,
    computedAt: impacts.computedAt.toISOString(),
    summary: impacts.summary,
    parcels: impacts.parcels.map(toParcelImpactJson),
  });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));

import type { Route } from "./+types/api.v1.layers.$layerId.features";
import { listLayerFeatures } from "~/models/layer-features.server";
import { findLayerForUser } from "~/models/layers.server";
import { FeatureQuerySchema, IdParamSchema } from "~/schemas/layer-schemas";
import { ACCESS } from "~/utils/access";
import { apiError, zodDetails } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/**
 * `GET /api/v1/layers/:layerId/features?crs=working|wgs84&bbox=minx,miny,maxx,maxy` → a GeoJSON
 * FeatureCollection (bbox in the requested CRS, searched through the R*Tree); 404 for non-members.
 */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const query = FeatureQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) throw apiError("unprocessable", "The query has invalid fields.", zodDetails(query.error));
  const id = IdParamSchema.safeParse(params.layerId);
  const found = id.success ? findLayerForUser(id.data, user) : undefined;
  if (!found) throw apiError("not_found", "No such layer, or you are not a member of its project.");
  return Response.json(listLayerFeatures(found.layer, found.project, query.data), { headers: { "Content-Type": "application/geo+json" } });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));

import type { Route } from "./+types/api.v1.layers.$layerId.features";
import { listLayerFeatures } from "~/models/layer-features.server";
import { findLayerForUser } from "~/models/layers.server";
import { z } from "zod";
import { MAX_SEARCH_HITS } from "~/models/layer-search.server";
import { FeatureQuerySchema, IdParamSchema } from "~/schemas/layer-schemas";
import { ACCESS } from "~/utils/access";
import { apiError, zodDetails } from "~/utils/api-error.server";
import { apiHandler } from "~/utils/api-route.server";
import { requireUser } from "~/utils/permissions.server";

/** The features query plus a search over the whole layer: `q` (2-100 characters) and `limit` (1-50, default 50). */
const SearchQuerySchema = FeatureQuerySchema.extend({
  q: z.string().trim().min(2, "Search with at least 2 characters.").max(100).optional(),
  limit: z.coerce.number().int().min(1).max(MAX_SEARCH_HITS).optional(),
});

/**
 * `GET /api/v1/layers/:layerId/features?crs=working|wgs84&bbox=minx,miny,maxx,maxy&q=&limit=` → a
 * GeoJSON FeatureCollection (bbox in the requested CRS, searched through the R*Tree); with `q`,
 * the parcels whose ID, owner or address contain it, best first, each with its `bbox`; 404 for non-members.
 */
export const loader = apiHandler(async ({ request, params }: Route.LoaderArgs) => {
  const user = await requireUser(request, { roles: ACCESS.projects });
  const query = SearchQuerySchema.safeParse(Object.fromEntries(new URL(request.url).searchParams));
  if (!query.success) throw apiError("unprocessable", "The query has invalid fields.", zodDetails(query.error));
  const id = IdParamSchema.safeParse(params.layerId);
  const found = id.success ? findLayerForUser(id.data, user) : undefined;
  if (!found) throw apiError("not_found", "No such layer, or you are not a member of its project.");
  return Response.json(listLayerFeatures(found.layer, found.project, query.data), { headers: { "Content-Type": "application/geo+json" } });
});

export const action = apiHandler(async () => apiError("method_not_allowed", "Use GET on this path.", undefined, { Allow: "GET" }));

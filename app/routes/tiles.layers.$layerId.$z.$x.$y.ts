import { isRouteErrorResponse } from "react-router";
import type { Route } from "./+types/tiles.layers.$layerId.$z.$x.$y";
import { findLayerForUser } from "~/models/layers.server";
import { readLayerTile } from "~/models/layer-tiles.server";
import { TileParamsSchema } from "~/schemas/layer-schemas";
import { ACCESS } from "~/utils/access";
import { requireUser } from "~/utils/permissions.server";

const MVT_TYPE = "application/vnd.mapbox-vector-tile";

/**
 * requireUser answers pages with a sign-in redirect or a 403 page; a map's tile request wants
 * neither, so both become bare 401/403 answers the map can ignore.
 */
async function requireTileUser(request: Request) {
  try {
    return await requireUser(request, { roles: ACCESS.projects });
  } catch (thrown) {
    if (thrown instanceof Response) throw new Response(null, { status: thrown.status >= 300 && thrown.status < 400 ? 401 : thrown.status });
    const status = isRouteErrorResponse(thrown) ? thrown.status : (thrown as { init?: { status?: number } })?.init?.status;
    throw new Response(null, { status: status ?? 403 });
  }
}

/**
 * `GET /tiles/layers/:layerId/:z/:x/:y.pbf`: one Mapbox Vector Tile 2.1 of a layer for project
 * members (404 otherwise), 204 when empty, `ETag` with `If-None-Match` → 304.
 */
export async function loader({ request, params }: Route.LoaderArgs) {
  const user = await requireTileUser(request);
  const parsed = TileParamsSchema.safeParse(params);
  if (!parsed.success) return new Response(null, { status: 404 });
  const { layerId, z, x, y } = parsed.data;
  const found = findLayerForUser(layerId, user);
  if (!found) return new Response(null, { status: 404 });
  const tile = readLayerTile(found.layer, found.project, z, x, y);
  // Members only, so caches may keep tiles for this browser alone, and must revalidate.
  const headers = { "Cache-Control": "private, no-cache", Vary: "Cookie" };
  if (!tile) return new Response(null, { status: 204, headers });
  if (request.headers.get("If-None-Match")?.split(/\s*,\s*/).includes(tile.etag)) {
    return new Response(null, { status: 304, headers: { ...headers, ETag: tile.etag } });
  }
  return new Response(new Uint8Array(tile.bytes), { headers: { ...headers, ETag: tile.etag, "Content-Type": MVT_TYPE } });
}

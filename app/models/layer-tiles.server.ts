import { createHash } from "node:crypto";
import { eq } from "drizzle-orm";
import type { Feature, FeatureCollection } from "geojson";
import { buildings, parcels } from "~/db/schema";
import { buildTileIndex, encodeTile, type TileIndex } from "~/fabric/index.server";
import { db, type Db } from "~/utils/db.server";
import type { Layer } from "./layers.server";

/** Indexes kept in memory; the oldest used is dropped past this many layers. */
const MAX_CACHED_LAYERS = 8;
const cache = new Map<number, TileIndex>();

/** MVT properties cannot be null (MVT 2.1 §4.5.1 values are typed), so absent values are left out. */
function withoutNulls(props: Record<string, string | number | null>): Record<string, string | number> {
  return Object.fromEntries(Object.entries(props).filter(([, v]) => v !== null)) as Record<string, string | number>;
}

function layerFeaturesWgs84(layer: Layer, tx: Db): FeatureCollection {
  const features: Feature[] =
    layer.kind === "parcels"
      ? tx.select({ id: parcels.id, g: parcels.geometryWgs84, parcelId: parcels.parcelId, owner: parcels.owner, landUse: parcels.landUse, landValue: parcels.landValue, area: parcels.area })
          .from(parcels).where(eq(parcels.layerId, layer.id)).all()
          .map(({ id, g, ...props }) => ({ type: "Feature", id, geometry: JSON.parse(g), properties: withoutNulls(props) }))
      : tx.select({ id: buildings.id, g: buildings.geometryWgs84, parcelId: buildings.parcelId, value: buildings.value, area: buildings.area })
          .from(buildings).where(eq(buildings.layerId, layer.id)).all()
          .map(({ id, g, ...props }) => ({ type: "Feature", id, geometry: JSON.parse(g), properties: withoutNulls(props) }));
  return { type: "FeatureCollection", features };
}

function indexFor(layer: Layer, tx: Db): TileIndex {
  let index = cache.get(layer.id);
  if (index) cache.delete(layer.id);
  else index = buildTileIndex(layerFeaturesWgs84(layer, tx));
  cache.set(layer.id, index);
  while (cache.size > MAX_CACHED_LAYERS) cache.delete(cache.keys().next().value!);
  return index;
}

/** Drops a layer's cached tile index; call whenever the layer's rows or status change. */
export function forgetLayerTiles(layerId: number): void {
  cache.delete(layerId);
}

/**
 * One Mapbox Vector Tile of a layer (source layer named by its kind) with an ETag from the
 * bytes, or null for a tile no feature touches.
 */
export function readLayerTile(layer: Layer, z: number, x: number, y: number, tx: Db = db()): { bytes: Uint8Array; etag: string } | null {
  const bytes = encodeTile(indexFor(layer, tx), z, x, y, layer.kind);
  if (!bytes) return null;
  return { bytes, etag: `"${createHash("sha256").update(bytes).digest("base64url").slice(0, 27)}"` };
}

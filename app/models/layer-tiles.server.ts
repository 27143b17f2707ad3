import { createHash } from "node:crypto";
import { countInTile, encodeTileFeatures, indexOverview, isTileInPyramid, overviewTile, sliceTile, TileCache, tileBoundsWgs84, type CachedTile, type OverviewIndex, type TileFeature } from "~/fabric/index.server";
import { db, type Db } from "~/utils/db.server";
import { workingProj4 } from "./layer-envelope.server";
import { overviewItems, tileFeaturesById, tileFeaturesInBox } from "./layer-tile-sources.server";
import type { Layer } from "./layers.server";

/**
 * Zooms up to this one may draw the generalised overview (small parcels coalesced into 4-px
 * cells, see `overviewTile`); deeper zooms draw every parcel. At z12 a 20 m lot is under 2 px.
 */
export const OVERVIEW_MAX_ZOOM = 12;
/**
 * An overview tile that would hold no more features than this draws every feature spanning 8
 * tile units (1 px) or more exactly, and coalesces only smaller ones, which geojson-vt would
 * drop: about 150 ms of slicing and encoding (scripts/bench-fabric.ts). So a town-sized layer
 * keeps its parcels at the zoom that shows the town, and only a dense county is generalised.
 */
export const OVERVIEW_EXACT_BUDGET = 8000;
const EXACT_KEEP_UNITS = 8;
/** Layers whose overview index stays in memory; the least recently used is dropped past this. */
const MAX_OVERVIEW_LAYERS = 8;
/** Encoded tiles kept, by bytes, across all layers. */
const TILE_CACHE_BYTES = 96 * 1024 * 1024;

const overviews = new Map<number, OverviewIndex>();
const tiles = new TileCache(TILE_CACHE_BYTES);

function overviewFor(layer: Layer, working: string | undefined, tx: Db): OverviewIndex {
  let index = overviews.get(layer.id);
  if (index) overviews.delete(layer.id);
  else index = indexOverview(overviewItems(layer, working, tx));
  overviews.set(layer.id, index);
  while (overviews.size > MAX_OVERVIEW_LAYERS) overviews.delete(overviews.keys().next().value!);
  return index;
}

/** The features of tile z/x/y: every feature at detail zooms; cells plus the large features at overview zooms. */
function tileFeatures(layer: Layer, working: string | undefined, z: number, x: number, y: number, tx: Db): TileFeature[] {
  if (z > OVERVIEW_MAX_ZOOM) return sliceTile(tileFeaturesInBox(layer, working, tileBoundsWgs84(z, x, y), tx), z, x, y);
  const index = overviewFor(layer, working, tx);
  const keepUnits = countInTile(index, z, x, y) <= OVERVIEW_EXACT_BUDGET ? EXACT_KEEP_UNITS : undefined;
  const { cells, wholeIds } = overviewTile(index, z, x, y, keepUnits === undefined ? {} : { keepUnits });
  return [...cells, ...sliceTile(tileFeaturesById(layer, wholeIds, tx), z, x, y)];
}

/** Drops a layer's overview index and cached tiles; call whenever the layer's rows or status change. */
export function forgetLayerTiles(layerId: number): void {
  overviews.delete(layerId);
  tiles.forgetLayer(layerId);
}

/**
 * One Mapbox Vector Tile of a layer (source layer named by its kind) with an ETag from the
 * bytes, or null for a tile no feature touches. Detail tiles are sliced from the rows the
 * R*Tree finds under the tile; encoded tiles are cached until the layer is forgotten.
 */
export function readLayerTile(layer: Layer, project: { crs: string | null }, z: number, x: number, y: number, tx: Db = db()): CachedTile {
  if (!isTileInPyramid(z, x, y)) return null;
  const key = `${layer.id}/${z}/${x}/${y}`;
  const cached = tiles.get(key);
  if (cached !== undefined) return cached;
  const bytes = encodeTileFeatures(tileFeatures(layer, workingProj4(project), z, x, y, tx), layer.kind);
  const tile = bytes ? { bytes, etag: `"${createHash("sha256").update(bytes).digest("base64url").slice(0, 27)}"` } : null;
  tiles.set(key, tile);
  return tile;
}

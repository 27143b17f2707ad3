import { geoJSONToTile, type GeoJSONVTFeature } from "@maplibre/geojson-vt";
import { fromGeojsonVt } from "@maplibre/vt-pbf";
import type { FeatureCollection } from "geojson";

/** MVT extent (tile coordinate units per side) used for both slicing and encoding. */
export const TILE_EXTENT = 4096;
/** Tile units drawn beyond each edge, so outlines do not stop short at tile seams. */
export const TILE_BUFFER = 64;

/** One feature of a tile in tile coordinates (geojson-vt's tile format: type 3 = polygon). */
export type TileFeature = GeoJSONVTFeature;

/** True when z/x/y names a tile of the XYZ pyramid (integers, 0 ≤ x, y < 2^z). */
export function isTileInPyramid(z: number, x: number, y: number): boolean {
  const max = 2 ** z;
  return Number.isInteger(z) && z >= 0 && Number.isInteger(x) && Number.isInteger(y) && x >= 0 && y >= 0 && x < max && y < max;
}

/**
 * WGS84 bounds [west, south, east, north] in degrees of tile z/x/y grown by `bufferUnits`
 * tile units on each side (spherical Web Mercator, OpenStreetMap wiki "Slippy map tilenames").
 */
export function tileBoundsWgs84(z: number, x: number, y: number, bufferUnits = TILE_BUFFER): [number, number, number, number] {
  const n = 2 ** z;
  const pad = bufferUnits / TILE_EXTENT;
  const lon = (tx: number) => (tx / n) * 360 - 180;
  const lat = (ty: number) => (Math.atan(Math.sinh(Math.PI * (1 - (2 * ty) / n))) * 180) / Math.PI;
  return [lon(x - pad), lat(Math.min(n, y + 1 + pad)), lon(x + 1 + pad), lat(Math.max(0, y - pad))];
}

/**
 * Slices WGS84 (lon/lat, RFC 7946) features into tile z/x/y with geojson-vt: clipped to the
 * tile plus its buffer, simplified by geojson-vt's default 3 tile units below zoom 20 (about
 * 0.04 m per unit at the equator there), rings wound as MVT 2.1 §4.3.4.4 requires.
 */
export function sliceTile(featuresWgs84: FeatureCollection, z: number, x: number, y: number): TileFeature[] {
  if (featuresWgs84.features.length === 0) return [];
  const tile = geoJSONToTile(featuresWgs84, z, x, y, { maxZoom: 20, extent: TILE_EXTENT, buffer: TILE_BUFFER, clip: true });
  return tile?.features ?? [];
}

/**
 * Encodes tile features as Mapbox Vector Tile 2.1 bytes with one layer named `layerName`, or
 * null when there are none (the route then answers 204 instead of sending an empty tile).
 */
export function encodeTileFeatures(features: TileFeature[], layerName: string): Uint8Array | null {
  if (features.length === 0) return null;
  return fromGeojsonVt({ [layerName]: { features } as never }, { version: 2, extent: TILE_EXTENT });
}

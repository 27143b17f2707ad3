import { GeoJSONVT, type GeoJSONVTOptions } from "@maplibre/geojson-vt";
import { fromGeojsonVt } from "@maplibre/vt-pbf";
import type { FeatureCollection } from "geojson";

/** MVT extent (tile coordinate units per side) used for both slicing and encoding. */
export const TILE_EXTENT = 4096;

/** A sliced tile pyramid for one layer; opaque to callers. */
export type TileIndex = GeoJSONVT;

/**
 * Slices a WGS84 (lon/lat, RFC 7946) FeatureCollection into a geojson-vt tile
 * index. Parcels are small, so tiles are kept down to zoom 20 (about 0.04 m
 * per tile unit at the equator) and simplification stays at geojson-vt's
 * default tolerance of 3 tile units.
 */
export function buildTileIndex(featureCollectionWgs84: FeatureCollection, options: GeoJSONVTOptions = {}): TileIndex {
  return new GeoJSONVT(featureCollectionWgs84, { maxZoom: 20, indexMaxZoom: 5, extent: TILE_EXTENT, buffer: 64, ...options, debug: 0 });
}

/**
 * Encodes tile z/x/y (XYZ scheme, y down) as Mapbox Vector Tile 2.1 bytes
 * with one layer named `layerName`, or null when no feature touches the tile
 * (the route then answers 204 instead of sending an empty tile).
 */
export function encodeTile(index: TileIndex, z: number, x: number, y: number, layerName: string): Uint8Array | null {
  const max = 2 ** z;
  if (!Number.isInteger(z) || z < 0 || !Number.isInteger(x) || !Number.isInteger(y) || x < 0 || y < 0 || x >= max || y >= max) return null;
  const tile = index.getTile(z, x, y);
  if (!tile || tile.features.length === 0) return null;
  return fromGeojsonVt({ [layerName]: tile }, { version: 2, extent: TILE_EXTENT });
}

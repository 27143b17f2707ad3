/**
 * Pre-builds the basemap as Mapbox Vector Tiles 2.1 (one file per tile,
 * XYZ scheme) with @maplibre/geojson-vt and @maplibre/vt-pbf, for zooms
 * 10–16 over the demo extent only. The app serves them as static files, so
 * the map needs no network. A tile inside the extent with no feature is a
 * 0-byte file (a valid empty MVT): no bytes, and no 404 for the browser to
 * log as an error; tiles outside the extent are never requested (source bounds).
 */
import { mkdirSync, rmSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { GeoJSONVT } from "@maplibre/geojson-vt";
import { fromGeojsonVt } from "@maplibre/vt-pbf";
import type { BasemapLayers } from "./basemap-features";

export const MIN_ZOOM = 10;
export const MAX_ZOOM = 16;
const EXTENT = 4096;

const lonToX = (lon: number, z: number) => Math.floor(((lon + 180) / 360) * 2 ** z);
const latToY = (lat: number, z: number) => {
  const r = (lat * Math.PI) / 180;
  return Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * 2 ** z);
};

/** [west, south, east, north] of every coordinate in the layers. */
export function layersBounds(layers: BasemapLayers): [number, number, number, number] {
  const b: [number, number, number, number] = [180, 90, -180, -90];
  const visit = (c: unknown): void => {
    if (Array.isArray(c) && typeof c[0] === "number") {
      const [x, y] = c as [number, number];
      [b[0], b[1], b[2], b[3]] = [Math.min(b[0], x), Math.min(b[1], y), Math.max(b[2], x), Math.max(b[3], y)];
    } else if (Array.isArray(c)) c.forEach(visit);
  };
  for (const fc of Object.values(layers)) for (const f of fc.features) if (f.geometry.type !== "GeometryCollection") visit(f.geometry.coordinates);
  return b;
}

/** Writes dir/{z}/{x}/{y}.pbf, replacing what was there; returns counts (tiles with features, empty files) and bytes. */
export function writeBasemapTiles(layers: BasemapLayers, dir: string): { tiles: number; empty: number; bytes: number } {
  rmSync(dir, { recursive: true, force: true });
  const indexes = Object.entries(layers).map(([name, fc]) => [name, new GeoJSONVT(fc, { maxZoom: MAX_ZOOM, indexMaxZoom: MAX_ZOOM, extent: EXTENT, buffer: 64, debug: 0 })] as const);
  const [w, s, e, n] = layersBounds(layers);
  let tiles = 0;
  let empty = 0;
  let bytes = 0;
  for (let z = MIN_ZOOM; z <= MAX_ZOOM; z++) {
    for (let x = lonToX(w, z); x <= lonToX(e, z); x++) {
      for (let y = latToY(n, z); y <= latToY(s, z); y++) {
        const found = Object.fromEntries(indexes.flatMap(([name, index]) => {
          const tile = index.getTile(z, x, y);
          return tile && tile.features.length > 0 ? [[name, tile]] : [];
        }));
        const pbf = Object.keys(found).length === 0 ? new Uint8Array(0) : fromGeojsonVt(found, { version: 2, extent: EXTENT });
        mkdirSync(join(dir, String(z), String(x)), { recursive: true });
        writeFileSync(join(dir, String(z), String(x), `${y}.pbf`), pbf);
        if (pbf.length === 0) empty++;
        else tiles++;
        bytes += pbf.length;
      }
    }
  }
  return { tiles, empty, bytes };
}

/**
 * The demo's upload files: parcels and building footprints as zipped
 * Shapefiles (EPSG:32617) and as RFC 7946 GeoJSON (WGS 84), named so a
 * planner can try the upload with either.
 */
import { mkdirSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import type { World } from "./world";
import { geojsonFromZip, shapefileZip } from "./write-shapefile";

export const PARCELS_LAYER = "quillmere-parcels";
export const BUILDINGS_LAYER = "quillmere-buildings";

/** The parcels' zip bytes, exactly as committed (used by the determinism test too). */
export const parcelsZip = (world: World): Buffer => shapefileZip(PARCELS_LAYER, world.parcels);
export const buildingsZip = (world: World): Buffer => shapefileZip(BUILDINGS_LAYER, world.buildings);

/** Writes the four files into dir; returns their names and sizes. */
export function writeDemoData(world: World, dir: string): Record<string, number> {
  mkdirSync(dir, { recursive: true });
  const sizes: Record<string, number> = {};
  for (const [layer, zip] of [[PARCELS_LAYER, parcelsZip(world)], [BUILDINGS_LAYER, buildingsZip(world)]] as const) {
    const geojson = geojsonFromZip(zip, layer);
    writeFileSync(join(dir, `${layer}.zip`), zip);
    writeFileSync(join(dir, `${layer}.geojson`), geojson);
    sizes[`${layer}.zip`] = zip.length;
    sizes[`${layer}.geojson`] = geojson.length;
  }
  return sizes;
}

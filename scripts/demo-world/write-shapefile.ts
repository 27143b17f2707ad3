/**
 * Writes features as a zipped ESRI Shapefile with GDAL's ogr2ogr (Debian
 * gdal-bin): the .prj is GDAL's ESRI WKT of EPSG:32617, the .cpg says UTF-8,
 * and the DBF header date is fixed so the bytes do not change from day to day.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import type { Feature } from "geojson";
import { zipFiles } from "./zip-files";

/** DBF "last update" written into every generated .dbf (the generator's fixed date, not the clock). */
export const DBF_DATE = "2026-01-01";
export const SHAPEFILE_PARTS = ["shp", "shx", "dbf", "prj", "cpg"] as const;

function ogr2ogr(args: string[]): void {
  try {
    execFileSync("ogr2ogr", args, { stdio: ["ignore", "pipe", "pipe"] });
  } catch (error) {
    const e = error as { code?: string; stderr?: Buffer };
    if (e.code === "ENOENT") throw new Error("ogr2ogr not found: install Debian's gdal-bin (apt-get install -y gdal-bin).");
    throw new Error(`ogr2ogr failed: ${e.stderr?.toString() ?? String(error)}`);
  }
}

/** Returns the zip bytes of layer `name` (files name.shp, name.shx, ...) holding the features in EPSG:32617. */
export function shapefileZip(name: string, features: Feature[]): Buffer {
  const dir = mkdtempSync(join(tmpdir(), "demo-world-"));
  try {
    const src = join(dir, "in.geojson");
    writeFileSync(src, JSON.stringify({ type: "FeatureCollection", features }));
    // Input coordinates are EPSG:32617 metres, not RFC 7946 degrees; -a_srs says so.
    ogr2ogr(["-f", "ESRI Shapefile", "-a_srs", "EPSG:32617", "-nln", name, "-lco", "ENCODING=UTF-8", "-lco", `DBF_DATE_LAST_UPDATE=${DBF_DATE}`, "-lco", "RESIZE=YES", join(dir, `${name}.shp`), src]);
    return zipFiles(SHAPEFILE_PARTS.map((ext) => ({ name: `${name}.${ext}`, data: readFileSync(join(dir, `${name}.${ext}`)) })));
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Converts a zipped layer to RFC 7946 GeoJSON (WGS 84, 7 decimals ≈ 1 cm) with ogr2ogr. */
export function geojsonFromZip(zip: Buffer, name: string): Buffer {
  const dir = mkdtempSync(join(tmpdir(), "demo-world-"));
  try {
    const src = join(dir, `${name}.zip`);
    writeFileSync(src, zip);
    const out = join(dir, `${name}.geojson`);
    ogr2ogr(["-f", "GeoJSON", "-t_srs", "EPSG:4326", "-lco", "RFC7946=YES", "-lco", "COORDINATE_PRECISION=7", "-lco", "WRITE_NAME=NO", out, `/vsizip/${src}`, name]);
    return readFileSync(out);
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/**
 * Test helpers for the impact exports: GDAL's ogrinfo/ogr2ogr (Debian gdal-bin) and GEOS via
 * shapely read what Takeline wrote. Used only by tests; nothing here ships.
 */
import { execFileSync } from "node:child_process";
import { writeFileSync } from "node:fs";
import { join } from "node:path";
import type { FeatureCollection } from "geojson";
import { shapely, tempDir } from "~/fabric/test-support/reference-tools.server";

/** Runs `fn` with a fresh temporary folder that is removed afterwards. */
export async function withTempDir<T>(fn: (dir: string) => T | Promise<T>): Promise<T> {
  const { dir, cleanup } = tempDir();
  try {
    return await fn(dir);
  } finally {
    cleanup();
  }
}

/** Writes bytes or text into `dir` and returns the path. */
export function writeInto(dir: string, name: string, data: string | Uint8Array): string {
  const path = join(dir, name);
  writeFileSync(path, data);
  return path;
}

/** `ogrinfo -ro -al -so` (summary of every layer: feature count, geometry type, SRS, fields). */
export function ogrinfoSummary(path: string): string {
  return execFileSync("ogrinfo", ["-ro", "-al", "-so", path], { encoding: "utf8" });
}

/** Runs `ogrinfo -sql` with the OGR SQL dialect and returns its text output. */
export function ogrinfoSql(path: string, sql: string): string {
  return execFileSync("ogrinfo", ["-ro", "-q", "-dialect", "OGRSQL", "-sql", sql, path], { encoding: "utf8" });
}

/** `ogr2ogr -f GeoJSON /vsistdout/ <path> [extra]`: GDAL's reading of the file as a FeatureCollection. */
export function ogrToGeoJson(path: string, extra: string[] = []): FeatureCollection {
  const out = execFileSync("ogr2ogr", ["-f", "GeoJSON", "/vsistdout/", path, ...extra], { encoding: "utf8", maxBuffer: 64 * 1024 * 1024 });
  return JSON.parse(out) as FeatureCollection;
}

/** GEOS facts per geometry (null stays null): planar area, validity, and RFC 7946 winding. */
export function geosFacts(geometries: unknown[]): ({ area: number; valid: boolean; exteriorsCcw: boolean; holesCw: boolean } | null)[] {
  const script = [
    "out = []",
    "for g in data:",
    "    if g is None:",
    "        out.append(None); continue",
    "    s = shape(g)",
    "    parts = list(getattr(s, 'geoms', [s]))",
    "    out.append({'area': s.area, 'valid': s.is_valid, 'exteriorsCcw': all(p.exterior.is_ccw for p in parts),",
    "                'holesCw': all(not h.is_ccw for p in parts for h in p.interiors)})",
    "print(json.dumps(out))",
  ].join("\n");
  return shapely(script, geometries);
}

/**
 * Build step (run by hand, output committed): writes `prj-wkt.json`, the OGC WKT 1 text of every
 * CRS in the shipped EPSG list (`public/crs/epsg.json`), for Shapefile `.prj` files. Source: the
 * `epsg-index` dev package (the same source as the shipped list), so no network is needed.
 *
 *   npx tsx app/exports/shapefile/build-prj-wkt.server.ts
 *
 * Where the shipped list replaced a datum grid by a 7-parameter shift (`datumNote`), the WKT's
 * PROJ4_GRIDS extension is replaced by the same TOWGS84, so both definitions agree.
 */
import { readFileSync, writeFileSync } from "node:fs";
import { createRequire } from "node:module";
import { fileURLToPath } from "node:url";
import type { CrsEntry } from "../../fabric/crs/crs-entry";

const require = createRequire(import.meta.url);
const root = fileURLToPath(new URL("../../../", import.meta.url));
const shipped = JSON.parse(readFileSync(`${root}public/crs/epsg.json`, "utf8")) as { entries: CrsEntry[] };

function wktFor(entry: CrsEntry): string | null {
  let record: { wkt?: string };
  try {
    record = require(`epsg-index/s/${entry.code}.json`) as { wkt?: string };
  } catch {
    return null;
  }
  if (!record.wkt) return null;
  const towgs84 = /\+towgs84=(\S+)/.exec(entry.proj4)?.[1];
  return record.wkt.replace(/,EXTENSION\["PROJ4_GRIDS","[^"]*"\]/, towgs84 ? `,TOWGS84[${towgs84}]` : "");
}

const out: Record<string, string> = {};
const missing: number[] = [];
for (const e of shipped.entries) {
  const wkt = wktFor(e);
  if (wkt) out[e.code] = wkt;
  else missing.push(e.code);
}
writeFileSync(fileURLToPath(new URL("./prj-wkt.json", import.meta.url)), JSON.stringify({ source: "epsg-index 2.0.0", wkt: out }) + "\n");
console.log(`wrote ${Object.keys(out).length} WKT definitions; no WKT in epsg-index for: ${missing.join(", ") || "none"}`);

/**
 * Build step (run by hand, output committed): writes `public/crs/epsg.json`,
 * the EPSG list that ships with the app, from the `epsg-index` dev package.
 *
 *   npx tsx app/fabric/crs/build-epsg-list.server.ts
 *
 * Only projected and geographic 2D CRSs that road and rail teams use are kept,
 * so the file stays small enough to send to the browser for the CRS picker.
 */
import { createRequire } from "node:module";
import { writeFileSync } from "node:fs";
import { fileURLToPath } from "node:url";
import type { CrsEntry } from "./crs-entry";

interface IndexEntry {
  code: string;
  kind: string;
  name: string;
  proj4?: string;
  bbox?: number[];
  unit?: string;
}

const NATIONAL_GRIDS = [
  27700, 29903, 2157, 2193, 3006, 3067, 28992, 2056, 31370, 3035, 5514, 2180,
  2154, 3577, 3414, 2326, 5070, 3310, 6350, 3978, 3347, 3111, 31287, 3416, 2039,
  3395, 3763, 3301, 3059, 3346, 2100, 3765, 3794, 5243, 25884, 3857, 4326, 4269,
  4258, 6318, 4167, 4283, 7844, 4617, 4277, 4171, 4326, 4148, 2927, 8857,
];

/** Codes whose index definition needs a datum grid we cannot ship; replaced by
 * the EPSG-published 7-parameter transformation and flagged as approximate. */
const HELMERT_SUBSTITUTES: Record<string, { towgs84: string; note: string }> = {
  // EPSG:1314 "OSGB36 to WGS 84 (6)", stated accuracy 2 m.
  OSTN15_NTv2_OSGBtoETRS: {
    towgs84: "446.448,-125.157,542.06,0.15,0.247,0.842,-20.489",
    note: "OSGB36 datum shift by 7-parameter transformation EPSG:1314 (about 2 m)",
  },
};

/** True for the CRS families the product promises (see app/fabric/README.md). */
function isWanted(e: IndexEntry): boolean {
  const code = Number(e.code);
  if (NATIONAL_GRIDS.includes(code)) return true;
  if (e.kind !== "CRS-PROJCRS") return false;
  if ((code >= 32601 && code <= 32660) || (code >= 32701 && code <= 32760)) return true;
  if (code >= 26901 && code <= 26923) return true; // NAD83 / UTM
  if (code >= 25828 && code <= 25838) return true; // ETRS89 / UTM
  if (code >= 6328 && code <= 6348) return true; // NAD83(2011) / UTM
  if (/^(GDA94|GDA2020) \/ MGA zone/.test(e.name)) return true;
  // State Plane (and a few statewide grids) on NAD83 and NAD83(2011), all units.
  return /^NAD83(\(2011\))? \/ (?!UTM|Conus|Canada|MTM|Statistics|BC |Alaska Albers)/.test(e.name);
}

/** Drops grid references proj4 cannot honour; null when no substitute exists. */
function shippableProj4(proj4: string): { proj4: string; note?: string } | null {
  // "@name" grids are optional (3857 carries "@null"); proj4 skips them when absent.
  const grid = /\+nadgrids=([^@\s]\S*)/.exec(proj4);
  if (!grid) return { proj4 };
  const sub = HELMERT_SUBSTITUTES[grid[1]!.replace(/\.gsb$/i, "")];
  if (!sub) return null;
  return { proj4: proj4.replace(grid[0], `+towgs84=${sub.towgs84}`), note: sub.note };
}

function toEntry(e: IndexEntry): CrsEntry | null {
  if (!e.proj4) return null;
  const shipped = shippableProj4(e.proj4.replace(/ \+type=crs$/, ""));
  if (!shipped) return null;
  const entry: CrsEntry = {
    code: Number(e.code),
    name: e.name,
    kind: e.kind === "CRS-GEOGCRS" ? "geographic" : "projected",
    unit: e.unit?.replace(/ \(supplier.*\)$/, "") ?? "",
    proj4: shipped.proj4,
    // epsg-index bbox order is [north, west, south, east] in degrees.
    areaOfUse: e.bbox?.length === 4 ? ([e.bbox[1], e.bbox[2], e.bbox[3], e.bbox[0]] as CrsEntry["areaOfUse"]) : undefined,
  };
  if (shipped.note) entry.datumNote = shipped.note;
  return entry;
}

function main(): void {
  const require = createRequire(import.meta.url);
  const all = require("epsg-index/all.json") as Record<string, IndexEntry>;
  const entries = Object.values(all)
    .filter((e) => (e.kind === "CRS-PROJCRS" || e.kind === "CRS-GEOGCRS") && isWanted(e))
    .map(toEntry)
    .filter((e): e is CrsEntry => e !== null)
    .sort((a, b) => a.code - b.code);
  const out = fileURLToPath(new URL("../../../public/crs/epsg.json", import.meta.url));
  writeFileSync(out, JSON.stringify({ source: "epsg-index 2.0.0", entries }) + "\n");
  console.log(`wrote ${entries.length} CRS definitions`);
}

main();

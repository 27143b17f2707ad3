import proj4 from "proj4";
import { CRS_ENTRIES } from "./epsg-list";
import type { CrsEntry } from "./crs-entry";

/** The proj4 projection fields we compare (not all are in proj4's typings). */
interface ParsedProj {
  projName?: string;
  a: number;
  es: number;
  to_meter?: number;
  datumCode?: string;
  forward: (p: { x: number; y: number }) => { x: number; y: number };
}

/** Parses a proj4 string or a WKT into proj4's projection object; null if proj4 cannot. */
export function parseDefinition(def: string): ParsedProj | null {
  try {
    return new proj4.Proj(def) as unknown as ParsedProj;
  } catch {
    return null;
  }
}

const parsedEntries = new Map<number, ParsedProj | null>();
function parsedEntry(e: CrsEntry): ParsedProj | null {
  if (!parsedEntries.has(e.code)) parsedEntries.set(e.code, parseDefinition(e.proj4));
  return parsedEntries.get(e.code) ?? null;
}

/** Relative comparison of ellipsoid figures and factors. */
function near(a: number, b: number, relTol: number): boolean {
  return Math.abs(a - b) <= relTol * Math.max(Math.abs(a), Math.abs(b));
}

/**
 * Same ellipsoid (es within 1e-7 relative: proj4's built-in Airy derives es
 * from b, a .prj from 1/f, 3.6e-8 apart), same unit, and the same projected metres at sample points (< 1 mm). */
function sameProjection(p: ParsedProj, q: ParsedProj, e: CrsEntry): boolean {
  if (!near(p.a, q.a, 1e-10) || !near(p.es, q.es, 1e-7) || !near(p.to_meter ?? 1, q.to_meter ?? 1, 1e-9)) return false;
  const [w, s, east, n] = e.areaOfUse ?? [-1, -1, 1, 1];
  const samples = [[(w + east) / 2, (s + n) / 2], [w, s], [east, n]] as const;
  const rad = Math.PI / 180;
  return samples.every(([lon, lat]) => {
    const pt = { x: lon * rad, y: lat * rad };
    const a = p.forward({ ...pt });
    const b = q.forward({ ...pt });
    return Math.abs(a.x - b.x) < 1e-3 && Math.abs(a.y - b.y) < 1e-3;
  });
}

/** Datum spellings (ESRI "D_..." and OGC) that fix a geographic CRS. */
const GEOGRAPHIC_BY_DATUM: [RegExp, number][] = [
  [/WGS[ _]?(19)?84/i, 4326],
  [/North[ _]American[ _](Datum[ _])?1983(?![ _]?(\(|_)?(2011|HARN|CSRS))/i, 4269],
  [/2011/, 6318],
  [/ETRS[ _]?(19)?89|European_Terrestrial_Reference_System_1989/i, 4258],
];

/**
 * Finds the shipped EPSG entry that a WKT without an authority code stands
 * for (ESRI .prj files usually carry none), by comparing what both do to
 * sample points. Among equals (NAD83 and NAD83(2011) zones share parameters)
 * the WKT's datum name decides, then the lowest code.
 */
export function identifyWkt(wkt: string): CrsEntry | undefined {
  const parsed = parseDefinition(wkt);
  if (!parsed) return undefined;
  if (parsed.projName === "longlat") {
    const hit = GEOGRAPHIC_BY_DATUM.find(([re]) => re.test(/DATUM\["([^"]+)"/i.exec(wkt)?.[1] ?? ""));
    return hit ? CRS_ENTRIES.find((e) => e.code === hit[1]) : undefined;
  }
  const matches = CRS_ENTRIES.filter((e) => {
    if (e.kind !== "projected") return false;
    const q = parsedEntry(e);
    return q !== null && sameProjection(parsed, q, e);
  });
  // WGS84 and GRS80 differ in es by only 5e-9 relative and project alike to
  // < 1 mm, so the closest ellipsoid decides before the datum name does.
  const esGap = (e: CrsEntry) => Math.abs(parsedEntry(e)!.es - parsed.es);
  const is2011 = /2011/.test(wkt);
  const ranked = matches.sort((x, y) => esGap(x) - esGap(y) || Number(/\(2011\)/.test(y.name) === is2011) - Number(/\(2011\)/.test(x.name) === is2011) || x.code - y.code);
  return ranked[0];
}

/** The EPSG code an authority clause names for the whole CRS (WKT1 AUTHORITY or WKT2 ID), or null. */
export function authorityCode(wkt: string): number | null {
  const trimmed = wkt.trim();
  const wkt1 = /AUTHORITY\[\s*"EPSG"\s*,\s*"?(\d+)"?\s*\]\s*\]\s*$/i.exec(trimmed);
  const wkt2 = /ID\[\s*"EPSG"\s*,\s*(\d+)\s*(,[^\]]*)?\]\s*\]\s*$/i.exec(trimmed);
  const m = wkt1 ?? wkt2;
  return m ? Number(m[1]) : null;
}

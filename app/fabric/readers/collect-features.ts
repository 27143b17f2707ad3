import type { Geometry, Position } from "geojson";
import type { AreaFeature, AreaGeometry, Properties, RejectedRow, RepairedRow } from "../types";
import { repairGeometry } from "../geometry/repair-polygon";
import { findGeometryProblem } from "../geometry/validate-polygon";
import { normalizeOrientation } from "../geometry/ring-orientation";

/** One source row as a reader found it, before any checking. */
export interface RawRow {
  geometry: Geometry | null | undefined;
  properties: Record<string, unknown> | null | undefined;
  id?: string | number;
  /** Set by a reader that could not decode the row's geometry at all. */
  problem?: string;
}

/** Rows sorted into usable parcels and rejected rows (1-based row numbers), and the rows repaired on the way. */
export interface CollectedRows {
  features: AreaFeature[];
  rejected: RejectedRow[];
  repaired: RepairedRow[];
  warnings: string[];
}

/** Attribute values become JSON-safe: dates to ISO day strings, NaN and undefined to null. */
export function cleanProperties(props: Record<string, unknown> | null | undefined): Properties {
  const out: Properties = {};
  for (const [k, v] of Object.entries(props ?? {})) {
    if (v instanceof Date) out[k] = Number.isNaN(v.getTime()) ? null : isoDay(v);
    else if (typeof v === "number") out[k] = Number.isFinite(v) ? v : null;
    else if (typeof v === "string" || typeof v === "boolean") out[k] = v;
    else if (v === null || v === undefined) out[k] = null;
    else out[k] = JSON.stringify(v);
  }
  return out;
}

/** DBF dates are calendar days read in local time; keep the day, not an instant. */
function isoDay(d: Date): string {
  const pad = (n: number) => String(n).padStart(2, "0");
  return `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;
}

function to2d(rings: Position[][]): { rings: Position[][]; hadZ: boolean } {
  let hadZ = false;
  const flat = rings.map((r) => {
    if (!Array.isArray(r)) return [];
    // Most files are 2D already: keep those rings as they are rather than copy every vertex.
    if (r.every((p) => !Array.isArray(p) || p.length <= 2)) return r;
    hadZ = true;
    return r.map((p) => (Array.isArray(p) ? [p[0]!, p[1]!] : p));
  });
  return { rings: flat, hadZ };
}

/** The 2D area geometry of a row, or a plain reason it cannot be a parcel. */
function areaGeometry(g: Geometry | null | undefined): { geometry: AreaGeometry; hadZ: boolean } | string {
  if (!g) return "no geometry";
  if (g.type === "Polygon") {
    const { rings, hadZ } = to2d(Array.isArray(g.coordinates) ? g.coordinates : []);
    return { geometry: { type: "Polygon", coordinates: rings }, hadZ };
  }
  if (g.type === "MultiPolygon") {
    const parts = (Array.isArray(g.coordinates) ? g.coordinates : []).map(to2d);
    return { geometry: { type: "MultiPolygon", coordinates: parts.map((p) => p.rings) }, hadZ: parts.some((p) => p.hadZ) };
  }
  return `not a polygon (${g.type})`;
}

/**
 * Checks each row's geometry and keeps valid polygons whole, with RFC 7946 winding, after the
 * safe repairs of `repairGeometry` (noted per row); Z values are dropped with one warning.
 * Invalid, empty and non-polygon rows are returned as rejected with the reason.
 * `checkWinding` notes rings wound against RFC 7946 (for GeoJSON, where that is the rule).
 */
export function collectFeatures(rows: RawRow[], options: { checkWinding?: boolean } = {}): CollectedRows {
  const features: AreaFeature[] = [];
  const rejected: RejectedRow[] = [];
  const repaired: RepairedRow[] = [];
  let zRows = 0;
  rows.forEach((r, i) => {
    const area = r.problem ?? areaGeometry(r.geometry);
    if (typeof area === "string") {
      rejected.push({ row: i + 1, reason: area });
      return;
    }
    const fixed = repairGeometry(area.geometry, options);
    const problem = findGeometryProblem(fixed.geometry);
    if (problem !== null) {
      rejected.push({ row: i + 1, reason: problem === "empty polygon" ? "empty geometry" : problem });
      return;
    }
    if (fixed.repairs.length > 0) repaired.push({ row: i + 1, repairs: fixed.repairs });
    if (area.hadZ) zRows++;
    const feature: AreaFeature = {
      type: "Feature",
      geometry: normalizeOrientation(fixed.geometry),
      properties: cleanProperties(r.properties),
      sourceRow: i + 1,
    };
    if (r.id !== undefined) feature.id = r.id;
    features.push(feature);
  });
  const warnings = zRows > 0 ? [`Heights (Z values) on ${zRows} rows were dropped; areas are planar.`] : [];
  return { features, rejected, repaired, warnings };
}

/** Field names in first-seen order across rows. */
export function fieldNamesOf(rows: RawRow[]): string[] {
  const names = new Set<string>();
  for (const r of rows) for (const k of Object.keys(r.properties ?? {})) names.add(k);
  return [...names];
}

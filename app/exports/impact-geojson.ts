import type { MultiPolygon } from "geojson";
import { reproject } from "../fabric/crs/reproject";
import { normalizeOrientation } from "../fabric/geometry/ring-orientation";
import type { PolygonCoords } from "../geometry/take-types";
import { columnName, IMPACT_COLUMNS } from "./impact-columns";
import type { GeoExportOptions, ImpactExportRow, ImpactExportSheet } from "./impact-types";

/** Options of the GeoJSON export: output in WGS 84 (RFC 7946, the default) or in the working CRS. */
export interface ImpactGeoJsonOptions extends GeoExportOptions {
  output?: "wgs84" | "working";
  /** Features per yielded chunk (default 200). */
  featuresPerChunk?: number;
}

/** 1e-9° ≈ 0.1 mm on the ground: finer than the millimetre the takes are computed to. */
const WGS84_DECIMALS = 9;

function roundPositions(g: MultiPolygon, decimals: number): MultiPolygon {
  const f = 10 ** decimals;
  return { ...g, coordinates: g.coordinates.map((p) => p.map((r) => r.map((q) => [Math.round(q[0]! * f) / f, Math.round(q[1]! * f) / f]))) };
}

/**
 * The row's polygon in the output CRS, exterior rings counter-clockwise and holes clockwise
 * (RFC 7946 §3.1.6), or null when there is none (RFC 7946 §3.2 allows a null geometry).
 */
export function outputGeometry(polygons: PolygonCoords[] | null | undefined, options: ImpactGeoJsonOptions): MultiPolygon | null {
  if (!polygons || polygons.length === 0) return null;
  const source = options.geometryCrs === "wgs84" ? "EPSG:4326" : `EPSG:${options.workingEpsg}`;
  const target = (options.output ?? "wgs84") === "wgs84" ? "EPSG:4326" : `EPSG:${options.workingEpsg}`;
  const g: MultiPolygon = { type: "MultiPolygon", coordinates: polygons };
  const out = source === target ? normalizeOrientation(g) : reproject(g, source, target);
  return target === "EPSG:4326" ? roundPositions(out, WGS84_DECIMALS) : out;
}

/** Feature properties: the CSV's column names (units in the names), lists as JSON arrays. */
export function featureProperties(row: ImpactExportRow, sheet: Pick<ImpactExportSheet, "alternativeName" | "units">): Record<string, unknown> {
  const props: Record<string, unknown> = {};
  for (const c of IMPACT_COLUMNS) props[columnName(c, sheet.units)] = c.value(row, sheet.alternativeName);
  return props;
}

function opening(options: ImpactGeoJsonOptions): string {
  if ((options.output ?? "wgs84") === "wgs84") return '{"type":"FeatureCollection","features":[';
  // GeoJSON 2008 §3.1 named CRS; RFC 7946 §4 dropped it, so this output is the legacy form on request only.
  const crs = { type: "name", properties: { name: `urn:ogc:def:crs:EPSG::${options.workingEpsg}` } };
  return `{"type":"FeatureCollection","crs":${JSON.stringify(crs)},"features":[`;
}

/**
 * Streams the impact table as a GeoJSON FeatureCollection, one Feature per parcel and
 * alternative with the take polygon (MultiPolygon) and the impact columns as properties.
 * Default output is RFC 7946: WGS 84 longitude/latitude, no `crs` member; `output: "working"`
 * keeps the working CRS's coordinates and adds the legacy `crs` member naming its EPSG code.
 */
export async function* streamImpactGeoJson(sheets: readonly ImpactExportSheet[], options: ImpactGeoJsonOptions): AsyncGenerator<string> {
  const per = Math.max(1, options.featuresPerChunk ?? 200);
  yield opening(options);
  let chunk: string[] = [];
  let first = true;
  for (const sheet of sheets) {
    for (const row of sheet.rows) {
      const feature = { type: "Feature", geometry: outputGeometry(row.geometry, options), properties: featureProperties(row, sheet) };
      chunk.push((first ? "" : ",") + JSON.stringify(feature));
      first = false;
      if (chunk.length >= per) {
        yield chunk.join("\n");
        chunk = [];
      }
    }
  }
  yield chunk.join("\n") + "]}\n";
}

/** The whole FeatureCollection as text (for small tables and tests). */
export async function writeImpactGeoJson(sheets: readonly ImpactExportSheet[], options: ImpactGeoJsonOptions): Promise<string> {
  let out = "";
  for await (const part of streamImpactGeoJson(sheets, options)) out += part;
  return out;
}

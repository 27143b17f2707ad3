import type { Feature, Geometry } from "geojson";
import { FabricInputError } from "../errors";
import type { ReadResult } from "../types";
import { parseEpsgCode } from "../crs/epsg-list";
import { collectFeatures, fieldNamesOf, type RawRow } from "./collect-features";

function parseJson(bytes: Uint8Array): unknown {
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes).replace(/^\uFEFF/, "");
  } catch {
    throw new FabricInputError("corrupt_file", "The GeoJSON file is not UTF-8 text (RFC 7946 requires UTF-8).", {});
  }
  try {
    return JSON.parse(text);
  } catch (e) {
    throw new FabricInputError("corrupt_file", `The GeoJSON file is not valid JSON: ${(e as Error).message}`, {});
  }
}

/** The EPSG code a pre-RFC 7946 `crs` member names, if any (a hint; RFC 7946 dropped it). */
function legacyCrsCode(doc: { crs?: unknown }, warnings: string[]): number | undefined {
  const crs = doc.crs as { type?: string; properties?: { name?: unknown } } | undefined;
  if (!crs) return undefined;
  const name = crs.properties?.name;
  const code = typeof name === "string" ? parseEpsgCode(name) : null;
  if (code === null) {
    warnings.push(`The file's "crs" member (${JSON.stringify(crs).slice(0, 80)}) names no EPSG code and was ignored.`);
    return undefined;
  }
  return code;
}

/**
 * Reads a GeoJSON FeatureCollection (RFC 7946) from UTF-8 bytes. Coordinates
 * are returned as found; a legacy `crs` member naming an EPSG code becomes
 * `sourceEpsg` (otherwise RFC 7946 means WGS84 longitude/latitude, decided by
 * the caller). `feature.id` is kept.
 */
export function readGeoJson(bytes: Uint8Array): ReadResult {
  const doc = parseJson(bytes) as { type?: unknown; features?: unknown; crs?: unknown };
  if (doc === null || typeof doc !== "object" || doc.type !== "FeatureCollection" || !Array.isArray(doc.features)) {
    const what = doc && typeof doc === "object" ? String(doc.type) : typeof doc;
    throw new FabricInputError("unsupported_format", `Expected a GeoJSON FeatureCollection, found ${what}.`, { type: what });
  }
  const warnings: string[] = [];
  const sourceEpsg = legacyCrsCode(doc, warnings);
  const rows: RawRow[] = (doc.features as Feature<Geometry | null>[]).map((f) => {
    const row: RawRow = { geometry: f?.geometry, properties: f?.properties };
    if (typeof f?.id === "string" || typeof f?.id === "number") row.id = f.id;
    return row;
  });
  // RFC 7946 §3.1.6: exterior rings counter-clockwise, holes clockwise. A file with the older
  // `crs` member follows the 2008 GeoJSON spec, which set no winding, so its rings are not noted.
  const collected = collectFeatures(rows, { checkWinding: doc.crs === undefined });
  const result: ReadResult = { ...collected, fieldNames: fieldNamesOf(rows), warnings: [...warnings, ...collected.warnings] };
  if (sourceEpsg !== undefined) result.sourceEpsg = sourceEpsg;
  return result;
}

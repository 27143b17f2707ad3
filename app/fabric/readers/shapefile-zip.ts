import { parseDbf, parseShp } from "shpjs";
import type { Geometry } from "geojson";
import { FabricInputError } from "../errors";
import type { ReadOptions, ReadResult } from "../types";
import { collectFeatures, type RawRow } from "./collect-features";
import { readZipEntries, sidecar, type ZipEntries } from "./zip-entries";
import { deletedDbfRecords, encodingFromCpg, encodingFromLdid, readDbfFieldNames } from "./dbf-fields";

/** Shapefile shape types (ESRI Shapefile Technical Description, 1998, table 1). */
const POLYGON_TYPES = new Set([5, 15, 25]);
const TYPE_NAMES: Record<number, string> = { 0: "null shapes", 1: "points", 3: "lines", 8: "multipoints", 11: "points", 13: "lines", 18: "multipoints", 21: "points", 23: "lines", 28: "multipoints", 31: "multipatches" };

function shapeTypeOf(shp: Uint8Array | undefined): number | null {
  return shp && shp.byteLength >= 100 ? new DataView(shp.buffer, shp.byteOffset, shp.byteLength).getInt32(32, true) : null;
}

/**
 * The layer to read: the named one, the only one, or the only polygon layer
 * among several (others ignored with a warning, as zips often carry a
 * centreline or survey points too).
 */
function pickLayer(entries: ZipEntries, options: ReadOptions, warnings: string[]): string {
  const bases = [...entries.keys()].filter((n) => n.toLowerCase().endsWith(".shp")).map((n) => n.slice(0, -4));
  const nameOf = (b: string) => b.split("/").pop()!;
  const names = bases.map(nameOf);
  if (bases.length === 0) {
    throw new FabricInputError("no_polygon_layer", "The zip holds no Shapefile (.shp).", { files: [...entries.keys()] });
  }
  if (options.layer !== undefined) {
    const i = names.indexOf(options.layer);
    if (i < 0) throw new FabricInputError("no_polygon_layer", `The zip has no layer named "${options.layer}".`, { layers: names });
    return bases[i]!;
  }
  if (bases.length === 1) return bases[0]!;
  const polygons = bases.filter((b) => POLYGON_TYPES.has(shapeTypeOf(sidecar(entries, b, ".shp")) ?? -1));
  if (polygons.length === 1) {
    warnings.push(`Read layer "${nameOf(polygons[0]!)}"; ignored non-polygon layers: ${names.filter((n) => n !== nameOf(polygons[0]!)).join(", ")}.`);
    return polygons[0]!;
  }
  const listed = (polygons.length ? polygons.map(nameOf) : names).join(", ");
  throw new FabricInputError("too_many_layers", `The zip holds ${bases.length} Shapefiles (${listed}); upload one, or name the layer to read.`, { layers: names });
}

function checkShapeType(shp: Uint8Array, layer: string): void {
  if (shp.byteLength < 100) throw new FabricInputError("corrupt_file", `${layer}.shp is too short to be a Shapefile.`, {});
  const view = new DataView(shp.buffer, shp.byteOffset, shp.byteLength);
  if (view.getInt32(0, false) !== 9994) throw new FabricInputError("corrupt_file", `${layer}.shp is not a Shapefile (bad file code).`, {});
  const type = view.getInt32(32, true);
  if (!POLYGON_TYPES.has(type)) {
    const what = TYPE_NAMES[type] ?? `shape type ${type}`;
    throw new FabricInputError("no_polygon_layer", `Layer "${layer}" holds ${what}, not polygons; parcels must be polygons.`, { layer, shapeType: type });
  }
}

const asView = (b: Uint8Array) => new DataView(b.buffer, b.byteOffset, b.byteLength);

function readAttributes(dbf: Uint8Array | undefined, cpgText: string | undefined, count: number, warnings: string[]) {
  if (!dbf) {
    warnings.push("The Shapefile has no .dbf, so its parcels have no attributes.");
    return { rows: new Array<Record<string, unknown>>(count).fill({}), fieldNames: [] as string[] };
  }
  // Encoding: the .cpg if present, else the header's language driver ID, else UTF-8.
  const cpg = encodingFromCpg(cpgText) ?? (cpgText ? undefined : encodingFromLdid(dbf));
  if (cpgText && !encodingFromCpg(cpgText)) warnings.push(`The .cpg names an unknown encoding ("${cpgText}"); text was read as UTF-8.`);
  // parsedbf decodes text with this label (UTF-8 without one), so the .cpg is honoured.
  const rows = parseDbf(asView(dbf) as never, cpg as never) as Record<string, unknown>[];
  if (rows.length !== count) warnings.push(`The .shp has ${count} shapes but the .dbf has ${rows.length} rows; rows were paired in order.`);
  if (!cpg && rows.some((r) => Object.values(r).some((v) => typeof v === "string" && v.includes("\uFFFD")))) {
    warnings.push("Some text is not valid UTF-8 and there is no .cpg naming the encoding; add a .cpg (e.g. 'windows-1252').");
  }
  return { rows, fieldNames: readDbfFieldNames(dbf, cpg) };
}

/**
 * Reads a zipped Shapefile (.shp, .dbf, optional .prj, .cpg; .shx is not
 * needed) from bytes with shpjs. Coordinates stay in the layer's own CRS:
 * the .prj text is returned as `sourceCrsWkt`, never applied here.
 */
export async function readShapefileZip(bytes: Uint8Array, options: ReadOptions = {}): Promise<ReadResult> {
  const entries = await readZipEntries(bytes);
  const warnings: string[] = [];
  const base = pickLayer(entries, options, warnings);
  const layer = base.split("/").pop()!;
  const shp = sidecar(entries, base, ".shp")!;
  checkShapeType(shp, layer);
  const text = (ext: string) => { const b = sidecar(entries, base, ext); return b ? new TextDecoder().decode(b).trim() : undefined; };
  const geometries = parseShp(asView(shp) as never) as (Geometry | null)[];
  const { rows: attrs, fieldNames } = readAttributes(sidecar(entries, base, ".dbf"), text(".cpg"), geometries.length, warnings);
  const dbf = sidecar(entries, base, ".dbf");
  const deleted = dbf ? deletedDbfRecords(dbf) : new Set<number>();
  const rows: RawRow[] = geometries.map((geometry, i) =>
    deleted.has(i) ? { geometry, properties: attrs[i] ?? {}, problem: "record is marked deleted in the .dbf" } : { geometry, properties: attrs[i] ?? {} });
  const collected = collectFeatures(rows);
  const result: ReadResult = { ...collected, fieldNames, warnings: [...warnings, ...collected.warnings] };
  const prj = text(".prj");
  if (prj) result.sourceCrsWkt = prj;
  return result;
}

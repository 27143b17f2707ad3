import { FabricInputError } from "../errors";
import type { AreaFeature, ReadResult, RepairedRow } from "../types";
import { detectFormat, type FabricFormat } from "./detect-format";
import { chooseSourceCrs, chooseWorkingCrs } from "./choose-crs";
import { chooseMapping } from "./mapping-choice";
import type { ParcelUpload, ParcelUploadInput, UploadedFeature } from "./upload-types";
import type { UploadProgress } from "./progress";
import { readShapefileZip } from "../readers/shapefile-zip";
import { readGeoJson } from "../readers/geojson";
import { readGeoPackage } from "../readers/geopackage.server";
import { mapFeatureAttributes, settleFieldMapping, type MappedAttributes } from "../attributes/apply-mapping";
import { mapInChunks, yieldToEventLoop } from "./chunked.server";
import { findParcelOverlaps } from "./parcel-overlaps.server";
import { findCrsByCode } from "../crs/epsg-list";
import { geometryConverter } from "../crs/reproject";
import type { ResolvedCrs } from "../crs/resolve-crs";
import { convertArea, type LengthUnit } from "../crs/units";
import { polygonArea } from "../geometry/area";
import { bboxOf } from "../geometry/bbox";

const WGS84 = findCrsByCode(4326)!.proj4;

async function readByFormat(format: FabricFormat, bytes: Uint8Array, layer: string | undefined): Promise<ReadResult> {
  const options = layer === undefined ? {} : { layer };
  if (format === "shapefile-zip") return readShapefileZip(bytes, options);
  if (format === "geopackage") return readGeoPackage(bytes, options);
  return readGeoJson(bytes);
}

function refuseEmpty(read: ReadResult, what: string): void {
  if (read.features.length > 0) return;
  const why = read.rejected.length ? `all ${read.rejected.length} rows were rejected` : "the layer has no rows";
  throw new FabricInputError("empty_layer", `No usable ${what} in the file: ${why}.`, { rejected: read.rejected.slice(0, 100) });
}

/** Warns when the data's centre lies outside the CRS's EPSG area of use (often a wrong CRS pick). */
function areaOfUseWarning(crs: ResolvedCrs, bbox: [number, number, number, number]): string | null {
  const area = crs.epsg === undefined ? undefined : findCrsByCode(crs.epsg)?.areaOfUse;
  if (!area) return null;
  const lon = (bbox[0] + bbox[2]) / 2;
  const lat = (bbox[1] + bbox[3]) / 2;
  const inside = lon >= area[0] - 1 && lon <= area[2] + 1 && lat >= area[1] - 1 && lat <= area[3] + 1;
  return inside ? null : `The parcels lie at ${lat.toFixed(4)}°, ${lon.toFixed(4)}°, outside the area where ${crs.name} is used; check the source CRS.`;
}

function toUploaded(f: AreaFeature, attrs: MappedAttributes, wgs84: AreaFeature["geometry"], toWorking: ReturnType<typeof geometryConverter>, working: ResolvedCrs, unit: LengthUnit): UploadedFeature {
  const geometry = toWorking(f.geometry);
  const out: UploadedFeature = {
    ...attrs,
    sourceRow: f.sourceRow,
    geometry,
    geometryWgs84: wgs84,
    area: convertArea(polygonArea(geometry), working.unit!, unit),
  };
  if (f.id !== undefined) out.id = f.id;
  return out;
}

/** Repair notes of the rows that were finally kept (a repaired row may still fail its attributes). */
function keptRows(repaired: RepairedRow[], features: UploadedFeature[]): RepairedRow[] {
  const kept = new Set(features.map((f) => f.sourceRow));
  return repaired.filter((r) => kept.has(r.row));
}

/**
 * Reads an uploaded parcel fabric (or building footprints) end to end:
 * detects the format, reads the one polygon layer, resolves the source CRS,
 * picks the working CRS, reprojects every vertex to it and to WGS84, maps
 * and validates attributes and computes planar areas. Bad rows come back in
 * `rejected`; a file that cannot be used throws FabricInputError (the API
 * answers 422 and stores nothing).
 */
export async function readParcelUpload(input: ParcelUploadInput): Promise<ParcelUpload> {
  const report = input.onProgress;
  report?.({ stage: "reading", done: 0, total: 1 });
  const format = detectFormat(input.fileName, input.bytes);
  const read = await readByFormat(format, input.bytes, input.layer);
  report?.({ stage: "reading", done: 1, total: 1 });
  await yieldToEventLoop();
  refuseEmpty(read, input.kind === "parcels" ? "parcels" : "building footprints");
  const warnings = [...read.warnings];
  const sourceCrs = chooseSourceCrs(read, format, input.sourceCrs, warnings);
  const mapping = chooseMapping(read.features, read.fieldNames, input.kind, input.fields);
  const options = { kind: input.kind, landValueBasis: input.landValueBasis ?? "total" } as const;
  const results = await mapInChunks(read.features, (f) => mapFeatureAttributes(f, mapping, options), "attributes", report);
  const { mapped, rejected } = settleFieldMapping(read.features, results, options);
  if (mapped.length === 0) refuseEmpty({ ...read, features: [], rejected: [...read.rejected, ...rejected] }, input.kind);
  // Two passes over the features make up the coordinates stage: to WGS84, then to the working CRS.
  const n = mapped.length;
  const half = (offset: number) => (p: UploadProgress) => report?.({ stage: "coordinates", done: offset + p.done, total: 2 * n });
  const toWgs84 = geometryConverter(sourceCrs.proj4, WGS84);
  const wgs84 = await mapInChunks(mapped, (m) => toWgs84(m.feature.geometry), "coordinates", half(0));
  const bbox = bboxOf(wgs84)!;
  const aou = areaOfUseWarning(sourceCrs, bbox);
  if (aou) warnings.push(aou);
  const workingCrs = chooseWorkingCrs(input.workingCrs, bbox);
  const areaUnit = input.areaUnit ?? workingCrs.unit!;
  const toWorking = geometryConverter(sourceCrs.proj4, workingCrs.proj4);
  const features = await mapInChunks(mapped, (m, i) => toUploaded(m.feature, m.attributes, wgs84[i]!, toWorking, workingCrs, areaUnit), "coordinates", half(n));
  const overlaps = input.kind === "parcels" ? await findParcelOverlaps(features, workingCrs.unit!, areaUnit, report) : { overlaps: [], overlapCount: 0, warning: null };
  if (overlaps.warning) warnings.push(overlaps.warning);
  return {
    format, features, featureCount: features.length,
    overlaps: overlaps.overlaps, overlapCount: overlaps.overlapCount,
    rejected: [...read.rejected, ...rejected].sort((a, b) => a.row - b.row),
    repaired: keptRows(read.repaired, features),
    warnings, sourceCrs, workingCrs, areaUnit, bbox,
    fieldNames: read.fieldNames,
    sampleRows: read.features.slice(0, 20).map((f) => f.properties),
    mapping,
  };
}

import type { MultiPolygon } from "geojson";
import { reproject } from "../fabric/crs/reproject";
import type { PolygonCoords } from "../geometry/take-types";
import { columnLabel, columnName, IMPACT_COLUMNS, KIND_DECIMALS, type ImpactColumn } from "./impact-columns";
import { formatCell } from "./impact-csv";
import type { GeoExportOptions, ImpactExportSheet } from "./impact-types";
import { writeDbf, type DbfField, type DbfValue } from "./shapefile/dbf-write";
import { prjWktFor } from "./shapefile/prj-wkt";
import { writeShpShx } from "./shapefile/shp-polygons";
import { writeZip } from "./shapefile/zip-write.server";

/** Options of the Shapefile export; the geometry is always written in the working CRS. */
export interface ImpactShapefileOptions extends GeoExportOptions {
  /** Base name of the files in the zip (default "takes"). */
  layerName?: string;
  /** File dates (default now). */
  modified?: Date;
}

const TEXT_MAX_BYTES = 254;
const encoder = new TextEncoder();

interface Column {
  field: DbfField;
  value: (sheet: ImpactExportSheet, row: ImpactExportSheet["rows"][number]) => DbfValue;
  describe: string;
}

/** A DBF column per impact column: text (and lists, joined with ";") as C, numbers as N with fixed decimals. */
function columnsFor(units: ImpactExportSheet["units"]): Column[] {
  const make = (c: ImpactColumn): Column => {
    const isText = c.kind === "text" || c.kind === "list" || c.kind === "areaList";
    const value = (s: ImpactExportSheet, r: ImpactExportSheet["rows"][number]): DbfValue => {
      const v = c.value(r, s.alternativeName);
      return isText ? (v === null ? null : formatCell(v, c.kind)) : (v as number);
    };
    const field: DbfField = { name: c.dbf, type: isText ? "C" : "N", length: 1, decimals: isText ? 0 : KIND_DECIMALS[c.kind] };
    return { field, value, describe: `${c.dbf.padEnd(10)}  ${columnName(c, units).padEnd(28)}  ${columnLabel(c, units)}` };
  };
  const unitsColumn: Column = { field: { name: "UNITS", type: "C", length: 1, decimals: 0 }, value: (s) => s.units, describe: `${"UNITS".padEnd(10)}  ${"units".padEnd(28)}  Length unit (areas are its square)` };
  return [...IMPACT_COLUMNS.map(make), unitsColumn];
}

/** Sizes each field to its widest value (text in UTF-8 bytes, at most 254; numbers with their decimals). */
function fitWidths(columns: Column[], records: DbfValue[][], warnings: string[]): DbfField[] {
  const widths: number[] = columns.map((c) => (c.field.type === "N" ? 2 : 1));
  records.forEach((rec, i) =>
    rec.forEach((v, j) => {
      if (v === null) return;
      const f = columns[j]!.field;
      // A UTF-16 unit is at most 3 UTF-8 bytes, so short strings need no encoding to measure.
      const len = f.type === "N" ? (v as number).toFixed(f.decimals).length : (v as string).length * 3 <= widths[j]! ? 0 : encoder.encode(v as string).length;
      if (len > TEXT_MAX_BYTES && f.type === "C") warnings.push(`Row ${i + 1}: ${f.name} was cut to ${TEXT_MAX_BYTES} bytes.`);
      widths[j] = Math.max(widths[j]!, f.type === "C" ? Math.min(len, TEXT_MAX_BYTES) : len);
    }),
  );
  return columns.map((c, j) => ({ ...c.field, length: widths[j]! }));
}

function workingGeometry(polygons: PolygonCoords[] | null | undefined, options: GeoExportOptions): PolygonCoords[] | null {
  if (!polygons?.length) return null;
  if (options.geometryCrs !== "wgs84") return polygons;
  return reproject({ type: "MultiPolygon", coordinates: polygons } as MultiPolygon, "EPSG:4326", `EPSG:${options.workingEpsg}`).coordinates;
}

/**
 * The impact table as a zipped polygon Shapefile in the working CRS: `.shp`/`.shx` (null shapes
 * for rows without a take polygon), `.dbf` (dBASE III, UTF-8 text), `.cpg` ("UTF-8"), `.prj`
 * (OGC WKT 1 of the working CRS from the shipped EPSG definitions) and `<layer>-fields.txt`
 * mapping the ≤ 10-character field names to the CSV names with units. All sheets must share one
 * unit. `warnings` lists text cut at dBASE's 254 bytes.
 */
export function writeImpactShapefileZip(sheets: readonly ImpactExportSheet[], options: ImpactShapefileOptions): { zip: Uint8Array; warnings: string[] } {
  if (sheets.length === 0) throw new Error("writeImpactShapefileZip: no alternatives to export");
  const other = sheets.find((s) => s.units !== sheets[0]!.units);
  if (other) throw new Error(`writeImpactShapefileZip: all alternatives must share one unit ("${other.alternativeName}" is in ${other.units})`);
  const columns = columnsFor(sheets[0]!.units);
  const warnings: string[] = [];
  const records = sheets.flatMap((s) => s.rows.map((r) => columns.map((c) => c.value(s, r))));
  const fields = fitWidths(columns, records, warnings);
  const { shp, shx } = writeShpShx(sheets.flatMap((s) => s.rows.map((r) => workingGeometry(r.geometry, options))));
  const layer = options.layerName ?? "takes";
  const fieldsText = ["Shapefile field  CSV/GeoJSON name              Meaning", ...columns.map((c) => c.describe)].join("\r\n") + "\r\n";
  const zip = writeZip(
    [
      { name: `${layer}.shp`, data: shp },
      { name: `${layer}.shx`, data: shx },
      { name: `${layer}.dbf`, data: writeDbf(fields, records, options.modified) },
      { name: `${layer}.prj`, data: encoder.encode(prjWktFor(options.workingEpsg)) },
      { name: `${layer}.cpg`, data: encoder.encode("UTF-8") },
      { name: `${layer}-fields.txt`, data: encoder.encode(fieldsText) },
    ],
    options.modified,
  );
  return { zip, warnings };
}

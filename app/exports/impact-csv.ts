import type { LengthUnit } from "../geometry";
import { formatPlainNumber } from "../exchange/plain-number";
import { columnName, IMPACT_COLUMNS, KIND_DECIMALS, type CellValue, type ColumnKind } from "./impact-columns";
import type { ImpactExportRow, StreamedImpactSheet } from "./impact-types";

/** Options of {@link streamImpactCsv}. */
export interface ImpactCsvOptions {
  /** Rows per yielded chunk (default 500), so a large table streams without one huge string. */
  rowsPerChunk?: number;
  /** Start with a UTF-8 byte-order mark, which some spreadsheet programs need to see UTF-8. Default false. */
  byteOrderMark?: boolean;
}

/**
 * Quotes a field when RFC 4180 §2.6–2.7 requires it (comma, quote, CR or LF), doubling quotes.
 * Text starting with = + - @ gets a leading apostrophe so a spreadsheet does not run it as a
 * formula (OWASP "CSV Injection", from memory); numbers are never touched.
 */
export function csvField(text: string, isText: boolean): string {
  const safe = isText && /^[=+\-@\t\r]/.test(text) ? `'${text}` : text;
  return /[",\r\n]/.test(safe) ? `"${safe.replace(/"/g, '""')}"` : safe;
}

/** Plain text of a cell: numbers not localized and without exponents, lists joined with ";". */
export function formatCell(value: CellValue, kind: ColumnKind): string {
  if (value === null) return "";
  if (Array.isArray(value)) return value.map((v) => (typeof v === "number" ? formatPlainNumber(v, KIND_DECIMALS[kind]) : v)).join(";");
  return typeof value === "number" ? formatPlainNumber(value, KIND_DECIMALS[kind]) : value;
}

/** The header line for a unit: machine names with units, e.g. `take_area_m2`. */
export function impactCsvHeader(units: LengthUnit): string {
  return IMPACT_COLUMNS.map((c) => columnName(c, units)).join(",");
}

function csvLine(row: ImpactExportRow, alternative: string): string {
  return IMPACT_COLUMNS.map((c) => csvField(formatCell(c.value(row, alternative), c.kind), c.kind === "text" || c.kind === "list")).join(",");
}

/**
 * Streams the impact table of one or more alternatives as CSV (RFC 4180: CRLF line ends, a
 * header line, one row per parcel and alternative, the alternative's name in the first column).
 * All sheets must share one unit, since the header names carry it. Rows may be any iterable or
 * async iterable, so a large table never has to sit in memory. Yields text chunks.
 */
export async function* streamImpactCsv(sheets: readonly StreamedImpactSheet[], options: ImpactCsvOptions = {}): AsyncGenerator<string> {
  const units = sheets[0]?.units ?? "m";
  const other = sheets.find((s) => s.units !== units);
  if (other) throw new Error(`streamImpactCsv: all alternatives must share one unit (${units} vs ${other.units} for "${other.alternativeName}")`);
  const per = Math.max(1, options.rowsPerChunk ?? 500);
  yield (options.byteOrderMark ? "\uFEFF" : "") + impactCsvHeader(units) + "\r\n";
  let chunk: string[] = [];
  for (const sheet of sheets) {
    for await (const row of sheet.rows) {
      chunk.push(csvLine(row, sheet.alternativeName) + "\r\n");
      if (chunk.length >= per) {
        yield chunk.join("");
        chunk = [];
      }
    }
  }
  if (chunk.length) yield chunk.join("");
}

/** The whole CSV as one string (for small tables and tests). */
export async function writeImpactCsv(sheets: readonly StreamedImpactSheet[], options: ImpactCsvOptions = {}): Promise<string> {
  let out = "";
  for await (const part of streamImpactCsv(sheets, options)) out += part;
  return out;
}

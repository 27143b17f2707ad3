import { computeAlignmentGeometry, GeometryInputError, parseAngleDeg, type AlignmentInput, type AlignmentPointInput, type LengthUnit } from "../geometry";
import { guessDelimiter, parseCsvRecords, type CsvRecord } from "./csv-records";
import { ExchangeInputError, type RowError } from "./exchange-errors";
import { mapPiColumns, type PiColumn } from "./pi-csv-columns";
import { formatPlainNumber } from "./plain-number";

/** Options of {@link readPiCsv}: the project's units and the station of the first point (default 0). */
export interface PiCsvOptions {
  units: LengthUnit;
  startStation?: number;
}

const PLAIN_NUMBER = /^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/;

function rowReader(rec: CsvRecord, columns: Partial<Record<PiColumn, number>>, errors: RowError[]) {
  const text = (col: PiColumn) => (columns[col] === undefined ? "" : (rec.fields[columns[col]!] ?? "").trim());
  const fail = (column: PiColumn, message: string) => errors.push({ row: rec.line, column, message });
  return {
    text,
    fail,
    number(col: PiColumn, required: boolean, positive = false): number | undefined {
      const t = text(col);
      if (t === "") return required ? (fail(col, `${col} is required here`), undefined) : undefined;
      if (!PLAIN_NUMBER.test(t)) return fail(col, `"${t}" is not a plain number (use a point for decimals, no thousands separators)`), undefined;
      const v = Number(t);
      if (positive && !(v > 0)) return fail(col, `${col} must be more than 0, got ${t}`), undefined;
      return v;
    },
  };
}

/** One PI row: x, y and its curve. A blank curve type is inferred (radius2 → compound, radius → simple). */
function readPoint(rec: CsvRecord, columns: Partial<Record<PiColumn, number>>, isEnd: boolean, errors: RowError[]): AlignmentPointInput | undefined {
  const before = errors.length;
  const r = rowReader(rec, columns, errors);
  const x = r.number("x", true);
  const y = r.number("y", true);
  const given = r.text("curveType").toLowerCase();
  const type = given || (r.text("radius2") ? "compound" : r.text("radius") ? "simple" : "none");
  let point: AlignmentPointInput | undefined = x === undefined || y === undefined ? undefined : { x, y };
  if (type === "none") return errors.length > before ? undefined : point;
  if (type !== "simple" && type !== "compound") return r.fail("curveType", `curve type must be none, simple or compound, got "${given}"`), undefined;
  if (isEnd) return r.fail("curveType", "the first and last points cannot carry a curve"), undefined;
  const radius = r.number("radius", true, true);
  if (type === "simple") {
    if (point && radius !== undefined) point.curve = { type: "simple", radius };
  } else {
    const radius2 = r.number("radius2", true, true);
    const tangentPC = r.text("delta1") ? undefined : r.number("tangentPC", true, true);
    let delta1: number | undefined;
    if (r.text("delta1")) {
      try {
        delta1 = parseAngleDeg(r.text("delta1"), "delta1");
      } catch (e) {
        r.fail("delta1", (e as Error).message);
      }
    }
    if (point && radius !== undefined && radius2 !== undefined) {
      if (delta1 !== undefined) point.curve = { type: "compound", radius1: radius, radius2, delta1 };
      else if (tangentPC !== undefined) point.curve = { type: "compound", radius1: radius, radius2, tangentPC };
    }
  }
  if (errors.length > before) point = undefined;
  return point;
}

/** Runs the alignment through the engine so that geometric problems come back on the PI's row. */
function checkGeometry(alignment: AlignmentInput, lines: number[]): void {
  try {
    computeAlignmentGeometry(alignment);
  } catch (e) {
    if (!(e instanceof GeometryInputError)) throw e;
    const pi = e.details?.piIndex;
    const row = pi === undefined ? 1 : lines[pi]!;
    throw new ExchangeInputError("invalid_rows", `Row ${row}: ${e.message}`, { rows: [{ row, message: e.message }] });
  }
}

/**
 * Reads a PI list from CSV (RFC 4180; "," or ";" or tab, guessed from the header). Columns by
 * header, case-insensitive with aliases (x/easting, y/northing, curve type, radius/radius1,
 * radius2, delta1 in decimal degrees or d°m's", or tangent_pc instead of delta1); one row per
 * point, first and last without a curve. Throws ExchangeInputError `invalid_rows` with
 * `details.rows` = [{row, column, message}], rows numbered as lines of the file (header = 1).
 */
export function readPiCsv(text: string, options: PiCsvOptions): AlignmentInput {
  const records = parseCsvRecords(text, guessDelimiter(text));
  const [header, ...rows] = records;
  if (!header) throw new ExchangeInputError("invalid_rows", "The CSV file is empty.", { rows: [{ row: 1, message: "empty file" }] });
  const { columns, errors } = mapPiColumns(header.fields);
  if (errors.length === 0 && rows.length < 2) errors.push({ row: header.line, message: `a PI list needs at least 2 points, got ${rows.length}` });
  if (errors.length) throw new ExchangeInputError("invalid_rows", `The PI list has ${errors.length} problem(s): ${errors[0]!.message}.`, { rows: errors });
  const points = rows.map((rec, i) => readPoint(rec, columns, i === 0 || i === rows.length - 1, errors));
  if (errors.length) throw new ExchangeInputError("invalid_rows", `The PI list has ${errors.length} problem(s); the first is on row ${errors[0]!.row}: ${errors[0]!.message}.`, { rows: errors });
  const alignment: AlignmentInput = { units: options.units, startStation: options.startStation ?? 0, points: points as AlignmentPointInput[] };
  checkGeometry(alignment, rows.map((r) => r.line));
  return alignment;
}

/** Header Takeline writes; {@link readPiCsv} reads it back. */
export const PI_CSV_HEADER = ["x", "y", "curve_type", "radius", "radius2", "delta1", "tangent_pc"] as const;

/** Writes an alignment's PI list as CSV (RFC 4180, CRLF line ends, plain numbers, blank = not given). */
export function writePiCsv(alignment: AlignmentInput): string {
  const num = (v: number | undefined) => (v === undefined ? "" : formatPlainNumber(v));
  const lines = alignment.points.map((p) => {
    const c = p.curve;
    const base = [num(p.x), num(p.y)];
    if (!c) return [...base, "none", "", "", "", ""];
    if (c.type === "simple") return [...base, "simple", num(c.radius), "", "", ""];
    return [...base, "compound", num(c.radius1), num(c.radius2), num("delta1" in c ? c.delta1 : undefined), num("tangentPC" in c ? c.tangentPC : undefined)];
  });
  return [PI_CSV_HEADER.join(","), ...lines.map((l) => l.join(","))].join("\r\n") + "\r\n";
}

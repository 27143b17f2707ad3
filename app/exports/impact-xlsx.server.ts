import { PassThrough, type Readable } from "node:stream";
import ExcelJS from "exceljs";
import { columnLabel, IMPACT_COLUMNS, type CellValue } from "./impact-columns";
import { summarizeImpactRows } from "./impact-summary";
import type { ImpactExportSheet } from "./impact-types";
import { NUMBER_FORMATS, summaryColumns } from "./impact-xlsx-layout";
import { columnLetter, quoteSheetName, sanitizeSheetName } from "./xlsx-sheet-names";

/** Options of the XLSX export. */
export interface ImpactXlsxOptions {
  projectName: string;
  /** Workbook dates (default now). */
  created?: Date;
}

type Worksheet = ExcelJS.Worksheet;
const FROZEN_HEADER = [{ state: "frozen" as const, xSplit: 0, ySplit: 1 }];
const NOTE = "Costs are order-of-magnitude estimates for comparing alternatives, not appraisals.";

/** Column width in characters: the longest heading or value, plus padding, within 8–60. */
function widthOf(texts: string[]): number {
  return Math.min(60, Math.max(8, ...texts.map((t) => t.length + 2)));
}

function cellOf(value: CellValue): string | number | null {
  return Array.isArray(value) ? value.join("; ") : value;
}

function addAlternativeSheet(book: ExcelJS.stream.xlsx.WorkbookWriter, name: string, sheet: ImpactExportSheet): void {
  const ws: Worksheet = book.addWorksheet(name, { views: FROZEN_HEADER });
  const values = sheet.rows.map((r) => IMPACT_COLUMNS.map((c) => cellOf(c.value(r, sheet.alternativeName))));
  ws.columns = IMPACT_COLUMNS.map((c, i) => {
    const header = columnLabel(c, sheet.units);
    const texts = values.map((row) => (typeof row[i] === "number" ? (row[i] as number).toFixed(2) : String(row[i] ?? "")));
    return { header, key: c.key, width: widthOf([header, ...texts]), style: NUMBER_FORMATS[c.kind] ? { numFmt: NUMBER_FORMATS[c.kind] } : {} };
  });
  ws.getRow(1).font = { bold: true };
  ws.autoFilter = `A1:${columnLetter(IMPACT_COLUMNS.length - 1)}1`;
  ws.getRow(1).commit();
  for (const v of values) ws.addRow(v).commit();
  ws.commit();
}

function addSummarySheet(book: ExcelJS.stream.xlsx.WorkbookWriter, sheets: readonly ImpactExportSheet[], names: string[]): void {
  const columns = summaryColumns(sheets[0]!.units);
  const ws: Worksheet = book.addWorksheet("Summary", { views: FROZEN_HEADER });
  ws.columns = [
    { header: "Alternative", key: "alternative", width: widthOf(["Alternative", ...sheets.map((s) => s.alternativeName)]) },
    ...columns.map((c) => ({ header: c.label, key: c.label, width: widthOf([c.label, "999,999,999"]), style: { numFmt: NUMBER_FORMATS[c.kind]! } })),
  ];
  ws.getRow(1).font = { bold: true };
  ws.getRow(1).commit();
  const results = sheets.map((s) => columns.map((c) => c.value(summarizeImpactRows(s.rows), s)));
  sheets.forEach((s, k) => {
    const last = s.rows.length + 1;
    const cells = columns.map((c, j) => {
      const result = results[k]![j]!;
      return c.formula && s.rows.length > 0 ? { formula: c.formula(quoteSheetName(names[k]!), last), result } : (result ?? null);
    });
    ws.addRow([s.alternativeName, ...cells]).commit();
  });
  const lastAlt = sheets.length + 1;
  const totals = columns.map((c, j) => {
    const parts = results.map((r) => r[j]);
    if (parts.every((p) => p === null)) return null;
    const letter = columnLetter(j + 1);
    return { formula: `SUM(${letter}2:${letter}${lastAlt})`, result: parts.reduce<number>((a, b) => a + (b ?? 0), 0) };
  });
  const totalRow = ws.addRow(["Total", ...totals]);
  totalRow.font = { bold: true };
  totalRow.commit();
  ws.addRow([]).commit();
  ws.addRow([NOTE]).commit();
  ws.commit();
}

/**
 * Streams an XLSX workbook of the impact tables (exceljs streaming writer): a "Summary" sheet
 * with one row per alternative — each figure a formula over that alternative's sheet, saved
 * with its computed result — and a bold "Total" row of SUM formulas; then one sheet per
 * alternative with every impact column. Real number formats (areas 0.00, money #,##0, shares
 * 0.00 %), frozen bold header rows, auto-filter, column widths from the content, and sheet names
 * made valid for Excel (see sanitizeSheetName). All alternatives must share one unit.
 */
export function streamImpactXlsx(sheets: readonly ImpactExportSheet[], options: ImpactXlsxOptions): Readable {
  if (sheets.length === 0) throw new Error("streamImpactXlsx: no alternatives to export");
  const other = sheets.find((s) => s.units !== sheets[0]!.units);
  if (other) throw new Error(`streamImpactXlsx: all alternatives must share one unit ("${other.alternativeName}" is in ${other.units})`);
  const stream = new PassThrough();
  const book = new ExcelJS.stream.xlsx.WorkbookWriter({ stream, useStyles: true, useSharedStrings: true });
  book.creator = "Takeline";
  book.title = `${options.projectName}: impacts`;
  book.created = book.modified = options.created ?? new Date();
  const used = new Set(["summary"]);
  const names = sheets.map((s) => sanitizeSheetName(s.alternativeName, used));
  addSummarySheet(book, sheets, names);
  sheets.forEach((s, k) => addAlternativeSheet(book, names[k]!, s));
  book.commit().catch((e: unknown) => stream.destroy(e as Error));
  return stream;
}

/** The whole workbook as bytes (for small exports and tests). */
export async function writeImpactXlsx(sheets: readonly ImpactExportSheet[], options: ImpactXlsxOptions): Promise<Buffer> {
  const parts: Buffer[] = [];
  for await (const chunk of streamImpactXlsx(sheets, options)) parts.push(chunk as Buffer);
  return Buffer.concat(parts);
}

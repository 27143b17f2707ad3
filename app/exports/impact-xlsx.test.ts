import ExcelJS from "exceljs";
import { expect, test } from "vitest";
import { createImpactSheet, QUILLMERE_ORIGIN } from "../../tests/reference/exports-impact-rows";
import { ogrinfoSummary, ogrToGeoJson, withTempDir, writeInto } from "../../tests/reference/exports-gdal";
import { summarizeImpactRows } from "./impact-summary";
import type { ImpactExportSheet } from "./impact-types";
import { writeImpactXlsx } from "./impact-xlsx.server";
import { sanitizeSheetName } from "./xlsx-sheet-names";

const [X0, Y0] = QUILLMERE_ORIGIN;
const LONG = "Northern option via the old Quilmere quarry road [rev 3]";
const sheets = (): ImpactExportSheet[] => [createImpactSheet(LONG, "usft", X0, Y0), createImpactSheet("South: Wexlow/Fennick's", "usft", X0, Y0 - 900, "QS"), { alternativeName: "Do nothing", units: "usft", rows: [] }];

async function load(buffer: Buffer): Promise<ExcelJS.Workbook> {
  const book = new ExcelJS.Workbook();
  await book.xlsx.load(buffer as unknown as ArrayBuffer);
  return book;
}

type Formula = { formula: string; result: number };

/**
 * Evaluates the summary's SUM / COUNTA / COUNTIF formulas over the cells exceljs read back, so the
 * formulas are checked against the data they point at, not only their saved results.
 */
function evaluate(book: ExcelJS.Workbook, here: ExcelJS.Worksheet, formula: string): number {
  const m = /^(SUM|COUNTA|COUNTIF)\((?:'((?:[^']|'')+)'!)?([A-Z]+)(\d+):([A-Z]+)(\d+)(?:,"(\w+)")?\)$/.exec(formula);
  if (!m) throw new Error(`unexpected formula ${formula}`);
  const ws = m[2] ? book.getWorksheet(m[2].replace(/''/g, "'"))! : here;
  const cells = Array.from({ length: Number(m[6]) - Number(m[4]) + 1 }, (_, i) => ws.getCell(`${m[3]}${Number(m[4]) + i}`).value);
  const plain = cells.map((v) => (v !== null && typeof v === "object" && "result" in v ? (v as Formula).result : v));
  if (m[1] === "COUNTA") return plain.filter((v) => v !== null && v !== "").length;
  if (m[1] === "COUNTIF") return plain.filter((v) => v === m[7]).length;
  return plain.reduce<number>((a, v) => a + (typeof v === "number" ? v : 0), 0);
}

test("Summary: one row per alternative whose figures are the sums of its rows, and a Total row of their sums", async () => {
  const input = sheets();
  const book = await load(await writeImpactXlsx(input, { projectName: "Quillmere bypass" }));
  expect(book.worksheets.map((w) => w.name)).toEqual(["Summary", "Northern option via the old Qui", "South_ Wexlow_Fennick's", "Do nothing"]);
  const summary = book.getWorksheet("Summary")!;
  const header = (summary.getRow(1).values as unknown[]).slice(1);
  const col = (label: string) => header.indexOf(label) + 1;
  expect(header).toContain("Take area (US survey ft²)");
  input.forEach((s, k) => {
    const row = summary.getRow(k + 2);
    const expected = summarizeImpactRows(s.rows);
    expect(row.getCell(1).value).toBe(s.alternativeName);
    const take = row.getCell(col("Take area (US survey ft²)")).value;
    const cost = row.getCell(col("Estimated cost")).value;
    if (s.rows.length === 0) return expect([take, cost]).toEqual([0, 0]);
    expect((take as Formula).result).toBeCloseTo(s.rows.reduce((a, r) => a + r.takeArea, 0), 9);
    expect((cost as Formula).result).toBeCloseTo(expected.cost.total, 6);
    for (let c = 2; c <= header.length; c++) {
      const v = row.getCell(c).value as Formula | number | null;
      if (v !== null && typeof v === "object") expect(evaluate(book, summary, v.formula)).toBeCloseTo(v.result, 6);
    }
  });
  const total = summary.getRow(input.length + 2);
  expect(total.getCell(1).value).toBe("Total");
  const allRows = input.flatMap((s) => s.rows);
  expect((total.getCell(col("Estimated cost")).value as Formula).result).toBeCloseTo(allRows.reduce((a, r) => a + r.cost.total, 0), 6);
  expect((total.getCell(col("Parcels affected")).value as Formula).result).toBe(allRows.length);
  expect((total.getCell(col("Buildings displaced")).value as Formula).result).toBe(allRows.reduce((a, r) => a + r.buildingsHit.length, 0));
  for (let c = 2; c <= header.length; c++) {
    const v = total.getCell(c).value as Formula | null;
    if (v) expect(evaluate(book, summary, v.formula)).toBeCloseTo(v.result, 6);
  }
});

test("every sheet has a frozen header row and real number formats: 0.00 for areas, #,##0 for money", async () => {
  const book = await load(await writeImpactXlsx(sheets(), { projectName: "Quillmere bypass" }));
  for (const ws of book.worksheets) expect(ws.views[0]).toMatchObject({ state: "frozen", ySplit: 1 });
  const alt = book.worksheets[1]!;
  const header = (alt.getRow(1).values as unknown[]).slice(1);
  const cellUnder = (label: string) => alt.getRow(2).getCell(header.indexOf(label) + 1);
  expect(cellUnder("Take area (US survey ft²)").numFmt).toBe("0.00");
  expect(cellUnder("Take area (US survey ft²)").value).toBe(40.5 * 12.25);
  expect(cellUnder("Estimated cost").numFmt).toBe("#,##0");
  expect(cellUnder("Share taken").numFmt).toBe("0.00%");
  expect(typeof cellUnder("Estimated cost").value).toBe("number");
  expect(cellUnder("Owner").value).toBe("Maradel Quonsey");
  expect(alt.getColumn(header.indexOf("Owner") + 1).width).toBeGreaterThanOrEqual("Corvell \"Wren\" Hatheway, trustee".length);
  const summary = book.getWorksheet("Summary")!;
  expect(summary.getRow(2).getCell(5).numFmt).toBe("0.00");
});

test("GDAL's XLSX driver reads the workbook: a layer per sheet, the rows, and the saved totals", async () => {
  const input = sheets();
  await withTempDir(async (dir) => {
    const path = writeInto(dir, "impacts.xlsx", await writeImpactXlsx(input, { projectName: "Quillmere bypass" }));
    const info = ogrinfoSummary(path);
    expect(info).toMatch(/Layer name: Summary/);
    expect(info).toMatch(/Layer name: Northern option via the old Qui\n[\s\S]*?Feature Count: 5/);
    const alt = ogrToGeoJson(path, ["-oo", "HEADERS=FORCE", "Northern option via the old Qui"]);
    expect(alt.features.map((f) => f.properties!["Parcel"])).toEqual(input[0]!.rows.map((r) => r.parcelId));
    alt.features.forEach((f, i) => expect(f.properties!["Take area (US survey ft²)"]).toBeCloseTo(input[0]!.rows[i]!.takeArea, 9));
    const summary = ogrToGeoJson(path, ["-oo", "HEADERS=FORCE", "Summary"]).features;
    const totalRow = summary.find((f) => f.properties!["Alternative"] === "Total")!;
    expect(totalRow.properties!["Estimated cost"]).toBeCloseTo(input.flatMap((s) => s.rows).reduce((a, r) => a + r.cost.total, 0), 6);
  });
});

test("sheet names follow Excel's rules: ≤ 31 characters, no : \\ / ? * [ ], no edge apostrophes, unique, not History", () => {
  const used = new Set(["summary"]);
  const names = ["Summary", "a".repeat(40), "a".repeat(40), "'quoted'", "History", "", "x/y:z?*[1]", "ÅSA ørnvik 🚧 option with a long name"].map((n) => sanitizeSheetName(n, used));
  expect(names).toEqual(["Summary (2)", "a".repeat(31), `${"a".repeat(27)} (2)`, "quoted", "History_", "Alternative", "x_y_z___1_", "ÅSA ørnvik 🚧 option with a lon"]);
  for (const n of names) expect(n.length).toBeLessThanOrEqual(31);
});

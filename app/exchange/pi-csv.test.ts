import { execFileSync } from "node:child_process";
import { expect, test } from "vitest";
import { computeAlignmentGeometry, type AlignmentInput } from "../geometry";
import { parseCsvRecords } from "./csv-records";
import { ExchangeInputError, type RowError } from "./exchange-errors";
import { readPiCsv, writePiCsv } from "./pi-csv";

const LINE: AlignmentInput = {
  units: "usft",
  startStation: 1000,
  points: [
    { x: 6_487_000, y: 1_840_000 },
    { x: 6_488_500.125, y: 1_840_400, curve: { type: "compound", radius1: 1910, radius2: 1145, delta1: 20.5 } },
    { x: 6_489_600, y: 1_842_100, curve: { type: "simple", radius: 1200 } },
    { x: 6_491_200, y: 1_842_300 },
    { x: 6_492_000, y: 1_843_400, curve: { type: "compound", radius1: 700, radius2: 1100, tangentPC: 600 } },
    { x: 6_493_500, y: 1_843_000 },
  ],
};

function rowErrors(f: () => unknown): RowError[] {
  try {
    f();
  } catch (e) {
    if (e instanceof ExchangeInputError) return e.details.rows ?? [];
    throw e;
  }
  throw new Error("expected the CSV to be refused");
}

test("a written PI list reads back to the same alignment", () => {
  const csv = writePiCsv(LINE);
  const back = readPiCsv(csv, { units: "usft", startStation: 1000 });
  expect(back).toEqual(LINE);
  const a = computeAlignmentGeometry(LINE).stations;
  const b = computeAlignmentGeometry(back).stations;
  expect(b.map((s) => [s.label, s.stationText])).toEqual(a.map((s) => [s.label, s.stationText]));
});

test("Python's csv module (an independent RFC 4180 reader) sees the header and plain numbers Takeline wrote", () => {
  const script = "import sys, csv, json\nprint(json.dumps(list(csv.reader(sys.stdin.read().splitlines()))))";
  const rows = JSON.parse(execFileSync("python3", ["-c", script], { input: writePiCsv(LINE), encoding: "utf8" })) as string[][];
  expect(rows[0]).toEqual(["x", "y", "curve_type", "radius", "radius2", "delta1", "tangent_pc"]);
  expect(rows[2]).toEqual(["6488500.125", "1840400", "compound", "1910", "1145", "20.5", ""]);
  expect(rows[5]).toEqual(["6492000", "1843400", "compound", "700", "1100", "", "600"]);
  expect(rows.slice(1).every((r) => r.slice(0, 2).every((v) => /^-?\d+(\.\d+)?$/.test(v)))).toBe(true);
});

test("headers are matched case-insensitively with aliases, semicolons and d°m's\" angles", () => {
  const csv = ['EASTING (m);Northing (m);Curve Type;R1;R2;Δ1;Note', "0;0;;;;;start", "600;0;simple;400;;;", '1100;500;;600;350;"25°30\'00""";', "1200;1300;none;;;;end"].join("\n");
  const a = readPiCsv(csv, { units: "m" });
  expect(a.startStation).toBe(0);
  expect(a.points[1]).toEqual({ x: 600, y: 0, curve: { type: "simple", radius: 400 } });
  // 25°30'00" = 25.5° (sexagesimal; the blank curve type is inferred from radius2).
  expect(a.points[2]).toEqual({ x: 1100, y: 500, curve: { type: "compound", radius1: 600, radius2: 350, delta1: 25.5 } });
  expect(a.points[3]).toEqual({ x: 1200, y: 1300 });
});

test("every bad row is reported with its line number in the file", () => {
  const csv = ["x,y,curve,radius", "0,0,simple,100", '"1,5",0,,', "", "700,300,simple,", "900,400,spiral,50", "1000,400,,"].join("\n");
  expect(rowErrors(() => readPiCsv(csv, { units: "m" }))).toEqual([
    { row: 2, column: "curveType", message: "the first and last points cannot carry a curve" },
    { row: 3, column: "x", message: '"1,5" is not a plain number (use a point for decimals, no thousands separators)' },
    { row: 5, column: "radius", message: "radius is required here" },
    { row: 6, column: "curveType", message: 'curve type must be none, simple or compound, got "spiral"' },
  ]);
  expect(rowErrors(() => readPiCsv("easting,elevation\n1,2\n3,4", { units: "m" }))).toEqual([{ row: 1, column: "y", message: "no y column (accepted names: y, northing, north, n)" }]);
});

test("a curve that does not fit its legs is reported on that PI's row", () => {
  // T = R tan(Δ/2) = 5000 · tan 45° far exceeds the 600 m leg.
  const csv = "x,y,curve_type,radius\n0,0,,\n600,0,simple,5000\n600,600,,\n";
  const [err] = rowErrors(() => readPiCsv(csv, { units: "m" }));
  expect(err!.row).toBe(3);
  expect(err!.message).toMatch(/needs 5000 of tangent/);
});

test("CSV records follow RFC 4180: quoted delimiters, doubled quotes, line breaks inside quotes, CRLF", () => {
  const recs = parseCsvRecords('a,"b,c","say ""hi"""\r\n"two\nlines",x,\r\n\r\nlast,,z');
  expect(recs).toEqual([
    { line: 1, fields: ["a", "b,c", 'say "hi"'] },
    { line: 2, fields: ["two\nlines", "x", ""] },
    { line: 5, fields: ["last", "", "z"] },
  ]);
  expect(() => parseCsvRecords('a,"b\n')).toThrow(/never closed/);
  expect(() => parseCsvRecords('a,b"c')).toThrow(/quote inside an unquoted field/);
});

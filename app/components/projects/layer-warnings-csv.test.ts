import { execFileSync } from "node:child_process";
import { expect, test } from "vitest";
import { writeLayerWarningsCsv, type LayerWarningRow } from "./layer-warnings-csv";

/** Python's csv module (RFC 4180 dialect "excel"): an independent reader of the text we write. */
function readWithPython(text: string): string[][] {
  const script = "import sys, csv, json\nprint(json.dumps(list(csv.reader(sys.stdin.read().splitlines(True)))))";
  return JSON.parse(execFileSync("python3", ["-c", script], { input: text, encoding: "utf8" })) as string[][];
}

const WARNINGS: LayerWarningRow[] = [
  { kind: "file", rows: [], parcelIds: [], reason: "1 pair of parcels overlap by more than 0.5 m² (largest: rows 1 and 2, 1000.00 m²); check the fabric." },
  { kind: "overlap", rows: [1, 2], parcelIds: ["QW-1", 'QW "2"'], area: 1000.000012345, reason: "the two parcels overlap by 1000.00 m²" },
  { kind: "repair", rows: [3], parcelIds: ["=HYPERLINK(1)"], reason: "closed 1 unclosed ring (first point repeated at the end)\nand more" },
];

test("one CSV line per warning, with both rows and parcel IDs of an overlap, read back field for field by Python's csv", () => {
  const text = writeLayerWarningsCsv(WARNINGS);
  expect(text.endsWith("\r\n")).toBe(true);
  expect(readWithPython(text)).toEqual([
    ["kind", "row", "parcel_id", "other_row", "other_parcel_id", "overlap_area", "reason"],
    ["file", "", "", "", "", "", WARNINGS[0]!.reason],
    ["overlap", "1", "QW-1", "2", 'QW "2"', "1000", "the two parcels overlap by 1000.00 m²"],
    // A parcel ID a spreadsheet would run as a formula is written as text (OWASP "CSV Injection", from memory).
    ["repair", "3", "'=HYPERLINK(1)", "", "", "", "closed 1 unclosed ring (first point repeated at the end)\nand more"],
  ]);
});

test("no warnings: the header line only", () => {
  expect(writeLayerWarningsCsv([])).toBe("kind,row,parcel_id,other_row,other_parcel_id,overlap_area,reason\r\n");
});

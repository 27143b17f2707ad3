import { execFileSync } from "node:child_process";
import { expect, test } from "vitest";
import { formatStationRange, writeParcelListCsv, type ParcelListRow } from "./parcel-list-csv";

/** Python's csv module, an RFC 4180 reader independent of ours. */
function readWithPython(csv: string): Record<string, string>[] {
  const script = "import sys, csv, json, io\nprint(json.dumps(list(csv.DictReader(io.StringIO(sys.stdin.read(), newline='')))))";
  return JSON.parse(execFileSync("python3", ["-c", script], { input: csv, encoding: "utf8" }));
}

// Invented Quillmere rows; the owner with a comma and quotes and the formula-like address test the quoting.
const ROWS: ParcelListRow[] = [
  { parcelId: "QM-0412", owner: 'Fenwarde, "Old Mill" Trust', address: "4 Brook Lane", takeArea: 1234.56789, remainderArea: 8765.4321, classification: "partial", estimatedCost: 98765.4321, stationFrom: 1120.5, stationTo: 1185.25 },
  { parcelId: "QM-0413", owner: null, address: "=1+2", takeArea: 50, remainderArea: 0, classification: "full", estimatedCost: 1000, stationFrom: 1185.25, stationTo: 1201 },
];

test("the agent's list reads back with Python's csv: unit-named header, every field, quoting and plain numbers", () => {
  const csv = writeParcelListCsv(ROWS, "m");
  expect(csv.split("\r\n")[0]).toBe("parcel_id,owner,address,take_area_m2,remainder_area_m2,classification,estimated_cost,station_from_m,station_to_m,station_range");
  const rows = readWithPython(csv);
  expect(rows).toEqual([
    {
      parcel_id: "QM-0412",
      owner: 'Fenwarde, "Old Mill" Trust',
      address: "4 Brook Lane",
      take_area_m2: "1234.5679",
      remainder_area_m2: "8765.4321",
      classification: "partial",
      estimated_cost: "98765.43",
      station_from_m: "1120.5",
      station_to_m: "1185.25",
      station_range: "1+120.500 to 1+185.250",
    },
    {
      parcel_id: "QM-0413",
      owner: "",
      // A leading "=" is defused so a spreadsheet does not run it as a formula.
      address: "'=1+2",
      take_area_m2: "50",
      remainder_area_m2: "0",
      classification: "full",
      estimated_cost: "1000",
      station_from_m: "1185.25",
      station_to_m: "1201",
      station_range: "1+185.250 to 1+201.000",
    },
  ]);
});

test("US projects name their columns in US survey feet and write stations as 12+34.56", () => {
  const csv = writeParcelListCsv(ROWS.slice(0, 1), "usft");
  expect(csv).toContain("take_area_usft2,remainder_area_usft2");
  expect(formatStationRange({ stationFrom: 1234.561, stationTo: 1300 }, "usft")).toBe("12+34.56 to 13+00.00");
});

test("an empty list is just the header", () => {
  expect(writeParcelListCsv([], "ft").split("\r\n")).toEqual(["parcel_id,owner,address,take_area_ft2,remainder_area_ft2,classification,estimated_cost,station_from_ft,station_to_ft,station_range", ""]);
});

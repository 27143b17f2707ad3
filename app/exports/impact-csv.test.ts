import { execFileSync } from "node:child_process";
import { expect, test } from "vitest";
import { createImpactRows, createImpactSheet, QUILLMERE_ORIGIN } from "../../tests/reference/exports-impact-rows";
import { streamImpactCsv, writeImpactCsv } from "./impact-csv";
import type { ImpactExportRow } from "./impact-types";

const [X0, Y0] = QUILLMERE_ORIGIN;

/** Python's csv module, an RFC 4180 reader independent of ours, as a list of dicts. */
function readWithPython(csv: string): Record<string, string>[] {
  const script = "import sys, csv, json, io\nprint(json.dumps(list(csv.DictReader(io.StringIO(sys.stdin.read(), newline='')))))";
  return JSON.parse(execFileSync("python3", ["-c", script], { input: csv, encoding: "utf8" }));
}

test("CSV of two alternatives: unit-named header, every row, text quoted per RFC 4180, numbers plain", async () => {
  const a = createImpactSheet("Northern option", "usft", X0, Y0);
  const b = createImpactSheet("Southern, via Wexlow", "usft", X0, Y0 - 500, "QS");
  const csv = await writeImpactCsv([a, b]);
  expect(csv.split("\r\n")[0]).toMatch(/^alternative,parcel_id,owner,address,classification,parcel_area_usft2,take_area_usft2,/);
  expect(csv).toContain("station_from_usft,station_to_usft,cost_land,");
  const rows = readWithPython(csv);
  expect(rows).toHaveLength(10);
  const all = [...a.rows.map((r) => [a.alternativeName, r] as const), ...b.rows.map((r) => [b.alternativeName, r] as const)];
  all.forEach(([alt, r], i) => {
    const got = rows[i]!;
    expect(got.alternative).toBe(alt);
    expect(got.parcel_id).toBe(r.parcelId);
    expect(got.owner).toBe(r.owner ?? "");
    expect(got.address).toBe(r.address ?? "");
    expect(Math.abs(Number(got.take_area_usft2) - r.takeArea)).toBeLessThanOrEqual(0.00005);
    expect(Math.abs(Number(got.cost_total) - r.cost.total)).toBeLessThanOrEqual(0.005);
    expect(Number(got.buildings_hit)).toBe(r.buildingsHit.length);
    expect(got.buildings_hit_ids).toBe(r.buildingsHit.join(";"));
    for (const v of Object.values(got).filter((v) => /^[-\d.]+$/.test(v))) expect(v).not.toMatch(/e|,/i);
  });
});

test("a formula-looking owner name is defused, and the numbers stay numbers", async () => {
  const [row] = createImpactRows(X0, Y0);
  const hostile: ImpactExportRow = { ...row!, owner: "=HYPERLINK(\"x\")", address: "-12 Fennick Row" };
  const [got] = readWithPython(await writeImpactCsv([{ alternativeName: "A", units: "m", rows: [hostile] }]));
  expect(got!.owner).toBe("'=HYPERLINK(\"x\")");
  expect(got!.address).toBe("'-12 Fennick Row");
  expect(got!.take_area_m2).toBe("496.125");
});

test("rows from an async source stream out in chunks, never as one string", async () => {
  const [template] = createImpactRows(X0, Y0);
  async function* many(): AsyncGenerator<ImpactExportRow> {
    for (let i = 0; i < 12_345; i++) yield { ...template!, parcelId: `QM-${i}` };
  }
  let chunks = 0;
  let lines = 0;
  for await (const chunk of streamImpactCsv([{ alternativeName: "Long", units: "m", rows: many() }], { rowsPerChunk: 1000 })) {
    chunks++;
    lines += chunk.split("\r\n").length - 1;
  }
  expect(lines).toBe(12_346);
  expect(chunks).toBe(1 + 13);
});

test("alternatives in different units cannot share one header", async () => {
  const a = createImpactSheet("A", "m", 0, 0);
  const b = createImpactSheet("B", "ft", 0, 0);
  await expect(writeImpactCsv([a, b])).rejects.toThrow(/share one unit/);
});

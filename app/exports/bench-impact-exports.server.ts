/**
 * Benchmark of the impact-table exports (prints figures; no goal is asserted):
 *
 *   npx tsx app/exports/bench-impact-exports.server.ts [rows]
 *
 * Builds `rows` invented takes (default 100,000; a 20-vertex polygon each) in EPSG:2229 and
 * times each format, with output size and the process's peak resident memory after each.
 */
import { resourceUsage } from "node:process";
import type { ImpactExportRow, ImpactExportSheet } from "./impact-types";
import { streamImpactCsv } from "./impact-csv";
import { streamImpactGeoJson } from "./impact-geojson";
import { writeImpactShapefileZip } from "./impact-shapefile.server";
import { streamImpactXlsx } from "./impact-xlsx.server";

const count = Number(process.argv[2] ?? 100_000);
const X0 = 6_487_000;
const Y0 = 1_840_000;

function row(i: number): ImpactExportRow {
  const cx = X0 + (i % 300) * 80;
  const cy = Y0 + Math.floor(i / 300) * 80;
  const ring = Array.from({ length: 20 }, (_, k) => [cx + 30 * Math.cos((k * Math.PI) / 10), cy + 30 * Math.sin((k * Math.PI) / 10)]);
  const cost = { land: 1000 + i, buildings: 0, severance: 250, easement: 40, administrative: 6500, contingency: 780, total: 8570 + i };
  return {
    parcelId: `QM-${i}`, owner: `Owner ${i} of Quillmere`, address: `${i} Fennick Row, Quillmere`, parcelArea: 9000, takeArea: 2800.5, easementArea: 120,
    remainderArea: 6199.5, takeFraction: 0.31, remainderPieces: 1, remainderPieceAreas: [6199.5], classification: "partial", buildingsHit: [], buildingsNear: [],
    cost, stationFrom: 1000 + i, stationTo: 1060 + i, geometry: [[[...ring, ring[0]!]]],
  };
}

async function drain(chunks: AsyncIterable<string | Buffer>): Promise<number> {
  let bytes = 0;
  for await (const c of chunks) bytes += typeof c === "string" ? Buffer.byteLength(c) : c.length;
  return bytes;
}

async function time(label: string, run: () => Promise<number> | number): Promise<void> {
  const t0 = performance.now();
  const bytes = await run();
  const ms = performance.now() - t0;
  const peakMb = resourceUsage().maxRSS / 1024;
  console.log(`${label.padEnd(10)} ${count} rows  ${ms.toFixed(0).padStart(7)} ms  ${((ms * 1000) / count).toFixed(1).padStart(6)} µs/row  ${(bytes / 1e6).toFixed(1).padStart(7)} MB  peak RSS ${peakMb.toFixed(0)} MB`);
}

const sheet: ImpactExportSheet = { alternativeName: "Bench", units: "usft", rows: Array.from({ length: count }, (_, i) => row(i)) };
await time("CSV", () => drain(streamImpactCsv([sheet])));
await time("GeoJSON", () => drain(streamImpactGeoJson([sheet], { workingEpsg: 2229 })));
await time("Shapefile", () => writeImpactShapefileZip([sheet], { workingEpsg: 2229 }).zip.length);
await time("XLSX", () => drain(streamImpactXlsx([sheet], { projectName: "Bench" })));

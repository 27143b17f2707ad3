import { expect, test } from "vitest";
import { progressFraction, UPLOAD_STAGES, type UploadProgress } from "./progress";
import { readParcelUpload } from "./read-parcel-upload.server";

test("stage shares add up to the whole, and each stage starts where the one before ended", () => {
  expect(UPLOAD_STAGES.reduce((s, x) => s + x.share, 0)).toBeCloseTo(1, 12);
  let before = 0;
  for (const s of UPLOAD_STAGES) {
    expect(progressFraction({ stage: s.stage, done: 0, total: 10 })).toBeCloseTo(before, 12);
    before += s.share;
    expect(progressFraction({ stage: s.stage, done: 10, total: 10 })).toBeCloseTo(before, 12);
  }
  expect(progressFraction({ stage: "attributes", done: 5, total: 10 })).toBeCloseTo(0.38 + 0.06, 12);
  expect(() => progressFraction({ stage: "nope" as never, done: 0, total: 1 })).toThrow(/unknown upload stage/);
});

/** 12,000 invented 10 m lots in WGS84 (about 0.0001°), as a GeoJSON upload. */
function manyLots(): Uint8Array {
  const features = Array.from({ length: 12_000 }, (_, i) => {
    const x = 14.5 + (i % 100) * 0.0002;
    const y = 47.8 + Math.floor(i / 100) * 0.0002;
    return { type: "Feature", properties: { APN: `QM-${i}` }, geometry: { type: "Polygon", coordinates: [[[x, y], [x + 0.0001, y], [x + 0.0001, y + 0.0001], [x, y + 0.0001], [x, y]]] } };
  });
  return new TextEncoder().encode(JSON.stringify({ type: "FeatureCollection", features }));
}

test("a large upload reports its stages in order with rising fractions, and lets other work run while it is read", async () => {
  const reports: UploadProgress[] = [];
  let ticks = 0;
  const timer = setInterval(() => ticks++, 0);
  try {
    const up = await readParcelUpload({ fileName: "lots.geojson", bytes: manyLots(), kind: "parcels", onProgress: (p) => reports.push(p) });
    expect(up.featureCount).toBe(12_000);
  } finally {
    clearInterval(timer);
  }
  expect([...new Set(reports.map((r) => r.stage))]).toEqual(["reading", "attributes", "coordinates", "overlaps"]);
  const fractions = reports.map(progressFraction);
  expect(fractions.every((f, i) => i === 0 || f >= fractions[i - 1]!)).toBe(true);
  expect(reports.filter((r) => r.stage === "coordinates").at(-1)).toEqual({ stage: "coordinates", done: 24_000, total: 24_000 });
  expect(reports.at(-1)).toEqual({ stage: "overlaps", done: 12_000, total: 12_000 });
  // 12,000 rows are handled in chunks of 5,000: the timer ran between chunks, not only at the end.
  expect(reports.filter((r) => r.stage === "attributes").map((r) => r.done)).toEqual([5000, 10_000, 12_000]);
  expect(ticks).toBeGreaterThanOrEqual(4);
});

import { expect, test } from "vitest";
import type { AlignmentInput } from "~/geometry/alignment-types";
import { computeAlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import { computeTakes } from "~/geometry/take-compute";
import { computeTakePolygons } from "~/geometry/take-polygons";
import type { PolygonCoords, TakeRules } from "~/geometry/take-types";
import { describeTake } from "./describe-take";

// Leg 0 runs east along y = 0; leg 2 runs from (1000, 400) to (500, −400) and crosses it at
// x = 750. A 100 m square around the crossing loses an X of two 20 m strips: 20 · 100 and
// 20 · 100 / sin θ, less the parallelogram they share, 20 · 20 / sin θ (closed form).
const CROSSING: AlignmentInput = { units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 1000, y: 0 }, { x: 1000, y: 400 }, { x: 500, y: -400 }] };
const SIN_THETA = 800 / Math.hypot(500, 800);
const X_TAKE = 20 * 100 + (20 * 100) / SIN_THETA - (20 * 20) / SIN_THETA;
const SQUARE: PolygonCoords = [[[700, -50], [800, -50], [800, 50], [700, 50], [700, -50]]];
const RULES: TakeRules = { remnantMinArea: 50, remnantMinFraction: 0.05, landValuePerArea: 40, buildingValue: 1e5, severancePercent: 10, easementRatePerArea: 4, adminCostPerParcel: 2000, contingencyPercent: 20, proximityDistance: 0 };
const corridor = { left: 10, right: 10 };
const elements = computeAlignmentGeometry(CROSSING).elements;

function shoelace(ring: number[][]): number {
  let s = 0;
  for (let i = 0; i + 1 < ring.length; i++) s += ring[i]![0]! * ring[i + 1]![1]! - ring[i + 1]![0]! * ring[i]![1]!;
  return s / 2;
}

test("the engine's take of a square the corridor crosses twice is the X of both strips, counted once (closed form)", () => {
  const takes = computeTakes({ elements, corridor, parcels: [{ parcelId: "QM-X", polygons: [SQUARE] }], rules: RULES });
  expect(takes.parcels[0]!.takeArea).toBeCloseTo(X_TAKE, 6);
  expect(takes.corridorArea).toBeCloseTo(takes.totals.parcelTakeArea + takes.totals.unparcelledArea, 6);
});

// The outlines are clipped (polyclip-ts) with one ring round the local corridor, which crosses
// itself here; these two tests hold that it is still read as the ground within it, counted once.
test("the drawn take polygon is the X itself: one polygon, one ring, of the take's area", () => {
  const [polygon] = computeTakePolygons({ elements, corridor, parcels: [{ parcelId: "QM-X", polygons: [SQUARE] }] });
  expect(polygon!.coordinates).toHaveLength(1);
  expect(polygon!.coordinates[0]).toHaveLength(1);
  expect(Math.abs(shoelace(polygon!.coordinates[0]![0]!))).toBeCloseTo(X_TAKE, 6);
});

test("the legal description walks the X once: 12 courses, its area and closure exact", () => {
  const d = describeTake({ elements, corridor, parcel: { parcelId: "QM-X", owner: "Invented Owner", polygons: [SQUARE] }, units: "m", crsName: "EPSG:32617", projectName: "Quillmere test", alternativeName: "Crossing" });
  expect(d).not.toBeNull();
  expect(d!.parts).toHaveLength(1);
  // Four arms, each with a parcel-line course at its end and a right-of-way line on each side.
  expect(d!.courses).toHaveLength(12);
  expect(d!.courses.filter((c) => c.kind === "line" && c.on === "parcel")).toHaveLength(4);
  expect(d!.area).toBeCloseTo(X_TAKE, 6);
  expect(d!.closure).toBeLessThan(1e-6);
});

import { expect, test } from "vitest";
import { buildAlignment } from "./build-alignment";
import { buildCorridor } from "./corridor-build";
import { computeDisplayTakes } from "./display-takes";

const shoelace = (ring: number[][]) => ring.slice(0, -1).reduce((s, p, i) => s + p[0]! * ring[i + 1]![1]! - ring[i + 1]![0]! * p[1]!, 0) / 2;
const areaOf = (polys: number[][][][]) => polys.reduce((s, rings) => s + rings.reduce((t, r, i) => t + (i === 0 ? 1 : -1) * Math.abs(shoelace(r)), 0), 0);

// Closed form (annular sector ½Δ(Ro² − Ri²) plus rectangles): tangents of 500 m either side of
// an arc R = 500 m, Δ = 90° left, half-widths 15 m left and 25 m right.
const elements = buildAlignment({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 1000, y: 0, curve: { type: "simple", radius: 500 } }, { x: 1000, y: 1000 }] }).elements;
const corridor = buildCorridor(elements, { left: 15, right: 25 });
const exact = (1000 + 250 * Math.PI) * 40 + 0.5 * (25 ** 2 - 15 ** 2) * (Math.PI / 2);

test("the drawn pieces of a parcel that holds the whole corridor cover its exact area to the chord tolerance", () => {
  const parcel = { parcelId: "ALL", polygons: [[[[-100, -100], [1200, -100], [1200, 1200], [-100, 1200], [-100, -100]]]] };
  const [take] = computeDisplayTakes(corridor, [parcel], 0.01);
  // Chords inside the outer arc lose at most ⅔·s per unit of arc (circular segment area ≈ ⅔·c·s).
  const bound = (2 / 3) * 0.01 * 525 * (Math.PI / 2);
  expect(Math.abs(areaOf(take!.coordinates) - exact)).toBeLessThan(bound);
  expect(Math.abs(areaOf(take!.coordinates) - exact)).toBeGreaterThan(0);
});

test("a parcel with a hole shows the take minus the hole, and a parcel away from the corridor shows nothing", () => {
  const holed = { parcelId: "HOLE", polygons: [[[[0, -50], [400, -50], [400, 50], [0, 50], [0, -50]], [[100, -10], [100, 10], [200, 10], [200, -10], [100, -10]]]] };
  const far = { parcelId: "FAR", polygons: [[[[3000, 3000], [3100, 3000], [3100, 3100], [3000, 3100], [3000, 3000]]]] };
  const takes = computeDisplayTakes(corridor, [holed, far]);
  expect(takes.map((t) => t.parcelId)).toEqual(["HOLE"]);
  // Tangent part only: 400 m × 40 m less the 100 m × 20 m hole.
  expect(areaOf(takes[0]!.coordinates)).toBeCloseTo(400 * 40 - 100 * 20, 6);
});

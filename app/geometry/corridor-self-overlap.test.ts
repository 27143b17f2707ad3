import { expect, test } from "vitest";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import { buildCorridor } from "./corridor-build";
import { findCorridorSelfOverlaps } from "./corridor-self-overlap";
import type { AlignmentInput } from "./alignment-types";

const X0 = 560_000;
const Y0 = 4_420_000;
const at = (x: number, y: number) => ({ x: X0 + x, y: Y0 + y });

test("a leg that crosses an earlier one overlaps it by the parallelogram W₁·W₂ / sin θ (closed form)", () => {
  // Leg 0 runs east along y = 0; leg 2 runs from (1000, 400) to (500, −400) and crosses it at x = 750.
  const alignment: AlignmentInput = { units: "m", startStation: 0, points: [at(0, 0), at(1000, 0), at(1000, 400), at(500, -400)] };
  const { elements } = computeAlignmentGeometry(alignment);
  const corridor = buildCorridor(elements, { left: 10, right: 10 });
  const overlaps = findCorridorSelfOverlaps(corridor);
  expect(overlaps).toHaveLength(1);
  // Two strips 20 m wide crossing at θ, sin θ = |u₀ × u₂| = 800 / √(500² + 800²): area 20 · 20 / sin θ.
  const sinTheta = 800 / Math.hypot(500, 800);
  expect(overlaps[0]!.area).toBeCloseTo((20 * 20) / sinTheta, 6);
  // Leg 0 is stations 0–1000; the crossing is 250 m before its end, on leg 2 (which starts at 1400).
  const [f0, f1] = overlaps[0]!.first;
  const [s0, s1] = overlaps[0]!.second;
  expect(f0).toBeLessThanOrEqual(750 - 10);
  expect(f1).toBeGreaterThanOrEqual(750 + 10);
  const crossingOnLeg2 = 1400 + Math.hypot(250, 400); // from (1000, 400) to (750, 0)
  expect(s0).toBeLessThanOrEqual(crossingOnLeg2);
  expect(s1).toBeGreaterThanOrEqual(crossingOnLeg2);
});

test("unequal half-widths: the overlap is still W₁·W₂ / sin θ, with each W = left + right", () => {
  const alignment: AlignmentInput = { units: "m", startStation: 0, points: [at(0, 0), at(1000, 0), at(1000, 600), at(600, -600)] };
  const { elements } = computeAlignmentGeometry(alignment);
  const overlaps = findCorridorSelfOverlaps(buildCorridor(elements, { left: 12, right: 18 }));
  const sinTheta = 1200 / Math.hypot(400, 1200);
  expect(overlaps.map((o) => o.area)).toHaveLength(1);
  expect(overlaps[0]!.area).toBeCloseTo((30 * 30) / sinTheta, 6);
});

test("an alignment with curves that never comes back on itself overlaps nowhere", () => {
  const alignment: AlignmentInput = {
    units: "m",
    startStation: 0,
    points: [at(0, 0), { ...at(2000, 1200), curve: { type: "simple", radius: 800 } }, { ...at(3700, 1000), curve: { type: "simple", radius: 1200 } }, { ...at(5300, 2800), curve: { type: "simple", radius: 600 } }, at(6700, 3200)],
  };
  const { elements } = computeAlignmentGeometry(alignment);
  expect(findCorridorSelfOverlaps(buildCorridor(elements, { left: 30, right: 30, easement: 5 }))).toEqual([]);
});

test("a hairpin whose return leg closes in on the first leg overlaps it where they come within a corridor's width", () => {
  // Legs at y = 0 and from (1000, 80) back to (0, 30): centrelines 30 m apart at x = 0, so with
  // 20 + 20 m of right-of-way the inner edges cross where the gap is 40 m (x = 200) and the ground
  // beyond is covered twice. (Parallel legs never overlap: the inside half-width must stay below R.)
  const alignment: AlignmentInput = { units: "m", startStation: 0, points: [at(0, 0), { ...at(1000, 0), curve: { type: "simple", radius: 30 } }, { ...at(1000, 80), curve: { type: "simple", radius: 30 } }, at(0, 30)] };
  const geometry = computeAlignmentGeometry(alignment);
  const overlaps = findCorridorSelfOverlaps(buildCorridor(geometry.elements, { left: 20, right: 20 }));
  expect(overlaps).toHaveLength(1);
  const end = geometry.elements[geometry.elements.length - 1]!.endStation;
  // The first stretch starts at the start and reaches x ≈ 200 (a little past, by the slope); the second ends at the end.
  expect(overlaps[0]!.first[0]).toBe(0);
  expect(overlaps[0]!.first[1]).toBeGreaterThan(200);
  expect(overlaps[0]!.first[1]).toBeLessThan(400);
  expect(overlaps[0]!.second[1]).toBeCloseTo(end, 9);
  // The ground covered twice is the triangle between leg 0's left line y = 20, leg 2's left line
  // y = 0.05x + 30 − 20·√(1 + 0.05²) and leg 2's flat end x = −0.05(y − 30) (closed form).
  const k = 20 * Math.hypot(1, 0.05);
  const A = [0.5, 20];
  const B = [(k - 10) / 0.05, 20];
  const cx = (-0.05 * (30 - k - 30)) / (1 + 0.05 * 0.05);
  const C = [cx, 0.05 * cx + 30 - k];
  const triangle = 0.5 * Math.abs((B[0]! - A[0]!) * (C[1]! - A[1]!) - (C[0]! - A[0]!) * (B[1]! - A[1]!));
  expect(overlaps[0]!.area).toBeCloseTo(triangle, 6);
});

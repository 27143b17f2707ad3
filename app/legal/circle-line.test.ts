import { expect, test } from "vitest";
import { intersectLineCircle, nearestLineCirclePoint } from "./circle-line";

test("the line y = 3 meets the circle of radius 5 about the origin at x = ±4 (3-4-5 right triangle)", () => {
  const pts = intersectLineCircle([-10, 3], [10, 3], [0, 0], 5).sort((a, b) => a[0] - b[0]);
  expect(pts).toHaveLength(2);
  expect(pts[0]![0]).toBeCloseTo(-4, 12);
  expect(pts[1]![0]).toBeCloseTo(4, 12);
  for (const p of pts) expect(p[1]).toBeCloseTo(3, 12);
});

test("far from the origin the roots keep their digits, and the nearer one is picked", () => {
  // Grid-sized coordinates: circle R 500 about (562000, 4419000), a chord line 300 m from the centre → x = ±400.
  const c: [number, number] = [562000, 4419000];
  const p = nearestLineCirclePoint([561000, 4419300], [563000, 4419300], c, 500, [562399.9, 4419300.0004]);
  expect(p![0] - 562400).toBeCloseTo(0, 7);
  expect(p![1] - 4419300).toBeCloseTo(0, 7);
});

test("a line that misses the circle gives no point, a tangent one gives the touch point", () => {
  expect(intersectLineCircle([-10, 6], [10, 6], [0, 0], 5)).toEqual([]);
  const touch = intersectLineCircle([-10, 5], [10, 5], [0, 0], 5);
  for (const p of touch) expect(Math.hypot(p[0], p[1] - 5)).toBeLessThan(1e-7);
});

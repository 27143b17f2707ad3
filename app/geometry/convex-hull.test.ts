import { expect, test } from "vitest";
import { convexHull, convexPolygonsOverlap } from "./convex-hull";
import type { Vec2 } from "./vec2";

const square = (x: number, y: number, s = 1): Vec2[] => [[x, y], [x + s, y], [x + s, y + s], [x, y + s]];

test("the hull of a square's corners and inner points is the square, counter-clockwise", () => {
  const hull = convexHull([[0.5, 0.5], ...square(0, 0), [0.5, 0], [0.2, 0.9]]);
  expect(hull).toEqual([[0, 0], [1, 0], [1, 1], [0, 1]]);
});

test("separating axes: apart, touching along an edge, overlapping, and diagonal near-misses", () => {
  expect(convexPolygonsOverlap(square(0, 0), square(2, 0))).toBe(false);
  expect(convexPolygonsOverlap(square(0, 0), square(1, 0))).toBe(false); // a shared edge is not an overlap
  expect(convexPolygonsOverlap(square(0, 0), square(0.5, 0.5))).toBe(true);
  // A diamond whose edge x + y = 2.1 passes 0.07 beyond the square's corner (1, 1): their x and y
  // extents overlap, so only the diamond's own edge normal separates them.
  const diamond: Vec2[] = [[1.3, 0.8], [1.8, 1.3], [1.3, 1.8], [0.8, 1.3]];
  expect(convexPolygonsOverlap(square(0, 0), diamond)).toBe(false);
  expect(convexPolygonsOverlap(square(0, 0), diamond.map(([x, y]) => [x - 0.1, y - 0.1] as Vec2))).toBe(true);
});

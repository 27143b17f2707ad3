import { expect, test } from "vitest";
import { geosAreas, geosValid } from "../fabric/test-support/reference-tools.server";
import { findStationOffset } from "./alignment-locate";
import { buildCorridor } from "./corridor-build";
import { flatRingArea } from "./corridor-pieces";
import { corridorOutline, easementOutline } from "./corridor-outline";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import type { Vec2 } from "./vec2";

// Curves both ways, no angle points (so every outline vertex sits on a parallel of a tangent or an arc).
const elements = computeAlignmentGeometry({
  units: "m",
  startStation: 0,
  points: [{ x: 0, y: 0 }, { x: 500, y: 0, curve: { type: "simple", radius: 250 } }, { x: 800, y: 400, curve: { type: "compound", radius1: 300, radius2: 500, delta1: 15 } }, { x: 1400, y: 450 }],
}).elements;
const corridor = buildCorridor(elements, { left: 18, right: 30, easement: 5 });
const ringArea = (ring: number[][]) => flatRingArea(ring.slice(0, -1).flat());
const perimeter = (ring: number[][]) => ring.slice(1).reduce((s, p, i) => s + Math.hypot(p[0]! - ring[i]![0]!, p[1]! - ring[i]![1]!), 0);

test("the outline is one closed counter-clockwise ring whose vertices lie on the right-of-way lines", () => {
  const [ring] = corridorOutline(corridor);
  expect(ring![0]).toEqual(ring![ring!.length - 1]);
  expect(ringArea(ring!)).toBeGreaterThan(0);
  for (const v of ring!) {
    const { offset } = findStationOffset(elements, v as Vec2);
    expect(Math.min(Math.abs(offset - 30), Math.abs(offset + 18))).toBeLessThan(1e-6);
  }
});

test("chords stay within the sagitta: midpoints are within 1 cm of the lines and the area within 1 cm × perimeter", () => {
  // Middle-ordinate bound (Schofield & Breach §10.1): a chord's midpoint is the sagitta from its arc.
  const [ring] = corridorOutline(corridor, 0.01);
  for (let i = 1; i < ring!.length; i++) {
    const a = ring![i - 1]!;
    const b = ring![i]!;
    const mid: Vec2 = [(a[0]! + b[0]!) / 2, (a[1]! + b[1]!) / 2];
    const { offset } = findStationOffset(elements, mid);
    const gap = Math.min(Math.abs(offset - 30), Math.abs(offset + 18));
    if (Math.hypot(b[0]! - a[0]!, b[1]! - a[1]!) < 40) expect(gap).toBeLessThanOrEqual(0.01 + 1e-9); // caps are 48 m across
  }
  expect(Math.abs(ringArea(ring!) - corridor.area)).toBeLessThan(0.01 * perimeter(ring!));
});

test("GEOS finds the outline and the two easement strips valid, with the areas of the exact corridor", () => {
  const outline = { type: "Polygon", coordinates: corridorOutline(corridor, 0.001) };
  const strips = { type: "MultiPolygon", coordinates: easementOutline(corridor, 0.001) };
  expect(easementOutline(corridor).length).toBe(2);
  expect(geosValid([outline, strips])).toEqual([true, true]);
  const [a, e] = geosAreas([outline, strips]);
  expect(Math.abs(a! - corridor.area)).toBeLessThan(0.001 * perimeter(outline.coordinates[0]!));
  expect(Math.abs(e! - corridor.easementArea)).toBeLessThan(0.001 * 2 * perimeter(outline.coordinates[0]!));
  expect(easementOutline(buildCorridor(elements, { left: 18, right: 30 }))).toEqual([]);
});

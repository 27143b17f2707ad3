import { expect, test } from "vitest";
import type { AlignmentInput } from "~/geometry/alignment-types";
import { curveOfKind, deflectionDeg, deletePoint, findNearestLeg, footOnSegment, insertPoint, movePoint, setCurve } from "./alignment-edits";

const line = (points: AlignmentInput["points"]): AlignmentInput => ({ units: "m", startStation: 0, points });

const zigzag = line([
  { x: 0, y: 0 },
  { x: 1000, y: 0, curve: { type: "simple", radius: 300 } },
  { x: 1000, y: 1000, curve: { type: "simple", radius: 250 } },
  { x: 2000, y: 1000 },
]);

test("the foot of a perpendicular is the closed-form projection: a 3-4-5 triangle gives distance 4", () => {
  // p = (3, 4) over the segment (0,0)→(10,0): foot (3, 0), distance 4, t = 0.3 (closed form).
  const foot = footOnSegment([3, 4], [0, 0], [10, 0]);
  expect(foot.t).toBeCloseTo(0.3, 12);
  expect(foot.distance).toBeCloseTo(4, 12);
  // Beyond the end the foot clamps to the end point: (13, 4) is 5 from (10, 0) (3-4-5 again).
  expect(footOnSegment([13, 4], [0, 0], [10, 0])).toEqual({ t: 1, distance: 5 });
});

test("a click goes into the leg it is nearest to, as a PI without a curve", () => {
  expect(findNearestLeg(zigzag.points, [500, 30])).toBe(0);
  expect(findNearestLeg(zigzag.points, [980, 600])).toBe(1);
  expect(findNearestLeg(zigzag.points, [1500, 1100])).toBe(2);
  const { alignment, index } = insertPoint(zigzag, [980, 600]);
  expect(index).toBe(2);
  expect(alignment.points.map((p) => [p.x, p.y])).toEqual([[0, 0], [1000, 0], [980, 600], [1000, 1000], [2000, 1000]]);
  expect(alignment.points[2]!.curve).toBeUndefined();
  expect(alignment.points[1]!.curve).toEqual({ type: "simple", radius: 300 });
});

test("moving a PI keeps its curve and leaves the others alone", () => {
  const moved = movePoint(zigzag, 1, [1010, -20]);
  expect(moved.points[1]).toEqual({ x: 1010, y: -20, curve: { type: "simple", radius: 300 } });
  expect(moved.points[2]).toBe(zigzag.points[2]);
  expect(zigzag.points[1]!.x).toBe(1000);
});

test("deleting keeps two points at least, and a new end point loses its curve", () => {
  const noFirst = deletePoint(zigzag, 0);
  expect(noFirst.points).toHaveLength(3);
  expect(noFirst.points[0]).toEqual({ x: 1000, y: 0 });
  expect(noFirst.points[1]!.curve).toEqual({ type: "simple", radius: 250 });
  const two = line([{ x: 0, y: 0 }, { x: 10, y: 0 }]);
  expect(deletePoint(two, 1)).toBe(two);
});

test("the ends never take a curve", () => {
  expect(setCurve(zigzag, 0, { type: "simple", radius: 100 })).toBe(zigzag);
  expect(setCurve(zigzag, 3, { type: "simple", radius: 100 })).toBe(zigzag);
  expect(setCurve(zigzag, 1, undefined).points[1]).toEqual({ x: 1000, y: 0 });
});

test("the deflection at a PI is the signed angle between the tangents (left positive)", () => {
  // Right angle turns: east then north is a 90° left turn, north then east a 90° right turn.
  expect(deflectionDeg(zigzag.points, 1)).toBeCloseTo(90, 12);
  expect(deflectionDeg(zigzag.points, 2)).toBeCloseTo(-90, 12);
  const c30 = Math.cos(Math.PI / 6);
  const thirty = line([{ x: 0, y: 0 }, { x: 100, y: 0 }, { x: 100 + 100 * c30, y: -50 }]);
  expect(deflectionDeg(thirty.points, 1)).toBeCloseTo(-30, 10);
});

test("a new compound curve starts at R2 = 1.5·R1 (TxDOT RDM §4.7.1 ratio limit) with Δ1 = Δ/2", () => {
  expect(curveOfKind("compound", { type: "simple", radius: 400 }, -36, 500)).toEqual({ type: "compound", radius1: 400, radius2: 600, delta1: 18 });
  expect(curveOfKind("simple", { type: "compound", radius1: 350, radius2: 500, delta1: 10 }, 20, 500)).toEqual({ type: "simple", radius: 350 });
  expect(curveOfKind("simple", undefined, 20, 500)).toEqual({ type: "simple", radius: 500 });
  expect(curveOfKind("none", { type: "simple", radius: 400 }, 20, 500)).toBeUndefined();
});

import { expect, test } from "vitest";
import type { AlignmentInput } from "~/geometry/alignment-types";
import { computeAlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import { findInsertionPoint, insertPointAfter } from "./pi-insertion";

// Two right-angle turns: PI 1 (R 300) and PI 2 (R 250), each Δ = 90°, so T = R·tan(45°) = R
// (Schofield & Breach, Engineering Surveying, 6th ed., §10.1).
const zigzag: AlignmentInput = {
  units: "m",
  startStation: 0,
  points: [
    { x: 0, y: 0 },
    { x: 1000, y: 0, curve: { type: "simple", radius: 300 } },
    { x: 1000, y: 1000, curve: { type: "simple", radius: 250 } },
    { x: 2000, y: 1000 },
  ],
};
const curves = computeAlignmentGeometry(zigzag).curves;

test("after the POB the new PI is half-way along the tangent up to the first PC: (1000 − 300) / 2 = 350", () => {
  const p = findInsertionPoint(zigzag, 0, curves)!;
  expect(p[0]).toBeCloseTo(350, 9);
  expect(p[1]).toBeCloseTo(0, 9);
});

test("between two curves it is half-way from PT to PC: 300 + (1000 − 300 − 250) / 2 = 525 from PI 1", () => {
  const p = findInsertionPoint(zigzag, 1, curves)!;
  expect(p[0]).toBeCloseTo(1000, 9);
  expect(p[1]).toBeCloseTo(525, 9);
});

test("a PI on the tangent leaves both curves, their stations and the line's length as they were", () => {
  const before = computeAlignmentGeometry(zigzag);
  const p = findInsertionPoint(zigzag, 1, curves)!;
  const { alignment, index } = insertPointAfter(zigzag, 1, [Math.round(p[0] * 1000) / 1000, Math.round(p[1] * 1000) / 1000]);
  expect(index).toBe(2);
  expect(alignment.points[2]).toEqual({ x: 1000, y: 525 });
  expect(alignment.points[3]).toBe(zigzag.points[2]);
  const after = computeAlignmentGeometry(alignment);
  expect(after.length).toBeCloseTo(before.length, 9);
  expect(after.curves.map((c) => [c.piIndex, c.tangentPC, c.pcStation])).toEqual([
    [1, before.curves[0]!.tangentPC, before.curves[0]!.pcStation],
    [3, before.curves[1]!.tangentPC, before.curves[1]!.pcStation],
  ]);
});

test("after the last point the line goes on along its last leg by half that leg (1000 / 2 = 500)", () => {
  expect(findInsertionPoint(zigzag, 3, curves)).toEqual([2500, 1000]);
  const { alignment, index } = insertPointAfter(zigzag, 3, [2500, 1000]);
  expect(index).toBe(4);
  expect(alignment.points.map((q) => [q.x, q.y])).toEqual([[0, 0], [1000, 0], [1000, 1000], [2000, 1000], [2500, 1000]]);
});

test("when the tangents already overrun the leg the new PI is the leg's midpoint", () => {
  const tight = { ...zigzag, points: [{ x: 0, y: 0 }, { x: 1000, y: 0 }, { x: 1000, y: 400 }, { x: 2000, y: 400 }] };
  const overrun = [
    { ...curves[0]!, piIndex: 1, tangentPT: 300 },
    { ...curves[1]!, piIndex: 2, tangentPC: 250 },
  ];
  expect(findInsertionPoint(tight, 1, overrun)).toEqual([1000, 200]);
  expect(findInsertionPoint(tight, 7, overrun)).toBeNull();
});

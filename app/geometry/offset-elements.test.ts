import { expect, test } from "vitest";
import fc from "fast-check";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import type { AlignmentInput, ArcElement } from "./alignment-types";
import { findStationOffset } from "./alignment-locate";
import { offsetElements } from "./offset-elements";
import { degToRad } from "./angles";
import { distanceBetween } from "./vec2";
import { GeometryInputError } from "./errors";

const LINE: AlignmentInput = {
  units: "m",
  startStation: 0,
  points: [
    { x: 0, y: 0 },
    { x: 500, y: 0, curve: { type: "simple", radius: 300 } },
    { x: 800, y: 400 },
    { x: 1300, y: 500, curve: { type: "compound", radius1: 250, radius2: 500, delta1: 20 } },
    { x: 1500, y: 1200 },
  ],
};

test("offset arcs are concentric with radius R + w (left-hand) or R − w (right-hand) and length (R ± w)Δ", () => {
  // Exact parallel curves (closed-form geometry); sign convention: w > 0 is right of the line.
  const g = computeAlignmentGeometry(LINE);
  fc.assert(
    fc.property(fc.double({ min: -200, max: 200, noNaN: true }), (w) => {
      const shifted = offsetElements(g.elements, w);
      shifted.forEach((e, i) => {
        const c = g.elements[i]!;
        if (e.type !== "arc" || c.type !== "arc") return;
        const expected = c.direction === "left" ? c.radius + w : c.radius - w;
        expect(e.radius).toBeCloseTo(expected, 9);
        expect(e.center).toEqual(c.center);
        expect(distanceBetween(e.start, e.center)).toBeCloseTo(expected, 8);
        expect(e.length).toBeCloseTo(expected * degToRad(Math.abs(c.deltaDeg)), 8);
      });
    }),
    { numRuns: 500, seed: 5 },
  );
});

test("every offset vertex lies at the signed distance w from the centreline", () => {
  const g = computeAlignmentGeometry(LINE, { offsets: [12.5, -30] });
  for (const { offset, elements } of g.offsets) {
    elements.forEach((e, i) => {
      // Angle-point mitres move tangent ends off the perpendicular, so test the arcs and tangent middles.
      const mid: [number, number] = e.type === "arc" ? e.start : [(e.start[0] + e.end[0]) / 2, (e.start[1] + e.end[1]) / 2];
      if (e.type === "arc" || i > 0) expect(findStationOffset(g.elements, mid).offset).toBeCloseTo(offset, 7);
    });
  }
});

test("at an angle point the offset tangents are mitred to meet", () => {
  const g = computeAlignmentGeometry(LINE, { offsets: [20] });
  const els = g.offsets[0]!.elements;
  for (let i = 0; i + 1 < els.length; i++) expect(distanceBetween(els[i]!.end, els[i + 1]!.start)).toBeLessThan(1e-8);
});

test("an offset reaching the centre of a curve is refused", () => {
  const g = computeAlignmentGeometry(LINE);
  const arc = g.elements.find((e): e is ArcElement => e.type === "arc" && e.direction === "left")!;
  expect(() => offsetElements(g.elements, -arc.radius)).toThrow(GeometryInputError);
});

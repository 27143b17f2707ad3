import { expect, test } from "vitest";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import type { AlignmentInput } from "./alignment-types";
import { GeometryInputError, type GeometryErrorCode } from "./errors";

function expectCode(input: AlignmentInput, code: GeometryErrorCode, options = {}): GeometryInputError {
  try {
    computeAlignmentGeometry(input, options);
  } catch (e) {
    expect(e).toBeInstanceOf(GeometryInputError);
    expect((e as GeometryInputError).code).toBe(code);
    return e as GeometryInputError;
  }
  throw new Error("expected a GeometryInputError");
}

const base = (curve: AlignmentInput["points"][number]["curve"], next = { x: 1000, y: 1000 }): AlignmentInput => ({
  units: "ft",
  startStation: 0,
  points: [{ x: 0, y: 0 }, { x: 1000, y: 0, curve }, next],
});

test("a curve whose tangent overruns the leg is refused, naming the PI", () => {
  const e = expectCode(base({ type: "simple", radius: 1500 }), "tangent_overrun");
  expect(e.details?.piIndex).toBe(1);
  expect(e.message).toContain("PI 1");
});

test("two curves whose tangents together overrun their shared leg are refused", () => {
  const input: AlignmentInput = {
    units: "m",
    startStation: 0,
    points: [
      { x: 0, y: 0 },
      { x: 1000, y: 0, curve: { type: "simple", radius: 600 } },
      { x: 1000, y: 500, curve: { type: "simple", radius: 600 } },
      { x: 2000, y: 500 },
    ],
  };
  expect(expectCode(input, "tangent_overrun").message).toContain("PI 1 and PI 2");
});

test("a curve at a PI where the line does not turn is refused", () => {
  expectCode(base({ type: "simple", radius: 100 }, { x: 2000, y: 0 }), "zero_deflection");
});

test("a repeated PI is refused", () => {
  expectCode({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 0, y: 0 }, { x: 5, y: 5 }] }, "repeated_point");
});

test("a curve on the first point, too few points, bad units or NaN coordinates are refused", () => {
  expectCode({ units: "m", startStation: 0, points: [{ x: 0, y: 0, curve: { type: "simple", radius: 5 } }, { x: 9, y: 9 }] }, "invalid_alignment");
  expectCode({ units: "m", startStation: 0, points: [{ x: 0, y: 0 }] }, "invalid_alignment");
  expectCode({ units: "yd" as "m", startStation: 0, points: [{ x: 0, y: 0 }, { x: 1, y: 1 }] }, "invalid_unit");
  expectCode({ units: "m", startStation: 0, points: [{ x: 0, y: Number.NaN }, { x: 1, y: 1 }] }, "invalid_number");
});

test("a negative radius or a Δ1 beyond the PI's deflection is refused", () => {
  expectCode(base({ type: "simple", radius: -5 }), "out_of_range");
  expectCode(base({ type: "compound", radius1: 300, radius2: 200, delta1: 95 }), "invalid_angle");
});

test("a compound tangent PI→PC that no curve can have is refused with the allowed range", () => {
  const e = expectCode(base({ type: "compound", radius1: 300, radius2: 200, tangentPC: 50 }), "inconsistent_knowns");
  expect(e.message).toContain("tangent PI→PC is too short");
  expect(e.details?.piIndex).toBe(1);
});

test("an inside offset that reaches a radius is refused", () => {
  // Left-hand 200-ft curve: an offset of 250 ft to the left reaches past its centre.
  expectCode(base({ type: "simple", radius: 200 }), "offset_exceeds_radius", { offsets: [-250] });
});

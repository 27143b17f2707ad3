import { expect, test } from "vitest";
import fc from "fast-check";
import { formatDms, parseAngleDeg } from "./angles";
import { GeometryInputError } from "./errors";

// DMS arithmetic is sexagesimal by definition (common practice); the forms below are the ones
// surveyors type, as in Mahun OASL Horizontal Curves Set 2 (Δ = 45°49'45").
test("parses symbol, hyphen and space DMS forms to the same decimal degrees", () => {
  const expected = 38 + 15 / 60 + 20 / 3600;
  expect(parseAngleDeg(`38°15'20"`)).toBeCloseTo(expected, 12);
  expect(parseAngleDeg("38-15-20")).toBeCloseTo(expected, 12);
  expect(parseAngleDeg("38 15 20")).toBeCloseTo(expected, 12);
  expect(parseAngleDeg(`38° 15' 20"`)).toBeCloseTo(expected, 12);
});

test("parses decimal seconds, plain decimals and negative angles", () => {
  expect(parseAngleDeg(`38°15'20.5"`)).toBeCloseTo(38 + 15 / 60 + 20.5 / 3600, 12);
  expect(parseAngleDeg("38 15 20.5")).toBeCloseTo(38 + 15 / 60 + 20.5 / 3600, 12);
  expect(parseAngleDeg("38.2555")).toBe(38.2555);
  expect(parseAngleDeg(`-38°15'20"`)).toBeCloseTo(-(38 + 15 / 60 + 20 / 3600), 12);
  expect(parseAngleDeg("-12.5")).toBe(-12.5);
});

test("rejects text that is not an angle", () => {
  for (const bad of ["", "abc", "38°75'00\"", "38-15-60", "38.5-15-20", "N 38 E", "38°15'20\"x", "1e3"]) {
    expect(() => parseAngleDeg(bad), bad).toThrow(GeometryInputError);
  }
  expect(() => parseAngleDeg(Number.NaN)).toThrow(GeometryInputError);
});

test("formats DMS rounding 59.6 seconds up and carrying into minutes and degrees", () => {
  expect(formatDms(45 + 49 / 60 + 45 / 3600)).toBe(`45°49'45"`);
  expect(formatDms(10 + 59 / 60 + 59.6 / 3600)).toBe(`11°00'00"`);
  expect(formatDms(7 + 9 / 60 + 43.1 / 3600, { secondsDecimals: 1 })).toBe(`7°09'43.1"`);
  expect(formatDms(-(1 + 2 / 60 + 3 / 3600))).toBe(`-1°02'03"`);
});

test("format then parse returns the angle to half a displayed unit", () => {
  fc.assert(
    fc.property(fc.double({ min: -359.999, max: 359.999, noNaN: true }), (deg) => {
      const back = parseAngleDeg(formatDms(deg, { secondsDecimals: 2 }));
      expect(Math.abs(back - deg)).toBeLessThanOrEqual(0.005 / 3600 + 1e-12);
    }),
    { numRuns: 2000, seed: 20261201 },
  );
});

import { expect, test } from "vitest";
import fc from "fast-check";
import { formatStation, parseStation, stationStyleForUnits } from "./stations";
import { GeometryInputError } from "./errors";

test("US stations are 100 ft: 8+35.67 is 835.67 ft", () => {
  // Mahun OASL, Curves A.2 "Stationing".
  expect(parseStation("8+35.67")).toBeCloseTo(835.67, 10);
  expect(formatStation(835.67, "us")).toBe("8+35.67");
});

test("metric stations are km + m: 1+256.020 is 1256.02 m", () => {
  // Mahun OASL, Curves A.2 (1000-m stations, "1+256.02").
  expect(parseStation("1+256.020")).toBeCloseTo(1256.02, 10);
  expect(formatStation(3415.25, "metric")).toBe("3+415.250");
  expect(formatStation(5, "metric")).toBe("0+005.000");
});

test("negative stations keep the sign in front", () => {
  // Common practice: stations before the origin.
  expect(formatStation(-12.34, "us")).toBe("-0+12.34");
  expect(parseStation("-0+12.34")).toBeCloseTo(-12.34, 12);
  expect(formatStation(-1234.5, "metric")).toBe("-1+234.500");
});

test("rounding carries into the next station", () => {
  expect(formatStation(1299.999, "us")).toBe("13+00.00");
  expect(formatStation(2999.9996, "metric")).toBe("3+000.000");
});

test("the station style follows the unit", () => {
  expect(stationStyleForUnits("m")).toBe("metric");
  expect(stationStyleForUnits("ft")).toBe("us");
  expect(stationStyleForUnits("usft")).toBe("us");
});

test("rejects malformed station text", () => {
  for (const bad of ["12+3.45", "12+345.6", "abc", "1+2+3", "+"]) {
    expect(() => parseStation(bad, "us"), bad).toThrow(GeometryInputError);
  }
  expect(() => parseStation("12+34.56", "metric")).toThrow(GeometryInputError);
});

test("format then parse returns the station to the displayed precision", () => {
  fc.assert(
    fc.property(fc.double({ min: -1e6, max: 1e6, noNaN: true }), fc.constantFrom("us" as const, "metric" as const), (v, style) => {
      const back = parseStation(formatStation(v, style), style);
      expect(Math.abs(back - v)).toBeLessThanOrEqual((style === "us" ? 0.005 : 0.0005) + 1e-9);
    }),
    { numRuns: 2000, seed: 11 },
  );
});

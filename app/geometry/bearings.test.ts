import { expect, test } from "vitest";
import fc from "fast-check";
import { azimuthDegFromMathRad, azimuthDegOfVector, formatAzimuthAsBearing, mathRadFromAzimuthDeg, parseBearingToAzimuthDeg } from "./bearings";
import { GeometryInputError } from "./errors";

test("formats azimuths as quadrant bearings: 235.5° → S 55°30'00\" W, 123.456789° → S 56°32'36\" E", () => {
  // REFERENCES check value 10 (derived); bearing style of recorded deeds to the second
  // (Louisiana DOTD Location & Survey Manual Addendum A: "nearest second on bearing display").
  expect(formatAzimuthAsBearing(235.5)).toBe(`S 55°30'00" W`);
  expect(formatAzimuthAsBearing(123.456789)).toBe(`S 56°32'36" E`);
});

test("parses quadrant bearings in symbol and hyphen forms", () => {
  // Quadrant bearing convention (common practice): N/S first, angle from the meridian, E/W last.
  const az = 62 + 10 / 60 + 30 / 3600;
  expect(parseBearingToAzimuthDeg(`N 62°10'30" E`)).toBeCloseTo(az, 12);
  expect(parseBearingToAzimuthDeg("N62-10-30E")).toBeCloseTo(az, 12);
  expect(parseBearingToAzimuthDeg(`S 62°10'30" E`)).toBeCloseTo(180 - az, 12);
  expect(parseBearingToAzimuthDeg(`S 62°10'30" W`)).toBeCloseTo(180 + az, 12);
  expect(parseBearingToAzimuthDeg(`N 62°10'30" W`)).toBeCloseTo(360 - az, 12);
  expect(parseBearingToAzimuthDeg(`N 0°00'00" E`)).toBe(0);
});

test("a bearing a hair short of due east rounds to N 90°00'00\" E, not 60 seconds", () => {
  expect(formatAzimuthAsBearing(90 - 0.1 / 3600)).toBe(`N 90°00'00" E`);
  expect(formatAzimuthAsBearing(359.99999)).toBe(`N 0°00'00" E`);
});

test("rejects malformed bearings", () => {
  for (const bad of ["62°10'30\"", "N 95°00'00\" E", "E 10 N", "N -10 E", "N E"]) {
    expect(() => parseBearingToAzimuthDeg(bad), bad).toThrow(GeometryInputError);
  }
});

test("vector directions: north 0°, east 90°, south 180°, west 270°", () => {
  // Azimuth measured clockwise from grid north (common practice).
  expect(azimuthDegOfVector(0, 1)).toBe(0);
  expect(azimuthDegOfVector(1, 0)).toBe(90);
  expect(azimuthDegOfVector(0, -1)).toBe(180);
  expect(azimuthDegOfVector(-1, 0)).toBe(270);
  expect(() => azimuthDegOfVector(0, 0)).toThrow(GeometryInputError);
});

test("bearing text, azimuth and math direction round-trip", () => {
  fc.assert(
    fc.property(fc.double({ min: 0, max: 359.9999, noNaN: true }), (az) => {
      const text = formatAzimuthAsBearing(az, { secondsDecimals: 3 });
      const back = parseBearingToAzimuthDeg(text);
      const diff = Math.abs(((back - az + 540) % 360) - 180);
      expect(diff).toBeLessThanOrEqual(0.0005 / 3600 + 1e-11);
      const viaMath = azimuthDegFromMathRad(mathRadFromAzimuthDeg(az));
      expect(Math.abs(((viaMath - az + 540) % 360) - 180)).toBeLessThan(1e-9);
    }),
    { numRuns: 2000, seed: 7 },
  );
});

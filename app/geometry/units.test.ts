import { expect, test } from "vitest";
import { convertArea, convertLength, convertLengthFromMetres, convertLengthToMetres, parseLengthUnit } from "./units";
import { GeometryInputError } from "./errors";

test("one US survey foot is 1200/3937 m = 0.3048006096 m", () => {
  // NIST/NGS Federal Register notice 85 FR 62698 (2020), deprecation of the US survey foot.
  expect(convertLengthToMetres(1, "usft")).toBeCloseTo(0.3048006096, 10);
  expect(convertLengthToMetres(1, "ft")).toBe(0.3048);
});

test("a mile in survey feet exceeds a mile in international feet by 0.01056 ft", () => {
  // 85 FR 62698: "a difference of only one one-hundredth of a foot per mile" (2 ppm).
  expect(convertLength(5280, "usft", "ft") - 5280).toBeCloseTo(0.01056, 5);
});

test("metres round-trip through each unit", () => {
  // Common practice: conversions go through metres and must invert exactly up to round-off.
  for (const u of ["m", "ft", "usft"] as const) {
    expect(convertLengthToMetres(convertLengthFromMetres(1234.5678, u), u)).toBeCloseTo(1234.5678, 9);
  }
});

test("the international acre is 4046.8564224 m² and the US survey acre 4046.8726099 m²", () => {
  // NIST Handbook 44 App. C; 85 FR 62698 tabulates survey-foot units such as the acre.
  expect(convertArea(1, "acre", "m2")).toBeCloseTo(4046.8564224, 7);
  expect(convertArea(1, "usacre", "m2")).toBeCloseTo(4046.8726099, 6);
  expect(convertArea(43_560, "ft2", "acre")).toBeCloseTo(1, 12);
  expect(convertArea(43_560, "usft2", "usacre")).toBeCloseTo(1, 12);
});

test("a hectare is 10 000 m² and about 2.4710538 acres", () => {
  // 1 ha = 10 000 m² (SI); acres from NIST Handbook 44 App. C.
  expect(convertArea(1, "ha", "m2")).toBe(10_000);
  expect(convertArea(1, "ha", "acre")).toBeCloseTo(2.4710538, 6);
});

test("an unknown unit is a typed error", () => {
  expect(() => parseLengthUnit("yd")).toThrow(GeometryInputError);
});

import { expect, test } from "vitest";
import { computeChordDefinitionLength, computeDegreeFromRadius, computeRadiusFromDegree } from "./degree-of-curve";
import { degToRad, parseAngleDeg } from "./angles";
import { GeometryInputError } from "./errors";

test("D = 1° gives R = 5729.578 ft (100-ft arc), 5729.651 ft (100-ft chord), 1145.916 m (20-m arc)", () => {
  // Brockenbrough & Boedecker, Highway Engineering Handbook ch. 2 Eq. 2.3 (arc); Mohsen,
  // "Geometric Design" review (chord); Besavilla, Surveying for Licensure Exam (20-m arc).
  expect(computeRadiusFromDegree(1, "arc-100ft")).toBeCloseTo(5729.578, 3);
  expect(computeRadiusFromDegree(1, "chord-100ft")).toBeCloseTo(5729.651, 3);
  expect(computeRadiusFromDegree(1, "arc-20m")).toBeCloseTo(1145.916, 3);
});

test("D = 7°09'43.1\" (arc) is an 800.00-ft curve", () => {
  // Mahun OASL Horizontal Curves Set 2, problem 1.
  expect(computeRadiusFromDegree(parseAngleDeg(`7°09'43.1"`), "arc-100ft")).toBeCloseTo(800, 2);
});

test("degree and radius invert each other for every definition", () => {
  for (const def of ["arc-100ft", "arc-20m", "chord-100ft"] as const) {
    expect(computeRadiusFromDegree(computeDegreeFromRadius(637.25, def), def)).toBeCloseTo(637.25, 9);
  }
});

test("chord-definition lengths of the 1934 right-of-way description", () => {
  // U.S. Statutes at Large vol. 48 pt. 1 p. 789 (1934): printed 378.63, 385.3, 715.84 ft; the
  // chord model 100·Δ/Dc gives 378.61, 385.27, 715.79 (tolerance 0.05 ft for the print rounding).
  const cases: [number, string, string, number][] = [
    [487.79, "44-33-00", "11-46-00", 378.63],
    [596.497, "37-03-00", "9-37-00", 385.3],
    [646.838, "63-28-00", "8-52-00", 715.84],
  ];
  for (const [r, delta, dc, printed] of cases) {
    expect(computeDegreeFromRadius(r, "chord-100ft") * 3600).toBeCloseTo(parseAngleDeg(dc) * 3600, -0.5);
    expect(Math.abs(computeChordDefinitionLength(r, degToRad(parseAngleDeg(delta))) - printed)).toBeLessThan(0.06);
  }
});

test("a radius under 50 ft has no 100-ft chord", () => {
  expect(() => computeDegreeFromRadius(40, "chord-100ft")).toThrow(GeometryInputError);
  expect(() => computeRadiusFromDegree(-2, "arc-100ft")).toThrow(GeometryInputError);
});

import { expect, test } from "vitest";
import fc from "fast-check";
import { computeSimpleCurve } from "./simple-curve";
import { parseAngleDeg } from "./angles";
import { GeometryInputError } from "./errors";
import { parseStation } from "./stations";

const MAHUN_DELTA = parseAngleDeg(`45°49'45"`);

test("Mahun set 2: R 800 ft, Δ 45°49'45\" → T 338.17, L 639.90, LC 622.97, E 68.54, M 63.13", () => {
  // Mahun OASL Horizontal Curves Set 2, problem 1 (E and M derived there from the same curve).
  const c = computeSimpleCurve({ radius: 800, deltaDeg: MAHUN_DELTA });
  expect(c.tangent).toBeCloseTo(338.17, 2);
  expect(c.length).toBeCloseTo(639.9, 2);
  expect(c.longChord).toBeCloseTo(622.97, 2);
  expect(c.external).toBeCloseTo(68.54, 2);
  expect(c.middleOrdinate).toBeCloseTo(63.13, 2);
  expect(c.degreeOfCurveDeg! * 3600).toBeCloseTo(parseAngleDeg(`7°09'43.1"`) * 3600, -0.5);
});

test("Mahun set 2: PC 50+84.98 gives PT 57+24.88 and PI 54+23.15 (PT = PC + L, not PI + T)", () => {
  // Mahun OASL Horizontal Curves Set 2; Schofield & Breach 6th ed. §10.1 for the station rule.
  const c = computeSimpleCurve({ radius: 800, deltaDeg: MAHUN_DELTA, pcStation: parseStation("50+84.98") });
  expect(c.ptStation).toBeCloseTo(5724.88, 2);
  expect(c.piStation).toBeCloseTo(5423.15, 2);
  const fromPi = computeSimpleCurve({ radius: 800, deltaDeg: MAHUN_DELTA, piStation: c.piStation! });
  expect(fromPi.pcStation).toBeCloseTo(c.pcStation!, 9);
});

test("radius from degree of curve, and a contradicting pair is refused", () => {
  // R = 5729.578/D (Highway Engineering Handbook ch. 2 Eq. 2.3).
  const c = computeSimpleCurve({ degreeOfCurveDeg: 1, deltaDeg: 10 });
  expect(c.radius).toBeCloseTo(5729.578, 3);
  expect(() => computeSimpleCurve({ radius: 5000, degreeOfCurveDeg: 1, deltaDeg: 10 })).toThrow(GeometryInputError);
});

test("recorded deed chords from radius and arc length", () => {
  // Deed curves: Georgetown TX doc 525485 (168.92/313.15 → 166.88); Cabarrus County NC drainage
  // easement (254.40/326.00 → 247.99); Cherokee Co. GA exhibit (47.39/103.26 → 46.98); Maryland
  // State Archives am713 (272.22/713.09 → 270.57). Deeds round to 0.01 ft.
  const deeds: [number, number, number][] = [
    [313.15, 168.92, 166.88],
    [326.0, 254.4, 247.99],
    [103.26, 47.39, 46.98],
    [713.09, 272.22, 270.57],
  ];
  for (const [r, arc, chord] of deeds) {
    const c = computeSimpleCurve({ radius: r, deltaDeg: ((arc / r) * 180) / Math.PI });
    expect(Math.abs(c.longChord - chord)).toBeLessThanOrEqual(0.01);
  }
});

test("bad radius or Δ is a typed error, never a number", () => {
  for (const bad of [
    { radius: -5, deltaDeg: 10 },
    { radius: 0, deltaDeg: 10 },
    { radius: Number.NaN, deltaDeg: 10 },
    { radius: 100, deltaDeg: 0 },
    { radius: 100, deltaDeg: 180 },
    { radius: 100, deltaDeg: -20 },
    { deltaDeg: 20 },
  ]) {
    expect(() => computeSimpleCurve(bad), JSON.stringify(bad)).toThrow(GeometryInputError);
  }
  expect(() => computeSimpleCurve({ radius: -5, deltaDeg: 10 })).toThrow("radius must be a positive number of length units, got -5");
});

test("the elements obey E = T tan(Δ/4) and T² + R² = (R + E)²", () => {
  // Closed-form identities of the circular curve (Schofield & Breach §10.1).
  fc.assert(
    fc.property(fc.double({ min: 1, max: 1e5, noNaN: true }), fc.double({ min: 0.01, max: 179.9, noNaN: true }), (r, d) => {
      const c = computeSimpleCurve({ radius: r, deltaDeg: d });
      expect(c.external).toBeCloseTo(c.tangent * Math.tan((d * Math.PI) / 720), Math.max(0, 9 - Math.log10(r + c.tangent)));
      expect(Math.hypot(c.tangent, r) / (r + c.external)).toBeCloseTo(1, 12);
    }),
    { numRuns: 2000, seed: 3 },
  );
});

import { expect, test } from "vitest";
import fc from "fast-check";
import { computeCompoundCurve } from "./compound-curve";
import { computeCompoundTangentsClosedForm } from "./compound-core";
import { degToRad } from "./angles";
import { GeometryInputError } from "./errors";
import { crossVec, distanceBetween, subVec } from "./vec2";

test("R1 400/36°, R2 300/50° from PC 4+509: PCC 4+760.327, PT 5+022.127, PI 4+846.198", () => {
  // Compound check value 6: civil-engineering board-exam worked example (secondary source),
  // reproduced by the closed-form tangents; stations by Sta PCC = PC + L1 (Schofield & Breach §10.3).
  const c = computeCompoundCurve({ radius1: 400, radius2: 300, delta1: 36, delta2: 50, pcStation: 4509 });
  expect(c.pccStation).toBeCloseTo(4760.327, 3);
  expect(c.ptStation).toBeCloseTo(5022.127, 3);
  expect(c.piStation).toBeCloseTo(4846.198, 3);
  expect(c.tangentPC).toBeCloseTo(337.198, 3);
  expect(c.tangentPT).toBeCloseTo(298.899, 3);
});

test("R1 600/45°, R2 400/20° → T1 368.93, T2 319.46", () => {
  // Compound check value 7: homework worked example (secondary; it rounded t1), ±0.02.
  const c = computeCompoundCurve({ radius1: 600, radius2: 400, delta1: 45, delta2: 20 });
  expect(Math.abs(c.tangentPC - 368.93)).toBeLessThanOrEqual(0.02);
  expect(Math.abs(c.tangentPT - 319.46)).toBeLessThanOrEqual(0.02);
});

test("the stations can also start from the PI", () => {
  const c = computeCompoundCurve({ radius1: 400, radius2: 300, delta1: 36, delta2: 50, piStation: 4846.197567798671 });
  expect(c.pcStation).toBeCloseTo(4509, 9);
});

const curveArb = fc
  .record({
    r1: fc.double({ min: 20, max: 5000, noNaN: true }),
    r2: fc.double({ min: 20, max: 5000, noNaN: true }),
    d1: fc.double({ min: 1, max: 177, noNaN: true }),
    d2: fc.double({ min: 1, max: 177, noNaN: true }),
  })
  .filter((c) => c.d1 + c.d2 < 179);

test("closed-form tangents equal the vertex-triangle tangents", () => {
  // Vertex triangle: Schofield & Breach, Engineering Surveying 6th ed. §10.3; closed form derived
  // from the PC→PCC→PT coordinates (REFERENCES §2). Both must agree to round-off.
  fc.assert(
    fc.property(curveArb, ({ r1, r2, d1, d2 }) => {
      const c = computeCompoundCurve({ radius1: r1, radius2: r2, delta1: d1, delta2: d2 });
      const cf = computeCompoundTangentsClosedForm(r1, r2, degToRad(d1), degToRad(d2));
      const scale = Math.max(r1, r2) / Math.sin(degToRad(d1 + d2));
      expect(Math.abs(cf.tangentPC - c.tangentPC)).toBeLessThan(1e-11 * scale);
      expect(Math.abs(cf.tangentPT - c.tangentPT)).toBeLessThan(1e-11 * scale);
    }),
    { numRuns: 2000, seed: 42 },
  );
});

test("geometric invariants from coordinates: tangents meet at the PI, PCC on both circles, long chord", () => {
  // Closed-form geometry: the PI is on the back tangent (y = 0) at T_PC and on the forward tangent
  // at T_PT from the PT; the PCC is R1 from O1 and R2 from O2 with O1, O2, PCC collinear.
  fc.assert(
    fc.property(curveArb, ({ r1, r2, d1, d2 }) => {
      const c = computeCompoundCurve({ radius1: r1, radius2: r2, delta1: d1, delta2: d2 });
      const { pcc, pt, pi, center1, center2 } = c.local;
      const tol = 1e-9 * Math.max(r1, r2, c.tangentPC, c.tangentPT);
      const d = degToRad(d1 + d2);
      expect(Math.abs(distanceBetween(pi, pt) - c.tangentPT)).toBeLessThan(tol);
      expect(Math.abs(crossVec(subVec(pt, pi), [Math.cos(d), Math.sin(d)]))).toBeLessThan(tol);
      expect(Math.abs(distanceBetween(pcc, center1) - r1)).toBeLessThan(tol);
      expect(Math.abs(distanceBetween(pcc, center2) - r2)).toBeLessThan(tol);
      expect(Math.abs(crossVec(subVec(center2, center1), subVec(pcc, center1)))).toBeLessThan(tol * Math.max(r1, r2));
      expect(Math.abs(distanceBetween([0, 0], pt) - c.longChord)).toBeLessThan(tol);
      expect(Math.abs(c.commonTangent - (c.subTangent1 + c.subTangent2))).toBeLessThan(tol);
      expect(Math.abs(c.chordAnglePC + c.chordAnglePT - (d1 + d2))).toBeLessThan(1e-9);
      expect(Math.abs(c.length - (degToRad(d1) * r1 + degToRad(d2) * r2))).toBeLessThan(tol);
    }),
    { numRuns: 2000, seed: 43 },
  );
});

test("with Δ2 → 0 the closed-form tangents reduce to the simple curve R1 tan(Δ/2)", () => {
  // REFERENCES §2 sanity check of the closed form.
  const cf = computeCompoundTangentsClosedForm(500, 200, degToRad(40), 0);
  expect(cf.tangentPC).toBeCloseTo(500 * Math.tan(degToRad(20)), 9);
  expect(cf.tangentPT).toBeCloseTo(500 * Math.tan(degToRad(20)), 9);
});

test("bad compound input is a typed error", () => {
  expect(() => computeCompoundCurve({ radius1: -1, radius2: 300, delta1: 10, delta2: 10 })).toThrow(GeometryInputError);
  expect(() => computeCompoundCurve({ radius1: 100, radius2: 300, delta1: 100, delta2: 80 })).toThrow(GeometryInputError);
  expect(() => computeCompoundCurve({ radius1: 100, radius2: 300, delta1: 0, delta2: 80 })).toThrow(GeometryInputError);
});

import { expect, test } from "vitest";
import fc from "fast-check";
import { evaluateCompoundCore } from "./compound-core";
import type { Known } from "./compound-knowns";
import { reverseKnowns, reverseParams } from "./compound-reverse";
import { buildArcSweep } from "./compound-sweep-arcs";
import { buildParallelSweep } from "./compound-sweep-parallel";
import { crossVec, unitAtRad } from "./vec2";

// The one-variable forms must be the compound-curve geometry itself, not an approximation: each
// equation a cos y + b sin y + c is compared, at arbitrary angles, with the forward solution of
// evaluateCompoundCore (vertex triangle, Schofield & Breach, Engineering Surveying 6th ed. §10.3).

const length = (key: Known["key"], value: number): Known => ({ key, kind: "length", value });
const angle = (key: Known["key"], value: number): Known => ({ key, kind: "angle", value });
const PARALLEL: Known = { key: "commonTangentParallelToLongChord", kind: "condition", value: 0 };

function expectRelativelyClose(got: number, want: number): void {
  expect(Math.abs(got - want)).toBeLessThanOrEqual(1e-12 * Math.max(1, Math.abs(want)));
}

const anglesArb = fc.record({
  x: fc.double({ min: 0.05, max: 2.0, noNaN: true }),
  ys: fc.array(fc.double({ min: 0.05, max: 1.0, noNaN: true }), { minLength: 4, maxLength: 4 }),
});

test("the T_PC and T_PT equations are the vertex-triangle relations T sin Δ = R2 − R1 cos Δ + (R1 − R2) cos Δ2, …", () => {
  // REFERENCES §2 closed form: T_PC sin Δ = R2 − R1 cos Δ + (R1 − R2) cos Δ2 and
  // T_PT sin Δ = R1 − R2 cos Δ − (R1 − R2) cos Δ1; here the solved equation is T_PC's and the
  // residual is T_PT's, each divided by its tangent, at Δ2 = x and Δ1 = y.
  fc.assert(
    fc.property(anglesArb, fc.double({ min: 20, max: 5000, noNaN: true }), fc.double({ min: 20, max: 5000, noNaN: true }), ({ x, ys }, r1, r2) => {
      const [tpc, tpt] = [0.9 * r1, 1.1 * r2];
      const model = buildArcSweep([length("radius1", r1), length("radius2", r2), length("tangentPC", tpc), length("tangentPT", tpt)])!;
      model.setOuter(x);
      for (const y of ys) {
        const d = x + y;
        const solved = model.a * Math.cos(y) + model.b * Math.sin(y) + model.c;
        expectRelativelyClose(solved, (r2 - r1 * Math.cos(d) + (r1 - r2) * Math.cos(x) - tpc * Math.sin(d)) / tpc);
        expectRelativelyClose(model.residual(y), (r1 - r2 * Math.cos(d) - (r1 - r2) * Math.cos(y) - tpt * Math.sin(d)) / tpt);
      }
    }),
    { numRuns: 300, seed: 31 },
  );
});

/** The known's condition from a forward solution, up to a constant factor at fixed Δ2. */
function forwardCondition(k: Known, r1: number, r2: number, d1: number, d2: number): number {
  const core = evaluateCompoundCore(r1, r2, d1, d2);
  const d = d1 + d2;
  switch (k.key) {
    case "tangentPC":
      return (core.tangentPC - k.value) * Math.sin(d);
    case "tangentPT":
      return (core.tangentPT - k.value) * Math.sin(d);
    case "chordAnglePC":
      return crossVec(unitAtRad(k.value), core.pt);
    case "chordAnglePT":
      return crossVec(core.pt, unitAtRad(d - k.value));
    case "commonTangentParallelToLongChord":
      return crossVec(core.pt, unitAtRad(d1));
    default:
      return core.longChord ** 2 - k.value ** 2;
  }
}

const OTHER_KNOWNS: Known[] = [
  length("tangentPC", 310),
  length("tangentPT", 270),
  length("longChord", 450),
  angle("chordAnglePC", 0.45),
  angle("chordAnglePT", 0.5),
  PARALLEL,
];

test("every equation of the arc form is the forward geometry at every inner angle, for R/t inside and R/t/L outside", () => {
  fc.assert(
    fc.property(anglesArb, fc.constantFrom("radius1", "subTangent1"), fc.constantFrom("radius2", "subTangent2", "length2"), ({ x, ys }, innerKey, outerKey) => {
      const inner = length(innerKey, 180);
      const outer = length(outerKey, 240);
      const r2 = outerKey === "radius2" ? 240 : outerKey === "subTangent2" ? 240 / Math.tan(x / 2) : 240 / x;
      for (const k of OTHER_KNOWNS) {
        const model = buildArcSweep([inner, outer, k, k === PARALLEL ? OTHER_KNOWNS[0]! : PARALLEL])!;
        model.setOuter(x);
        const ratios = ys.map((y) => {
          const r1 = innerKey === "radius1" ? 180 : 180 / Math.tan(y / 2);
          return (model.a * Math.cos(y) + model.b * Math.sin(y) + model.c) / forwardCondition(k, r1, r2, y, x);
        });
        // One constant factor for all y (the equation's scaling), so both vanish together.
        for (const q of ratios) expect(q / ratios[0]!).toBeCloseTo(1, 9);
      }
    }),
    { numRuns: 200, seed: 32 },
  );
});

test("the arc form with arc 1 known only by its length runs on the reversed curve and returns the curve itself", () => {
  // {L1, R2, T_PT, φ_PC} of R1 600/45°, R2 400/20° (check value 7 curve): the true angles solve it.
  const core = evaluateCompoundCore(600, 400, Math.PI / 4, Math.PI / 9);
  const model = buildArcSweep([length("length1", core.length1), length("radius2", 400), length("tangentPT", core.tangentPT), angle("chordAnglePC", core.chordAnglePCRad)])!;
  model.setOuter(Math.PI / 4); // outer angle of the reversed curve: Δ1
  const y = Math.PI / 9;
  expect(model.a * Math.cos(y) + model.b * Math.sin(y) + model.c).toBeCloseTo(0, 12);
  expect(model.residual(y)).toBeCloseTo(0, 12);
  const p = model.params(y)!;
  [600, 400, Math.PI / 4, Math.PI / 9].forEach((v, i) => expect(p[i]! / v).toBeCloseTo(1, 12));
});

test("reversing a curve swaps the PC and PT sides of every known (symmetry of the figure)", () => {
  const core = evaluateCompoundCore(600, 400, 0.7, 0.4);
  const back = evaluateCompoundCore(...reverseParams([600, 400, 0.7, 0.4]));
  expect(back.tangentPC).toBeCloseTo(core.tangentPT, 9);
  expect(back.tangentPT).toBeCloseTo(core.tangentPC, 9);
  expect(back.chordAnglePCRad).toBeCloseTo(core.chordAnglePTRad, 12);
  expect(back.longChord).toBeCloseTo(core.longChord, 9);
  expect(reverseKnowns([length("subTangent1", 5), angle("chordAnglePT", 0.3)]).map((k) => k.key)).toEqual(["subTangent2", "chordAnglePC"]);
});

test("the parallel form: sine law on two sides fixes Δ2 from Δ1, and its radii rebuild the curve", () => {
  // Parallel common tangent ⇔ R1(1 − cos Δ1) = R2(1 − cos Δ2) (derived in compound-solver.ts).
  const [r1, d1, d2] = [900, 0.52, 0.79];
  const r2 = (r1 * (1 - Math.cos(d1))) / (1 - Math.cos(d2));
  const core = evaluateCompoundCore(r1, r2, d1, d2);
  expect(core.chordAnglePCRad).toBeCloseTo(d1, 12);
  for (const sides of [["tangentPC", "tangentPT"], ["tangentPC", "longChord"], ["tangentPT", "longChord"]] as const) {
    for (const item of ["radius1", "subTangent2", "length1"] as const) {
      const model = buildParallelSweep([...sides.map((s) => length(s, core[s])), length(item, core[item]), PARALLEL])!;
      model.setOuter(d1);
      expect(model.a * Math.cos(d2) + model.b * Math.sin(d2) + model.c, `${sides} ${item}`).toBeCloseTo(0, 12);
      expect(model.residual(d2), `${sides} ${item}`).toBeCloseTo(0, 10);
      const p = model.params(d2)!;
      expect(p[0] / r1).toBeCloseTo(1, 10);
      expect(p[1] / r2).toBeCloseTo(1, 10);
    }
  }
});

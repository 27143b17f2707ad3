import { expect, test } from "vitest";
import fc from "fast-check";
import { computeCompoundCurve } from "./compound-curve";
import { solveCompoundCurve } from "./compound-solver";
import { givenFrom, leavesTwoFreeAngles, listIndependentSets, reproduces, sameCurve, type KnownSet } from "./compound-test-support";

// Round trips: R1, R2, Δ1, Δ2 → forward elements (Schofield & Breach §10.3 vertex triangle) →
// solve back from a set of four knowns → the same curve to 1e-9 (lengths) and 1e-10 rad.
//
// Generator limits, and why: each Δi ≥ 5° and Δ ≤ 160°, flatter/sharper radius ratio 1.25–5,
// each arc at least 10 % of the curve. Outside these the inverse problem is ill-conditioned,
// not wrong: when R1 → R2 the split of Δ is not observable; a very short arc barely moves
// any known; and near Δ → 180° the PI triangle degenerates. There some knowns sets have two
// roots closer than the solver's scan can separate; the solver then returns the root it
// finds, which still reproduces every given value (checked in the last property below).
// Inside these bounds every root is required, twin roots of the two-angle sets included.
const curveArb = fc
  .record({
    r1Log: fc.double({ min: Math.log(20), max: Math.log(5000), noNaN: true }),
    ratioLog: fc.double({ min: Math.log(1.25), max: Math.log(5), noNaN: true }),
    flip: fc.boolean(),
    d1: fc.double({ min: 5, max: 155, noNaN: true }),
    d2: fc.double({ min: 5, max: 155, noNaN: true }),
  })
  .map(({ r1Log, ratioLog, flip, d1, d2 }) => ({ r1: Math.exp(r1Log), r2: Math.exp(r1Log + (flip ? ratioLog : -ratioLog)), d1, d2 }))
  .filter(({ r1, r2, d1, d2 }) => d1 + d2 <= 160 && Math.min(r1 * d1, r2 * d2) >= 0.1 * (r1 * d1 + r2 * d2));

// Parallel common tangent ⇔ R1(1 − cos Δ1) = R2(1 − cos Δ2) (derived in compound-solver.ts).
const parallelArb = fc
  .record({ r1: fc.double({ min: 20, max: 5000, noNaN: true }), d1: fc.double({ min: 5, max: 150, noNaN: true }), d2: fc.double({ min: 5, max: 150, noNaN: true }) })
  .map(({ r1, d1, d2 }) => ({ r1, d1, d2, r2: (r1 * (1 - Math.cos((d1 * Math.PI) / 180))) / (1 - Math.cos((d2 * Math.PI) / 180)) }))
  .filter(({ r1, r2, d1, d2 }) => d1 + d2 <= 160 && Math.max(r1, r2) / Math.min(r1, r2) >= 1.25 && Math.max(r1, r2) / Math.min(r1, r2) <= 5);

const ALL_SETS = listIndependentSets();
const PLAIN_SETS = ALL_SETS.filter((s) => !s.includes("commonTangentParallelToLongChord"));
const PARALLEL_SETS = ALL_SETS.filter((s) => s.includes("commonTangentParallelToLongChord"));

function roundTrip(r1: number, r2: number, d1: number, d2: number, set: KnownSet): void {
  const curve = computeCompoundCurve({ radius1: r1, radius2: r2, delta1: d1, delta2: d2 });
  const given = givenFrom(curve, set);
  const { solutions } = solveCompoundCurve(given);
  expect(solutions.some((s) => sameCurve(s, r1, r2, d1, d2)), set.join(", ")).toBe(true);
  expect(solutions.every((s) => reproduces(s, given)), set.join(", ")).toBe(true);
}

test("there are many independent sets of four knowns, including the parallel condition", () => {
  // Sanity of the enumeration the properties below rely on (structural rank, common practice).
  expect(PLAIN_SETS.length).toBeGreaterThan(800);
  expect(PARALLEL_SETS.length).toBeGreaterThan(300);
  expect(ALL_SETS.some((s) => s.join() === "radius1,radius2,delta1,delta2")).toBe(true);
});

test("the named knowns sets round-trip in 2000 random curves each", { timeout: 120_000 }, () => {
  const named: KnownSet[] = [
    ["radius1", "radius2", "delta1", "delta2"],
    ["radius1", "tangentPC", "tangentPT", "delta"],
    ["radius2", "tangentPC", "tangentPT", "delta"],
    ["radius1", "longChord", "chordAnglePC", "chordAnglePT"],
    ["radius2", "longChord", "chordAnglePC", "chordAnglePT"],
    ["radius1", "radius2", "tangentPC", "delta"],
    ["radius1", "radius2", "tangentPT", "delta"],
    ["radius1", "radius2", "length1", "delta"],
    ["subTangent1", "subTangent2", "delta1", "delta2"],
    ["length1", "length2", "delta1", "delta2"],
  ];
  for (const set of named) {
    fc.assert(fc.property(curveArb, ({ r1, r2, d1, d2 }) => roundTrip(r1, r2, d1, d2, set)), { numRuns: 2000, seed: 1201 });
  }
});

test("every independent set of four knowns round-trips", { timeout: 300_000 }, () => {
  fc.assert(
    fc.property(curveArb, fc.constantFrom(...PLAIN_SETS), ({ r1, r2, d1, d2 }, set) => roundTrip(r1, r2, d1, d2, set)),
    { numRuns: 4000, seed: 1202 },
  );
});

test("every independent set round-trips on six further seeds (twin roots included)", { timeout: 300_000 }, () => {
  // Other seeds than the one above, so that a rare miss cannot hide behind one fixed draw.
  // Seed 12 once found a twin root lost by a grid search ({R1, T_PT, t2, LC}, R1 = 20, Δ2 = 5°).
  for (const seed of [11, 12, 13, 14, 15, 16]) {
    fc.assert(
      fc.property(curveArb, fc.constantFrom(...PLAIN_SETS), ({ r1, r2, d1, d2 }, set) => roundTrip(r1, r2, d1, d2, set)),
      { numRuns: 2000, seed },
    );
  }
});

test("every set left with two free angles round-trips on ten more seeds, with and without the parallel condition", { timeout: 300_000 }, () => {
  // The sets the closed forms cannot finish (one item of each arc, or one arc and the parallel
  // condition, plus PI-triangle parts): their twin roots are the hard case of the search.
  const plain = PLAIN_SETS.filter(leavesTwoFreeAngles);
  const parallel = PARALLEL_SETS.filter(leavesTwoFreeAngles);
  // 81 of them, less {R1, R2, LC, φ_PC}: the chord-point closed forms finish that one (compound-chord-point.ts).
  expect(plain.length).toBe(80);
  expect(parallel.length).toBe(45);
  for (const seed of [21, 22, 23, 24, 25, 26, 27, 28, 29, 30]) {
    fc.assert(
      fc.property(curveArb, fc.constantFrom(...plain), ({ r1, r2, d1, d2 }, set) => roundTrip(r1, r2, d1, d2, set)),
      { numRuns: 1000, seed },
    );
    fc.assert(
      fc.property(parallelArb, fc.constantFrom(...parallel), ({ r1, r2, d1, d2 }, set) => roundTrip(r1, r2, d1, d2, set)),
      { numRuns: 500, seed },
    );
  }
});

test("sets with the parallel condition round-trip on curves that satisfy it", { timeout: 300_000 }, () => {
  fc.assert(
    fc.property(parallelArb, fc.constantFrom(...PARALLEL_SETS), ({ r1, r2, d1, d2 }, set) => roundTrip(r1, r2, d1, d2, set)),
    { numRuns: 2000, seed: 1203 },
  );
});

test("outside the well-conditioned range the solver may miss a root but never returns a wrong one", { timeout: 300_000 }, () => {
  const wide = fc
    .record({
      r1: fc.double({ min: 20, max: 5000, noNaN: true }),
      r2: fc.double({ min: 20, max: 5000, noNaN: true }),
      d1: fc.double({ min: 1, max: 177, noNaN: true }),
      d2: fc.double({ min: 1, max: 177, noNaN: true }),
    })
    .filter((c) => c.d1 + c.d2 < 179);
  fc.assert(
    fc.property(wide, fc.constantFrom(...ALL_SETS), ({ r1, r2, d1, d2 }, set) => {
      const curve = computeCompoundCurve({ radius1: r1, radius2: r2, delta1: d1, delta2: d2 });
      const given = givenFrom(curve, set);
      if (set.includes("commonTangentParallelToLongChord")) given.commonTangentParallelToLongChord = Math.abs(curve.chordAnglePC - d1) < 1e-12;
      try {
        const { solutions } = solveCompoundCurve(given);
        expect(solutions.every((s) => reproduces(s, given))).toBe(true);
      } catch (e) {
        expect((e as Error).name).toBe("GeometryInputError");
      }
    }),
    { numRuns: 2000, seed: 1204 },
  );
});

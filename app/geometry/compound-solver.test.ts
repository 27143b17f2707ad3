import { expect, test } from "vitest";
import { computeCompoundCurve } from "./compound-curve";
import { solveCompoundCurve } from "./compound-solver";
import { GeometryInputError } from "./errors";
import { reproduces, sameCurve } from "./compound-test-support";

// Check value 6 curve (board-exam worked example, secondary; closed form cross-check):
// R1 400 / Δ1 36°, R2 300 / Δ2 50°, T_PC 337.198, T_PT 298.899.
const CV6 = computeCompoundCurve({ radius1: 400, radius2: 300, delta1: 36, delta2: 50 });

function expectCv6(given: Parameters<typeof solveCompoundCurve>[0]): void {
  const { solutions } = solveCompoundCurve(given);
  expect(solutions.some((s) => sameCurve(s, 400, 300, 36, 50))).toBe(true);
}

test("{R1, R2, Δ1, Δ2} gives the check-value-6 tangents", () => {
  const { solutions } = solveCompoundCurve({ radius1: 400, radius2: 300, delta1: 36, delta2: 50 });
  expect(solutions).toHaveLength(1);
  expect(solutions[0]!.tangentPC).toBeCloseTo(337.198, 3);
  expect(solutions[0]!.tangentPT).toBeCloseTo(298.899, 3);
});

test("{Δ, R1, T_PC, T_PT} recovers R2 = 300 and Δ1 = 36° from the published tangents", () => {
  // Rounded published tangents (3 decimals) are not exact, so use the exact forward values.
  expectCv6({ delta: 86, radius1: 400, tangentPC: CV6.tangentPC, tangentPT: CV6.tangentPT });
});

test("{long chord, chord angles, R1} and {…, R2} recover the curve", () => {
  expectCv6({ longChord: CV6.longChord, chordAnglePC: CV6.chordAnglePC, chordAnglePT: CV6.chordAnglePT, radius1: 400 });
  expectCv6({ longChord: CV6.longChord, chordAnglePC: CV6.chordAnglePC, chordAnglePT: CV6.chordAnglePT, radius2: 300 });
});

test("{Δ, R1, R2, one tangent} and {R1, R2, Δ, L1} recover the curve", () => {
  expectCv6({ delta: 86, radius1: 400, radius2: 300, tangentPC: CV6.tangentPC });
  expectCv6({ delta: 86, radius1: 400, radius2: 300, tangentPT: CV6.tangentPT });
  expectCv6({ delta: 86, radius1: 400, radius2: 300, length1: CV6.length1 });
});

test("the parallel condition means the long chord turns by Δ1 from the back tangent", () => {
  // Derived from the geometry (alternate angles): parallel ⇔ R1(1 − cos Δ1) = R2(1 − cos Δ2).
  const d1 = 30;
  const d2 = 45;
  const r1 = 900;
  const r2 = (r1 * (1 - Math.cos((d1 * Math.PI) / 180))) / (1 - Math.cos((d2 * Math.PI) / 180));
  const c = computeCompoundCurve({ radius1: r1, radius2: r2, delta1: d1, delta2: d2 });
  expect(c.chordAnglePC).toBeCloseTo(d1, 10);
  expect(c.chordAnglePT).toBeCloseTo(d2, 10);
  const { solutions } = solveCompoundCurve({
    longChord: c.longChord,
    chordAnglePC: c.chordAnglePC,
    chordAnglePT: c.chordAnglePT,
    commonTangentParallelToLongChord: true,
  });
  expect(solutions.some((s) => sameCurve(s, r1, r2, d1, d2))).toBe(true);
});

test("a set with two solutions returns both, and each reproduces the knowns", () => {
  // {R2, T_PT, L1, φ_PT} of R1 600/45°, R2 400/20° (check value 7 curve) has a second root nearby
  // (Δ1 ≈ 45.04°). 45° is a round angle, where a search grid could put a sample right on the root.
  const c = computeCompoundCurve({ radius1: 600, radius2: 400, delta1: 45, delta2: 20 });
  const given = { radius2: 400, tangentPT: c.tangentPT, length1: c.length1, chordAnglePT: c.chordAnglePT };
  const { solutions } = solveCompoundCurve(given);
  expect(solutions).toHaveLength(2);
  expect(solutions.some((s) => sameCurve(s, 600, 400, 45, 20))).toBe(true);
  for (const s of solutions) {
    expect(s.tangentPT / given.tangentPT).toBeCloseTo(1, 9);
    expect(s.length1 / given.length1).toBeCloseTo(1, 9);
    expect(s.chordAnglePT - given.chordAnglePT).toBeCloseTo(0, 8);
  }
});

test("too few knowns names what was given", () => {
  expect(() => solveCompoundCurve({ radius1: 400, delta: 86, tangentPC: 337.198 })).toThrow(
    "need 4 independent knowns, got 3: radius1, tangentPC, delta",
  );
});

test("dependent knowns count once", () => {
  try {
    solveCompoundCurve({ radius1: 400, delta: 86, delta1: 36, delta2: 50 });
    expect.unreachable();
  } catch (e) {
    expect(e).toBeInstanceOf(GeometryInputError);
    expect((e as GeometryInputError).code).toBe("missing_knowns");
    expect((e as GeometryInputError).message).toContain("fix only 3");
  }
});

test("an over-determined set that disagrees is inconsistent, one that agrees is solved", () => {
  expect(() => solveCompoundCurve({ radius1: 400, radius2: 300, delta1: 36, delta2: 50, tangentPC: 340 })).toThrow(GeometryInputError);
  expectCv6({ radius1: 400, radius2: 300, delta1: 36, delta2: 50, tangentPC: CV6.tangentPC, length2: CV6.length2 });
});

test("a tangent outside the two simple-curve tangents is too short or too long", () => {
  // T_PC runs from R1 tan(Δ/2) to R2 tan(Δ/2) as Δ2 goes from 0 to Δ (closed form, REFERENCES §2).
  expect(() => solveCompoundCurve({ radius1: 400, radius2: 300, delta: 86, tangentPC: 100 })).toThrow(/tangent PI→PC is too short for R1 = 400 and R2 = 300 at this Δ/);
  expect(() => solveCompoundCurve({ radius1: 400, radius2: 300, delta: 86, tangentPC: 500 })).toThrow(/too long/);
});

test("bad values are typed errors, never numbers", () => {
  const bad = [
    { radius1: -5, radius2: 300, delta1: 36, delta2: 50 },
    { radius1: Number.NaN, radius2: 300, delta1: 36, delta2: 50 },
    { radius1: 400, radius2: 300, delta1: 36, delta2: 180 },
    { radius1: 400, radius2: 300, delta1: 0, delta2: 50 },
    { radius1: 400, radius2: 300, delta1: 100, delta2: 90 },
  ];
  for (const given of bad) expect(() => solveCompoundCurve(given), JSON.stringify(given)).toThrow(GeometryInputError);
  expect(() => solveCompoundCurve({ radius1: 400, radius2: 300, delta1: 36, commonTangentParallelToLongChord: "yes" as unknown as boolean })).toThrow(
    GeometryInputError,
  );
});

test("stations come from the PC or the PI station", () => {
  // Check value 6: PC 4+509.000 → PCC 4+760.327, PT 5+022.127.
  const { solutions } = solveCompoundCurve({ radius1: 400, radius2: 300, delta1: 36, delta2: 50 }, { pcStation: 4509 });
  expect(solutions[0]!.pccStation).toBeCloseTo(4760.327, 3);
  expect(solutions[0]!.ptStation).toBeCloseTo(5022.127, 3);
});

test("equal radii leave the split of Δ open, so the set is refused rather than answered arbitrarily", () => {
  // With R1 = R2 the curve is simple (Schofield & Breach §10.1): T = R tan(Δ/2) for any Δ1.
  const t = 300 * Math.tan((20 * Math.PI) / 180);
  for (const given of [
    { radius1: 300, radius2: 300, delta: 40, tangentPC: t },
    { radius1: 300, radius2: 300, tangentPC: t, tangentPT: t },
  ]) {
    try {
      solveCompoundCurve(given);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(GeometryInputError);
      expect((e as GeometryInputError).code).toBe("missing_knowns");
    }
  }
});

test("a two-angle search with twin roots returns both: {R1, T_PT, t2, LC} of R1 20/74.51°, R2 33.12/5°", () => {
  // The property-test draw (seed 12) that the grid search used to lose. Both curves are checked
  // forwards (vertex triangle, Schofield & Breach §10.3) against every given value.
  const c = computeCompoundCurve({ radius1: 20, radius2: 33.117061601086434, delta1: 74.51338860244462, delta2: 5.000000000000009 });
  const given = { radius1: 20, tangentPT: c.tangentPT, subTangent2: c.subTangent2, longChord: c.longChord };
  const { solutions } = solveCompoundCurve(given);
  expect(solutions).toHaveLength(2);
  expect(solutions.some((s) => sameCurve(s, 20, 33.117061601086434, 74.51338860244462, 5.000000000000009))).toBe(true);
  for (const s of solutions) expect(reproduces(s, given)).toBe(true);
  const other = solutions.find((s) => !sameCurve(s, 20, 33.117061601086434, 74.51338860244462, 5.000000000000009))!;
  const again = computeCompoundCurve({ radius1: other.radius1, radius2: other.radius2, delta1: other.delta1, delta2: other.delta2 });
  expect(again.subTangent2 / given.subTangent2).toBeCloseTo(1, 9);
  expect(again.longChord / given.longChord).toBeCloseTo(1, 9);
});


test("both arcs known only by length: {T_PC, L1, L2, LC} returns twin curves 0.7° apart", () => {
  // A property-test draw: R1 1098.6942/30.453304°, R2 731.0415/84.679875° has a twin near
  // Δ1 29.76°, Δ2 85.14°. Each curve is checked forwards against every given value.
  const c = computeCompoundCurve({ radius1: 1098.6942, radius2: 731.0415, delta1: 30.453304, delta2: 84.679875 });
  const given = { tangentPC: c.tangentPC, length1: c.length1, length2: c.length2, longChord: c.longChord };
  const { solutions } = solveCompoundCurve(given);
  expect(solutions).toHaveLength(2);
  expect(solutions.some((s) => sameCurve(s, 1098.6942, 731.0415, 30.453304, 84.679875))).toBe(true);
  for (const s of solutions) expect(reproduces(s, given)).toBe(true);
  const twin = solutions.find((s) => !sameCurve(s, 1098.6942, 731.0415, 30.453304, 84.679875))!;
  expect(Math.abs(twin.delta1 - 30.453304)).toBeLessThan(1);
  expect(Math.abs(twin.delta2 - 84.679875)).toBeLessThan(1);
});

test("where Δ1 swings fast with Δ2 the twin roots are still both found: {R2, T_PT, t1, φ_PT}", () => {
  // R1 20/101.37°, R2 4068.2/1.606°: the PI lies 2.4 from vertex V1, so the T_PT relation barely
  // fixes Δ1 and Δ1 turns through 145° while Δ2 moves 0.2°; twins lie 0.001° apart in Δ2.
  const [r1, r2, d1, d2] = [20, 4068.223210535051, 101.36755077217853, 1.6057581731074007];
  const c = computeCompoundCurve({ radius1: r1, radius2: r2, delta1: d1, delta2: d2 });
  const given = { radius2: r2, tangentPT: c.tangentPT, subTangent1: c.subTangent1, chordAnglePT: c.chordAnglePT };
  const { solutions } = solveCompoundCurve(given);
  expect(solutions.some((s) => sameCurve(s, r1, r2, d1, d2))).toBe(true);
  expect(solutions.length).toBeGreaterThanOrEqual(2);
  for (const s of solutions) expect(reproduces(s, given)).toBe(true);
});

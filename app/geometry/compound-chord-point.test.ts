import { expect, test } from "vitest";
import { computeCompoundCurve } from "./compound-curve";
import { parseCompoundGiven } from "./compound-knowns";
import { propagateCompound } from "./compound-propagate";
import { solveCompoundCurve } from "./compound-solver";
import { isComplete, stateFromKnowns } from "./compound-state";

// Generating curves (R1, R2, Δ1, Δ2), including a 1 : 6 ratio; their long chord and its angle at the
// PC come from the forward solution (Schofield & Breach §10.3 vertex triangle), not from these forms.
const CURVES = [[400, 300, 36, 50], [150, 900, 12, 70], [2500, 800, 15, 60], [90, 260, 55, 40]] as const;
const PAIRS = [["radius1", "delta2"], ["radius2", "delta1"], ["radius2", "delta2"], ["radius1", "radius2"], ["radius1", "delta1"]] as const;

test.each(PAIRS)("LC, φ_PC with %s and %s: finished in closed form, and the generating curve comes back", (a, b) => {
  for (const [radius1, radius2, delta1, delta2] of CURVES) {
    const curve = computeCompoundCurve({ radius1, radius2, delta1, delta2 });
    const given = { longChord: curve.longChord, chordAnglePC: curve.chordAnglePC, [a]: curve[a], [b]: curve[b] };
    const states = propagateCompound(stateFromKnowns(parseCompoundGiven(given)));
    expect(states.length).toBeGreaterThan(0);
    expect(states.every(isComplete)).toBe(true);
    const { solutions } = solveCompoundCurve(given);
    const back = solutions.find((s) => Math.abs(s.radius1 - radius1) < 1e-6 * radius1 && Math.abs(s.delta1 - delta1) < 1e-8);
    expect(back, `${radius1}/${radius2}/${delta1}/${delta2}`).toBeDefined();
    expect(back!.radius2).toBeCloseTo(radius2, 6);
    expect(back!.delta2).toBeCloseTo(delta2, 9);
  }
});

import type { Known } from "./compound-knowns";
import type { CompoundParams } from "./compound-reduction";

// Run backwards (PT to PC) and mirrored so that it still turns left, a compound curve is again
// one: arc 2 comes first, T_PC and T_PT swap, so do the chord angles; Δ, the long chord and the
// parallel condition (common tangent ∥ long chord) are unchanged (symmetry of the figure).
const SWAP: Partial<Record<Known["key"], Known["key"]>> = {
  radius1: "radius2",
  radius2: "radius1",
  delta1: "delta2",
  delta2: "delta1",
  subTangent1: "subTangent2",
  subTangent2: "subTangent1",
  length1: "length2",
  length2: "length1",
  tangentPC: "tangentPT",
  tangentPT: "tangentPC",
  chordAnglePC: "chordAnglePT",
  chordAnglePT: "chordAnglePC",
};

/** The knowns of the same curve run from PT to PC. */
export function reverseKnowns(knowns: Known[]): Known[] {
  return knowns.map((k) => ({ ...k, key: SWAP[k.key] ?? k.key }));
}

/** Parameters of the reversed curve turned back: [R1, R2, Δ1, Δ2] ↔ [R2, R1, Δ2, Δ1]. */
export function reverseParams(p: CompoundParams): CompoundParams;
export function reverseParams(p: CompoundParams | undefined): CompoundParams | undefined;
export function reverseParams(p: CompoundParams | undefined): CompoundParams | undefined {
  return p && [p[1], p[0], p[3], p[2]];
}

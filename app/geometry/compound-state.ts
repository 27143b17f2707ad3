import type { Known } from "./compound-knowns";

/**
 * What is known so far about one compound curve, radians for angles. Names: r radius, d central
 * angle, t sub-tangent, l arc length (1 = first arc, 2 = second), T1/T2 tangents PI→PC / PI→PT,
 * lc long chord, p1/p2 long-chord angles at the PC / PT.
 */
export interface CompoundState {
  r1?: number;
  r2?: number;
  d1?: number;
  d2?: number;
  d?: number;
  t1?: number;
  t2?: number;
  l1?: number;
  l2?: number;
  T1?: number;
  T2?: number;
  lc?: number;
  p1?: number;
  p2?: number;
  parallel: boolean;
}

export type StateKey = Exclude<keyof CompoundState, "parallel">;

const KEY_OF: Record<string, StateKey> = {
  radius1: "r1",
  radius2: "r2",
  delta1: "d1",
  delta2: "d2",
  delta: "d",
  subTangent1: "t1",
  subTangent2: "t2",
  length1: "l1",
  length2: "l2",
  tangentPC: "T1",
  tangentPT: "T2",
  longChord: "lc",
  chordAnglePC: "p1",
  chordAnglePT: "p2",
};

/** Initial state from solver knowns. */
export function stateFromKnowns(knowns: Known[]): CompoundState {
  const s: CompoundState = { parallel: false };
  for (const k of knowns) {
    if (k.key === "commonTangentParallelToLongChord") s.parallel = true;
    else s[KEY_OF[k.key]!] = k.value;
  }
  return s;
}

/** True when the four defining parameters are all known. */
export function isComplete(s: CompoundState): s is CompoundState & { r1: number; r2: number; d1: number; d2: number } {
  return s.r1 !== undefined && s.r2 !== undefined && s.d1 !== undefined && s.d2 !== undefined;
}

/** Sets `key` when unknown and the value is finite; reports whether anything changed. */
export function learn(s: CompoundState, key: StateKey, value: number): boolean {
  if (s[key] !== undefined || !Number.isFinite(value)) return false;
  s[key] = value;
  return true;
}

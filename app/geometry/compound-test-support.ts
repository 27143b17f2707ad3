import { computeCompoundCurve, type CompoundCurve } from "./compound-curve";
import { COMPOUND_ANGLE_KEYS, COMPOUND_LENGTH_KEYS, parseCompoundGiven, type CompoundGiven } from "./compound-knowns";
import { propagateCompound } from "./compound-propagate";
import { selectIndependentKnowns } from "./compound-rank";
import { stateFromKnowns } from "./compound-state";
import { degToRad } from "./angles";

/** Test helper (not part of the API): every set of four knowns the solver accepts. */
export type KnownSet = (keyof CompoundGiven)[];

const VALUE_KEYS = [...COMPOUND_LENGTH_KEYS, ...COMPOUND_ANGLE_KEYS];

function subsets<T>(items: readonly T[], k: number): T[][] {
  if (k === 0) return [[]];
  return items.flatMap((x, i) => subsets(items.slice(i + 1), k - 1).map((rest) => [x, ...rest]));
}

/** Every 4-subset of value knowns, plus every 3-subset with the parallel condition, that fixes the curve. */
export function listIndependentSets(): KnownSet[] {
  const probe = computeCompoundCurve({ radius1: 613.7, radius2: 241.3, delta1: 41.9, delta2: 29.9 });
  const plain = subsets(VALUE_KEYS, 4) as KnownSet[];
  const parallel = subsets(VALUE_KEYS, 3).map((s) => [...s, "commonTangentParallelToLongChord"] as KnownSet);
  return [...plain, ...parallel].filter((set) => selectIndependentKnowns(parseCompoundGiven(givenFrom(probe, set))).rank === 4);
}

/** True when the closed forms leave both angles free for this set (a two-dimensional search). */
export function leavesTwoFreeAngles(set: KnownSet): boolean {
  const probe = computeCompoundCurve({ radius1: 613.7, radius2: 241.3, delta1: 41.9, delta2: 29.9 });
  const { chosen } = selectIndependentKnowns(parseCompoundGiven(givenFrom(probe, set)));
  return propagateCompound(stateFromKnowns(chosen)).some((s) => s.d === undefined && s.d1 === undefined && s.d2 === undefined);
}

/** The given object for a set of keys, read from a forward solution. */
export function givenFrom(curve: CompoundCurve, set: KnownSet): CompoundGiven {
  const given: CompoundGiven = {};
  for (const key of set) {
    if (key === "commonTangentParallelToLongChord") given.commonTangentParallelToLongChord = true;
    else given[key] = curve[key];
  }
  return given;
}

/** True when a solution has the expected parameters to 1e-9 relative in radii and 1e-10 rad in angles. */
export function sameCurve(s: CompoundCurve, r1: number, r2: number, d1Deg: number, d2Deg: number): boolean {
  return (
    Math.abs(s.radius1 - r1) <= 1e-9 * r1 &&
    Math.abs(s.radius2 - r2) <= 1e-9 * r2 &&
    Math.abs(degToRad(s.delta1 - d1Deg)) <= 1e-10 &&
    Math.abs(degToRad(s.delta2 - d2Deg)) <= 1e-10
  );
}

/** True when a solution reproduces every given value within the solver's verification tolerances. */
export function reproduces(s: CompoundCurve, given: CompoundGiven): boolean {
  return Object.entries(given).every(([key, v]) => {
    if (key === "commonTangentParallelToLongChord") return Math.abs(degToRad(s.chordAnglePC - s.delta1)) <= 1e-10;
    const got = s[key as keyof CompoundCurve] as number;
    const isAngle = (COMPOUND_ANGLE_KEYS as readonly string[]).includes(key);
    return isAngle ? Math.abs(degToRad(got - (v as number))) <= 1e-10 : Math.abs(got - (v as number)) <= 1e-9 * (v as number);
  });
}

import { degToRad } from "./angles";
import type { CompoundCore } from "./compound-core";
import { GeometryInputError } from "./errors";
import { VERIFY_ANGLE_RAD, VERIFY_LENGTH_REL } from "./tolerances";
import { requireFinite } from "./validate";

/** Length-valued knowns of a compound curve (working length units). */
export const COMPOUND_LENGTH_KEYS = [
  "radius1",
  "radius2",
  "tangentPC",
  "tangentPT",
  "subTangent1",
  "subTangent2",
  "length1",
  "length2",
  "longChord",
] as const;

/** Angle-valued knowns of a compound curve (decimal degrees at the edge). */
export const COMPOUND_ANGLE_KEYS = ["delta", "delta1", "delta2", "chordAnglePC", "chordAnglePT"] as const;

export type CompoundLengthKey = (typeof COMPOUND_LENGTH_KEYS)[number];
export type CompoundAngleKey = (typeof COMPOUND_ANGLE_KEYS)[number];
export type CompoundKnownKey = CompoundLengthKey | CompoundAngleKey | "commonTangentParallelToLongChord";

/** Knowns handed to the solver: any subset; lengths in one unit, angles in decimal degrees. */
export type CompoundGiven = Partial<Record<CompoundLengthKey | CompoundAngleKey, number>> & {
  /** True: the common tangent at the PCC is parallel to the long chord (see solveCompoundCurve). */
  commonTangentParallelToLongChord?: boolean;
};

/** One known in solver form: angles in radians; "parallel" has value 0 (its residual is φ_PC − Δ1). */
export interface Known {
  key: CompoundKnownKey;
  kind: "length" | "angle" | "condition";
  value: number;
}

/** Value of a known computed from a forward solution (radians for angles). */
export function readKnown(core: CompoundCore, key: CompoundKnownKey): number {
  switch (key) {
    case "delta":
      return core.deltaRad;
    case "delta1":
      return core.delta1Rad;
    case "delta2":
      return core.delta2Rad;
    case "chordAnglePC":
      return core.chordAnglePCRad;
    case "chordAnglePT":
      return core.chordAnglePTRad;
    case "commonTangentParallelToLongChord":
      // Parallel ⇔ the long chord turns by exactly Δ1 from the back tangent (alternate angles).
      return core.chordAnglePCRad - core.delta1Rad;
    default:
      return core[key];
  }
}

/** Scaled residual of one known: relative for lengths, radians for angles. */
export function residualOf(core: CompoundCore, known: Known): number {
  const f = readKnown(core, known.key);
  return known.kind === "length" ? (f - known.value) / known.value : f - known.value;
}

/** True when the forward solution reproduces the known within the verification tolerances. */
export function knownHolds(core: CompoundCore, known: Known): boolean {
  const f = readKnown(core, known.key);
  if (!Number.isFinite(f)) return false;
  return known.kind === "length"
    ? Math.abs(f - known.value) <= VERIFY_LENGTH_REL * Math.abs(known.value)
    : Math.abs(f - known.value) <= VERIFY_ANGLE_RAD;
}

/** Validates the given object and converts it to solver knowns. Throws on bad values. */
export function parseCompoundGiven(given: CompoundGiven): Known[] {
  if (given === null || typeof given !== "object") {
    throw new GeometryInputError("missing_knowns", "compound curve knowns must be an object", { field: "given" });
  }
  const knowns: Known[] = [];
  for (const key of COMPOUND_LENGTH_KEYS) {
    const v = given[key];
    if (v === undefined) continue;
    const n = requireFinite(v, key);
    if (n <= 0) throw new GeometryInputError("out_of_range", `${key} must be a positive length, got ${n}`, { field: key });
    knowns.push({ key, kind: "length", value: n });
  }
  for (const key of COMPOUND_ANGLE_KEYS) {
    const v = given[key];
    if (v === undefined) continue;
    const n = requireFinite(v, key);
    if (!(n > 0 && n < 180)) {
      throw new GeometryInputError("invalid_angle", `${key} must be more than 0° and less than 180°, got ${n}°`, { field: key });
    }
    knowns.push({ key, kind: "angle", value: degToRad(n) });
  }
  const parallel = given.commonTangentParallelToLongChord;
  if (parallel !== undefined && typeof parallel !== "boolean") {
    throw new GeometryInputError("invalid_number", "commonTangentParallelToLongChord must be true or false", {
      field: "commonTangentParallelToLongChord",
    });
  }
  if (parallel === true) knowns.push({ key: "commonTangentParallelToLongChord", kind: "condition", value: 0 });
  return knowns;
}

import { evaluateCompoundCore, type CompoundCore } from "./compound-core";
import { toCompoundCurve, type CompoundCurve, type CompoundStationInput } from "./compound-curve";
import { describeNoSolution } from "./compound-diagnose";
import { knownHolds, parseCompoundGiven, type CompoundGiven, type Known } from "./compound-knowns";
import { solveCompoundNumerically, type CompoundParams } from "./compound-newton";
import { isIsolatedRoot, polishCompoundRoot } from "./compound-polish";
import { propagateCompound } from "./compound-propagate";
import { selectIndependentKnowns } from "./compound-rank";
import { isComplete, stateFromKnowns } from "./compound-state";
import { GeometryInputError } from "./errors";
import { ROOT_DEDUP_REL } from "./tolerances";

/**
 * Solves a two-centred compound curve from any sufficient set of four independent knowns (more
 * are allowed if they agree). Closed forms first (arc relations, the PC–PI–PT triangle by the
 * sine/cosine laws, the linear radius relations); a multi-start Levenberg–Marquardt solve
 * otherwise. Every root is recomputed forwards and compared with every given value (1e-9
 * relative in lengths, 1e-10 rad in angles); failing roots are dropped, so every returned
 * solution reproduces the knowns. All distinct solutions are returned.
 *
 * `commonTangentParallelToLongChord: true` means the common tangent at the PCC is parallel to
 * the long chord. By alternate angles the chord then turns from the back tangent by exactly Δ1,
 * so chordAnglePC = Δ1 and chordAnglePT = Δ2; equivalently R1(1 − cos Δ1) = R2(1 − cos Δ2)
 * (the two arcs' chord offsets from the common tangent balance).
 *
 * Throws `missing_knowns` ("need 4 independent knowns, got 3: …") when the set does not fix the
 * curve, `inconsistent_knowns` when no curve satisfies it.
 */
export function solveCompoundCurve(given: CompoundGiven, stations: CompoundStationInput = {}): { solutions: CompoundCurve[] } {
  const knowns = parseCompoundGiven(given);
  const { chosen, rank } = selectIndependentKnowns(knowns);
  if (rank < 4) throw missingKnowns(knowns, rank);
  const roots = dedupeRoots(findRoots(chosen).map((p) => polishCompoundRoot(chosen, p)).filter(isValidParams));
  const fitting = roots.map((p) => evaluateCompoundCore(...p)).filter((core) => chosen.every((k) => knownHolds(core, k)));
  if (fitting.length === 0) throw describeNoSolution(chosen);
  const isolated = fitting.filter((core) => isIsolatedRoot(chosen, [core.radius1, core.radius2, core.delta1Rad, core.delta2Rad]));
  if (isolated.length === 0) throw notDetermined(chosen);
  const agreeing = isolated.filter((core) => knowns.every((k) => knownHolds(core, k)));
  if (agreeing.length === 0) throw overDetermined(knowns, chosen, isolated[0]!);
  return { solutions: agreeing.map((core) => toCompoundCurve(core, stations)) };
}

function findRoots(chosen: Known[]): CompoundParams[] {
  const states = propagateCompound(stateFromKnowns(chosen));
  const roots: CompoundParams[] = [];
  for (const s of states) {
    if (isComplete(s)) {
      if (isValidParams([s.r1, s.r2, s.d1, s.d2])) roots.push([s.r1, s.r2, s.d1, s.d2]);
    } else {
      roots.push(...solveCompoundNumerically(chosen, s).filter(isValidParams));
    }
  }
  return roots;
}

function isValidParams([r1, r2, d1, d2]: CompoundParams): boolean {
  return r1 > 0 && r2 > 0 && d1 > 0 && d2 > 0 && d1 + d2 < Math.PI && [r1, r2, d1, d2].every(Number.isFinite);
}

function dedupeRoots(roots: CompoundParams[]): CompoundParams[] {
  const out: CompoundParams[] = [];
  for (const p of roots) {
    const same = out.some(
      (q) =>
        Math.abs(p[0] - q[0]) <= ROOT_DEDUP_REL * q[0] &&
        Math.abs(p[1] - q[1]) <= ROOT_DEDUP_REL * q[1] &&
        Math.abs(p[2] - q[2]) <= ROOT_DEDUP_REL &&
        Math.abs(p[3] - q[3]) <= ROOT_DEDUP_REL,
    );
    if (!same) out.push(p);
  }
  return out;
}

function missingKnowns(knowns: Known[], rank: number): GeometryInputError {
  const names = knowns.map((k) => k.key);
  const message =
    knowns.length < 4
      ? `need 4 independent knowns, got ${knowns.length}: ${names.join(", ") || "none"}`
      : `need 4 independent knowns; ${names.join(", ")} fix only ${rank} of R1, R2, Δ1, Δ2 (some follow from others, e.g. Δ = Δ1 + Δ2)`;
  return new GeometryInputError("missing_knowns", message, { field: "given", given: names, independent: rank });
}

function notDetermined(chosen: Known[]): GeometryInputError {
  const names = chosen.map((k) => k.key).join(", ");
  return new GeometryInputError(
    "missing_knowns",
    `${names} do not fix a single compound curve here: a whole family fits (for example R1 = R2 is a simple curve and any split of Δ works)`,
    { field: "given", given: chosen.map((k) => k.key) },
  );
}

function overDetermined(knowns: Known[], chosen: Known[], core: CompoundCore): GeometryInputError {
  const bad = knowns.filter((k) => !knownHolds(core, k)).map((k) => k.key);
  const base = chosen.map((k) => k.key).join(", ");
  return new GeometryInputError(
    "inconsistent_knowns",
    `the knowns disagree: the curve fixed by ${base} does not match the given ${bad.join(", ")}`,
    { field: bad[0] ?? "given", conflicting: bad },
  );
}

import { radToDeg } from "./angles";
import { makeCurveArcs, makeTangent } from "./alignment-elements";
import { measureAlignmentLegs, type AlignmentLegs } from "./alignment-legs";
import type { AlignmentElement, AlignmentInput, CurveSummary, KeyStation } from "./alignment-types";
import { GeometryInputError } from "./errors";
import { resolvePiCurve, type ResolvedPiCurve } from "./pi-curves";
import { SAME_POINT_REL, TANGENT_FIT_REL } from "./tolerances";
import { roundForMessage } from "./validate";
import { scaleVec, subVec, unitAtRad, type Vec2 } from "./vec2";

/** A key point before station equations are applied. */
export type RawKeyPoint = Pick<KeyStation, "label" | "station" | "piIndex"> & { point: Vec2 };

/** Elements, curve summaries and key points of an alignment, internal stations. */
export interface BuiltAlignment {
  legs: AlignmentLegs;
  elements: AlignmentElement[];
  curves: CurveSummary[];
  keyPoints: RawKeyPoint[];
  length: number;
}

/**
 * Turns PIs into elements: tangent, arc(s), tangent, … A PI without a curve is an angle point.
 * Each leg must hold the tangents of the curves at both its ends (T_ahead + T_back ≤ leg), else
 * `tangent_overrun`. Zero-length tangents are dropped; where a curve's PT is the next curve's
 * PC the key point becomes a PRC (opposite turns) or PCC (same turn).
 */
export function buildAlignment(input: AlignmentInput): BuiltAlignment {
  const legs = measureAlignmentLegs(input);
  const n = legs.points.length;
  const curves = legs.points.map((_, i) => {
    const c = input.points[i]!.curve;
    return c === undefined || i === 0 || i === n - 1 ? undefined : resolvePiCurve(c, Math.abs(legs.deflections[i]!), i);
  });
  checkTangentsFit(legs, curves);
  const elements: AlignmentElement[] = [];
  const summaries: CurveSummary[] = [];
  const keys: RawKeyPoint[] = [{ label: "POB", station: input.startStation, point: legs.points[0]!, piIndex: 0 }];
  let at: Vec2 = legs.points[0]!;
  let station = input.startStation;
  const tiny = SAME_POINT_REL * legs.scale;
  for (let i = 1; i < n; i++) {
    const curve = curves[i];
    const pi = legs.points[i]!;
    const to = curve ? subVec(pi, scaleVec(unitAtRad(legs.headings[i - 1]!), curve.tangentPC)) : pi;
    const tangent = makeTangent(at, to, station);
    if (tangent.length > tiny) {
      elements.push(tangent);
      station = tangent.endStation;
    }
    if (!curve) {
      keys.push({ label: i === n - 1 ? "POE" : "PI", station, point: pi, piIndex: i });
      at = pi;
      continue;
    }
    const joinsPrevious = tangent.length <= tiny && keys[keys.length - 1]!.label === "PT";
    const arcs = makeCurveArcs(legs, i, curve, station);
    elements.push(...arcs);
    if (joinsPrevious) {
      const prev = keys[keys.length - 1]!;
      const prevTurn = legs.deflections[prev.piIndex!]!;
      prev.label = Math.sign(prevTurn) === Math.sign(legs.deflections[i]!) ? "PCC" : "PRC";
    } else {
      keys.push({ label: "PC", station, point: arcs[0]!.start, piIndex: i });
    }
    keys.push({ label: "PI", station: station + curve.tangentPC, point: pi, piIndex: i });
    if (arcs.length > 1) keys.push({ label: "PCC", station: arcs[0]!.endStation, point: arcs[0]!.end, piIndex: i });
    station = arcs[arcs.length - 1]!.endStation;
    at = arcs[arcs.length - 1]!.end;
    keys.push({ label: "PT", station, point: at, piIndex: i });
    summaries.push(summarize(i, legs, curve, arcs[0]!.startStation, station));
  }
  sortKeys(keys);
  return { legs, elements, curves: summaries, keyPoints: keys, length: station - input.startStation };
}

function sortKeys(keys: RawKeyPoint[]): void {
  // The PI of a curve lies off the line but is listed at PC + T; keep the list in station order.
  keys.sort((a, b) => a.station - b.station);
}

function checkTangentsFit(legs: AlignmentLegs, curves: (ResolvedPiCurve | undefined)[]): void {
  legs.lengths.forEach((len, j) => {
    const need = (curves[j]?.tangentPT ?? 0) + (curves[j + 1]?.tangentPC ?? 0);
    if (need <= len * (1 + TANGENT_FIT_REL)) return;
    const who = [curves[j] ? `PI ${j}` : undefined, curves[j + 1] ? `PI ${j + 1}` : undefined].filter(Boolean).join(" and ");
    throw new GeometryInputError(
      "tangent_overrun",
      `${who.includes("and") ? "the curves at " + who + " need" : "the curve at " + who + " needs"} ${roundForMessage(need)} of tangent but the leg from point ${j} to point ${j + 1} is only ${roundForMessage(len)} long`,
      { field: `points.${curves[j + 1] ? j + 1 : j}.curve`, piIndex: curves[j + 1] ? j + 1 : j, needed: need, available: len },
    );
  });
}

function summarize(i: number, legs: AlignmentLegs, c: ResolvedPiCurve, pc: number, pt: number): CurveSummary {
  const d = legs.deflections[i]!;
  const base: CurveSummary = {
    piIndex: i,
    type: c.type,
    direction: d > 0 ? "left" : "right",
    deltaDeg: radToDeg(d),
    tangentPC: c.tangentPC,
    tangentPT: c.tangentPT,
    length: pt - pc,
    pcStation: pc,
    ptStation: pt,
    piStation: pc + c.tangentPC,
  };
  const [a1, a2] = c.arcs;
  if (c.type === "simple" || !a2) return { ...base, radius: a1!.radius };
  return {
    ...base,
    radius1: a1!.radius,
    radius2: a2.radius,
    delta1Deg: radToDeg(a1!.deltaRad),
    delta2Deg: radToDeg(a2.deltaRad),
    pccStation: pc + a1!.radius * a1!.deltaRad,
  };
}

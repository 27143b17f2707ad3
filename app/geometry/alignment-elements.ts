import { azimuthDegFromMathRad } from "./bearings";
import { radToDeg } from "./angles";
import type { AlignmentLegs } from "./alignment-legs";
import type { ArcElement, TangentElement } from "./alignment-types";
import type { ResolvedPiCurve } from "./pi-curves";
import { addVec, distanceBetween, rotateVec, scaleVec, subVec, unitAtRad, type Vec2 } from "./vec2";

/** Builds a tangent element between two points at the given internal start station. */
export function makeTangent(start: Vec2, end: Vec2, startStation: number): TangentElement {
  const length = distanceBetween(start, end);
  return {
    type: "tangent",
    start,
    end,
    startStation,
    endStation: startStation + length,
    length,
    azimuthDeg: azimuthDegFromMathRad(Math.atan2(end[1] - start[1], end[0] - start[0])),
  };
}

/**
 * Builds the arc leaving `start` with math heading `headingRad`, turning by `deltaRad` (unsigned)
 * to the left (`sign` = +1) or right (−1). The centre is R along the normal on the turning side.
 */
export function makeArc(
  start: Vec2,
  headingRad: number,
  radius: number,
  deltaRad: number,
  sign: 1 | -1,
  startStation: number,
  piIndex: number,
): ArcElement {
  const center = addVec(start, scaleVec(unitAtRad(headingRad + (sign * Math.PI) / 2), radius));
  const end = addVec(center, rotateVec(subVec(start, center), sign * deltaRad));
  const length = radius * deltaRad;
  const subTangent = radius * Math.tan(deltaRad / 2);
  return {
    type: "arc",
    start,
    end,
    center,
    pi: addVec(start, scaleVec(unitAtRad(headingRad), subTangent)),
    radius,
    deltaDeg: sign * radToDeg(deltaRad),
    direction: sign > 0 ? "left" : "right",
    length,
    startStation,
    endStation: startStation + length,
    startAzimuthDeg: azimuthDegFromMathRad(headingRad),
    endAzimuthDeg: azimuthDegFromMathRad(headingRad + sign * deltaRad),
    chord: 2 * radius * Math.sin(deltaRad / 2),
    piIndex,
  };
}

/** Arcs of one PI's curve, starting at its PC; the last arc ends exactly on the PT. */
export function makeCurveArcs(legs: AlignmentLegs, i: number, curve: ResolvedPiCurve, pcStation: number): ArcElement[] {
  const pi = legs.points[i]!;
  const back = legs.headings[i - 1]!;
  const ahead = legs.headings[i]!;
  const sign: 1 | -1 = legs.deflections[i]! > 0 ? 1 : -1;
  const pc = subVec(pi, scaleVec(unitAtRad(back), curve.tangentPC));
  const pt = addVec(pi, scaleVec(unitAtRad(ahead), curve.tangentPT));
  const arcs: ArcElement[] = [];
  let start = pc;
  let heading = back;
  let station = pcStation;
  for (const part of curve.arcs) {
    const arc = makeArc(start, heading, part.radius, part.deltaRad, sign, station, i);
    arcs.push(arc);
    start = arc.end;
    heading += sign * part.deltaRad;
    station = arc.endStation;
  }
  // Snap the PT to the forward tangent so the next tangent keeps the leg's exact direction.
  arcs[arcs.length - 1]!.end = pt;
  return arcs;
}

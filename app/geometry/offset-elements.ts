import { mathRadFromAzimuthDeg } from "./bearings";
import { degToRad } from "./angles";
import type { AlignmentElement, ArcElement, TangentElement } from "./alignment-types";
import { GeometryInputError } from "./errors";
import { SAME_POINT_REL } from "./tolerances";
import { requireFinite, roundForMessage } from "./validate";
import { addVec, crossVec, distanceBetween, scaleVec, subVec, unitAtRad, type Vec2 } from "./vec2";

/**
 * Exact parallel of the centreline at signed distance `w`, right of the line (looking ahead)
 * positive. A tangent shifts along its right normal; an arc stays concentric with radius R + w
 * for a left-hand arc (centre on the left) and R − w for a right-hand arc, and keeps its Δ, so
 * its length is (R ± w)·Δ. At angle points (no curve) neighbouring offset tangents are trimmed or
 * extended to meet (mitred), which is how a parallel right-of-way line bends (common practice).
 * Elements keep the centreline stations they run beside. Throws `offset_exceeds_radius` when an
 * inside offset reaches a radius and `tangent_overrun` when a mitre consumes a whole tangent.
 */
export function offsetElements(elements: AlignmentElement[], w: number): AlignmentElement[] {
  const dist = requireFinite(w, "offset");
  const shifted = elements.map((e) => (e.type === "tangent" ? shiftTangent(e, dist) : shiftArc(e, dist)));
  for (let i = 0; i + 1 < shifted.length; i++) {
    const a = shifted[i]!;
    const b = shifted[i + 1]!;
    if (a.type === "tangent" && b.type === "tangent" && distanceBetween(a.end, b.start) > SAME_POINT_REL * (a.length + b.length)) {
      mitre(a, b, elements[i]!.endStation);
    }
  }
  return shifted;
}

function shiftTangent(e: TangentElement, w: number): TangentElement {
  const u = unitAtRad(mathRadFromAzimuthDeg(e.azimuthDeg));
  const right: Vec2 = [u[1], -u[0]];
  return { ...e, start: addVec(e.start, scaleVec(right, w)), end: addVec(e.end, scaleVec(right, w)) };
}

function shiftArc(e: ArcElement, w: number): ArcElement {
  const sign = e.direction === "left" ? 1 : -1;
  const radius = e.radius + sign * w;
  if (!(radius > SAME_POINT_REL * e.radius)) {
    throw new GeometryInputError(
      "offset_exceeds_radius",
      `an offset of ${roundForMessage(w)} to the ${w > 0 ? "right" : "left"} reaches the centre of the ${roundForMessage(e.radius)} radius arc at PI ${e.piIndex}`,
      { field: "offset", piIndex: e.piIndex, radius: e.radius },
    );
  }
  const k = radius / e.radius;
  const deltaRad = degToRad(Math.abs(e.deltaDeg));
  const along = (p: Vec2) => addVec(e.center, scaleVec(subVec(p, e.center), k));
  const out: ArcElement = { ...e, radius, start: along(e.start), end: along(e.end), length: radius * deltaRad, chord: e.chord * k };
  if (e.pi) out.pi = addVec(out.start, scaleVec(unitAtRad(mathRadFromAzimuthDeg(e.startAzimuthDeg)), radius * Math.tan(deltaRad / 2)));
  return out;
}

/** Moves the shared end of two offset tangents to the intersection of their lines. */
function mitre(a: TangentElement, b: TangentElement, station: number): void {
  const ua = unitAtRad(mathRadFromAzimuthDeg(a.azimuthDeg));
  const ub = unitAtRad(mathRadFromAzimuthDeg(b.azimuthDeg));
  const t = crossVec(subVec(b.start, a.start), ub) / crossVec(ua, ub);
  const meet = addVec(a.start, scaleVec(ua, t));
  const remainingB = (b.end[0] - meet[0]) * ub[0] + (b.end[1] - meet[1]) * ub[1];
  if (!(t > 0) || !(remainingB > 0)) {
    throw new GeometryInputError("tangent_overrun", `the offset lines meet beyond a neighbouring tangent at the angle point at station ${roundForMessage(station)}`, {
      field: "offset",
    });
  }
  a.end = meet;
  a.length = t;
  b.start = meet;
  b.length = remainingB;
}

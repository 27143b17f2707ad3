import { mathRadFromAzimuthDeg } from "./bearings";
import type { AlignmentElement, ArcElement, TangentElement } from "./alignment-types";
import type { WidthProfile } from "./corridor-widths";
import { JOINT_ANGLE_RAD } from "./corridor-tolerances";
import { GeometryInputError } from "./errors";
import { normalizeRadSigned } from "./angles";
import { roundForMessage } from "./validate";
import { addVec, dotVec, scaleVec, subVec, unitAtRad, type Vec2 } from "./vec2";

/** Where the right-of-way is cut across between two elements (or at an end): its two corners. */
export interface Joint {
  station: number;
  right: Vec2;
  left: Vec2;
}

/**
 * The cut lines at the start, between every two elements, and at the end. Ends and joints next to
 * a curve are cut radially (perpendicular to the line); between two tangents (an angle point) both
 * right-of-way lines are mitred on the bisector, so the offset lines meet exactly: the corner is
 * PI + (nA + nB)·w / (1 + nA·nB) for unit normals nA, nB (intersection of two parallels, closed form).
 */
export function computeJoints(elements: AlignmentElement[], profile: WidthProfile): Joint[] {
  const joints: Joint[] = [];
  for (let i = 0; i <= elements.length; i++) {
    const prev = elements[i - 1];
    const next = elements[i];
    const station = next ? next.startStation : prev!.endStation;
    const wR = profile.right(station);
    const wL = profile.left(station);
    if (prev && next) checkSmoothAtCurve(prev, next, station);
    if (prev?.type === "tangent" && next?.type === "tangent") joints.push({ station, ...mitreCorners(prev.end, prev.azimuthDeg, next.azimuthDeg, wR, wL, station) });
    else if (prev?.type === "arc") joints.push({ station, ...radialCorners(prev, prev.end, wR, wL) });
    else if (next?.type === "arc") joints.push({ station, ...radialCorners(next, next.start, wR, wL) });
    else {
      const t = (next ?? prev) as TangentElement; // an end of the line on a tangent
      const at = next ? t.start : t.end;
      const n = rightNormal(t.azimuthDeg);
      joints.push({ station, right: addVec(at, scaleVec(n, wR)), left: addVec(at, scaleVec(n, -wL)) });
    }
  }
  return joints;
}

/** Unit normal to the right of a direction given as an azimuth (degrees clockwise from north). */
export function rightNormal(azimuthDeg: number): Vec2 {
  const u = unitAtRad(mathRadFromAzimuthDeg(azimuthDeg));
  return [u[1], -u[0]];
}

/** Radius of the right and left right-of-way lines of an arc at half-widths wR, wL. */
export function sideRadii(arc: ArcElement, wR: number, wL: number): { right: number; left: number } {
  return arc.direction === "left" ? { right: arc.radius + wR, left: arc.radius - wL } : { right: arc.radius - wR, left: arc.radius + wL };
}

function radialCorners(arc: ArcElement, at: Vec2, wR: number, wL: number): { right: Vec2; left: Vec2 } {
  const u = scaleVec(subVec(at, arc.center), 1 / arc.radius);
  const r = sideRadii(arc, wR, wL);
  return { right: addVec(arc.center, scaleVec(u, r.right)), left: addVec(arc.center, scaleVec(u, r.left)) };
}

function mitreCorners(pi: Vec2, azA: number, azB: number, wR: number, wL: number, station: number): { right: Vec2; left: Vec2 } {
  const nA = rightNormal(azA);
  const nB = rightNormal(azB);
  const denom = 1 + dotVec(nA, nB);
  if (!(denom > 1e-6)) {
    throw new GeometryInputError("tangent_overrun", `the line turns back on itself at the angle point at station ${roundForMessage(station)}`, { field: "elements" });
  }
  const bis = addVec(nA, nB);
  return { right: addVec(pi, scaleVec(bis, wR / denom)), left: addVec(pi, scaleVec(bis, -wL / denom)) };
}

/** A curve must meet its neighbours tangentially: a radial cut cannot follow an angle. */
function checkSmoothAtCurve(prev: AlignmentElement, next: AlignmentElement, station: number): void {
  if (prev.type === "tangent" && next.type === "tangent") return;
  const out = prev.type === "tangent" ? prev.azimuthDeg : prev.endAzimuthDeg;
  const into = next.type === "tangent" ? next.azimuthDeg : next.startAzimuthDeg;
  const turn = normalizeRadSigned(mathRadFromAzimuthDeg(into) - mathRadFromAzimuthDeg(out));
  if (Math.abs(turn) > JOINT_ANGLE_RAD) {
    throw new GeometryInputError("invalid_alignment", `an angle point meets a curve directly at station ${roundForMessage(station)}; leave a tangent between them`, { field: "elements" });
  }
}

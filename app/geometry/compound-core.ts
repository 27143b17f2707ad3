import { addVec, lengthVec, scaleVec, type Vec2 } from "./vec2";

/**
 * Every derived quantity of a two-centred compound curve, radians inside. Local frame: PC at the
 * origin, back tangent along +x, both arcs turning left (counter-clockwise); a right-hand curve is
 * this frame mirrored in the x-axis, which changes no length or unsigned angle.
 */
export interface CompoundCore {
  radius1: number;
  radius2: number;
  delta1Rad: number;
  delta2Rad: number;
  deltaRad: number;
  subTangent1: number;
  subTangent2: number;
  commonTangent: number;
  /** Vertex V1 → PI and PI → V2 (sine law in triangle V1–PI–V2). */
  vertexToPiPC: number;
  piToVertexPT: number;
  tangentPC: number;
  tangentPT: number;
  length1: number;
  length2: number;
  chord1: number;
  chord2: number;
  longChord: number;
  chordAnglePCRad: number;
  chordAnglePTRad: number;
  pcc: Vec2;
  pt: Vec2;
  pi: Vec2;
  center1: Vec2;
  center2: Vec2;
}

/**
 * Forward solution from the four independent parameters. Tangents by the vertex triangle
 * (Schofield & Breach, Engineering Surveying 6th ed. §10.3): t1 = R1 tan(Δ1/2), t2 = R2 tan(Δ2/2),
 * V1→PI = (t1+t2) sin Δ2 / sin Δ, PI→V2 = (t1+t2) sin Δ1 / sin Δ, T_PC = t1 + V1→PI, T_PT = t2 + PI→V2.
 * Coordinates follow from the arcs; no input checks (callers validate).
 */
export function evaluateCompoundCore(radius1: number, radius2: number, delta1Rad: number, delta2Rad: number): CompoundCore {
  const deltaRad = delta1Rad + delta2Rad;
  const sinD = Math.sin(deltaRad);
  const subTangent1 = radius1 * Math.tan(delta1Rad / 2);
  const subTangent2 = radius2 * Math.tan(delta2Rad / 2);
  const commonTangent = subTangent1 + subTangent2;
  const vertexToPiPC = (commonTangent * Math.sin(delta2Rad)) / sinD;
  const piToVertexPT = (commonTangent * Math.sin(delta1Rad)) / sinD;
  const center1: Vec2 = [0, radius1];
  const pcc: Vec2 = [radius1 * Math.sin(delta1Rad), radius1 * (1 - Math.cos(delta1Rad))];
  const center2 = addVec(pcc, scaleVec([-Math.sin(delta1Rad), Math.cos(delta1Rad)], radius2));
  const pt = addVec(center2, scaleVec([Math.sin(deltaRad), -Math.cos(deltaRad)], radius2));
  const tangentPC = subTangent1 + vertexToPiPC;
  const tangentPT = subTangent2 + piToVertexPT;
  const longChord = lengthVec(pt);
  const chordAnglePCRad = Math.atan2(pt[1], pt[0]);
  return {
    radius1,
    radius2,
    delta1Rad,
    delta2Rad,
    deltaRad,
    subTangent1,
    subTangent2,
    commonTangent,
    vertexToPiPC,
    piToVertexPT,
    tangentPC,
    tangentPT,
    length1: radius1 * delta1Rad,
    length2: radius2 * delta2Rad,
    chord1: 2 * radius1 * Math.sin(delta1Rad / 2),
    chord2: 2 * radius2 * Math.sin(delta2Rad / 2),
    longChord,
    chordAnglePCRad,
    chordAnglePTRad: deltaRad - chordAnglePCRad,
    pcc,
    pt,
    pi: [tangentPC, 0],
    center1,
    center2,
  };
}

/**
 * Closed-form total tangents (derived from the PC→PCC→PT coordinates; equal to the vertex-triangle
 * result, checked in tests):
 * T_PC = [R2 − R1 cos Δ + (R1 − R2) cos Δ2] / sin Δ,  T_PT = [R1 − R2 cos Δ − (R1 − R2) cos Δ1] / sin Δ.
 */
export function computeCompoundTangentsClosedForm(
  radius1: number,
  radius2: number,
  delta1Rad: number,
  delta2Rad: number,
): { tangentPC: number; tangentPT: number } {
  const d = delta1Rad + delta2Rad;
  const s = Math.sin(d);
  return {
    tangentPC: (radius2 - radius1 * Math.cos(d) + (radius1 - radius2) * Math.cos(delta2Rad)) / s,
    tangentPT: (radius1 - radius2 * Math.cos(d) - (radius1 - radius2) * Math.cos(delta1Rad)) / s,
  };
}

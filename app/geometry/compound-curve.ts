import { radToDeg } from "./angles";
import { evaluateCompoundCore, type CompoundCore } from "./compound-core";
import { GeometryInputError } from "./errors";
import type { Vec2 } from "./vec2";
import { requireArcPair, requireCurveAngleRad, requireFinite } from "./validate";

/**
 * A two-centred compound curve, arc 1 first along stationing. Lengths in working units; every
 * angle field is in decimal degrees (the same keys the solver accepts as knowns).
 */
export interface CompoundCurve {
  radius1: number;
  radius2: number;
  delta: number;
  delta1: number;
  delta2: number;
  /** Total tangent PI→PC. */
  tangentPC: number;
  /** Total tangent PI→PT. */
  tangentPT: number;
  subTangent1: number;
  subTangent2: number;
  /** V1V2 = t1 + t2, the common tangent through the PCC. */
  commonTangent: number;
  /** Vertex-triangle sides V1→PI and PI→V2. */
  vertexToPiPC: number;
  piToVertexPT: number;
  length1: number;
  length2: number;
  length: number;
  chord1: number;
  chord2: number;
  longChord: number;
  /** Angle between the back tangent and the long chord at the PC. */
  chordAnglePC: number;
  /** Angle between the long chord and the forward tangent at the PT. */
  chordAnglePT: number;
  /** Points in a local frame: PC at the origin, back tangent along +x, turning left. */
  local: { pc: Vec2; pcc: Vec2; pt: Vec2; pi: Vec2; center1: Vec2; center2: Vec2 };
  pcStation?: number;
  pccStation?: number;
  ptStation?: number;
  /** Station of the PI measured along the back tangent: PC + tangentPC. */
  piStation?: number;
}

/** Stations to attach: give the PC or the PI station. */
export interface CompoundStationInput {
  pcStation?: number;
  piStation?: number;
}

/** Edge form of a forward solution, with stations Sta PCC = PC + L1, Sta PT = PC + L1 + L2 (Schofield & Breach §10.3). */
export function toCompoundCurve(core: CompoundCore, stations: CompoundStationInput = {}): CompoundCurve {
  const curve: CompoundCurve = {
    radius1: core.radius1,
    radius2: core.radius2,
    delta: radToDeg(core.deltaRad),
    delta1: radToDeg(core.delta1Rad),
    delta2: radToDeg(core.delta2Rad),
    tangentPC: core.tangentPC,
    tangentPT: core.tangentPT,
    subTangent1: core.subTangent1,
    subTangent2: core.subTangent2,
    commonTangent: core.commonTangent,
    vertexToPiPC: core.vertexToPiPC,
    piToVertexPT: core.piToVertexPT,
    length1: core.length1,
    length2: core.length2,
    length: core.length1 + core.length2,
    chord1: core.chord1,
    chord2: core.chord2,
    longChord: core.longChord,
    chordAnglePC: radToDeg(core.chordAnglePCRad),
    chordAnglePT: radToDeg(core.chordAnglePTRad),
    local: { pc: [0, 0], pcc: core.pcc, pt: core.pt, pi: core.pi, center1: core.center1, center2: core.center2 },
  };
  if (stations.pcStation !== undefined && stations.piStation !== undefined) {
    throw new GeometryInputError("inconsistent_knowns", "give the PC station or the PI station, not both", { field: "pcStation" });
  }
  const pc = stations.piStation !== undefined ? requireFinite(stations.piStation, "piStation") - core.tangentPC : stations.pcStation;
  if (pc !== undefined) {
    curve.pcStation = requireFinite(pc, "pcStation");
    curve.pccStation = curve.pcStation + core.length1;
    curve.ptStation = curve.pccStation + core.length2;
    curve.piStation = curve.pcStation + core.tangentPC;
  }
  return curve;
}

/** Defining parameters of a compound curve (angles in decimal degrees, both arcs turn the same way). */
export interface CompoundCurveInput extends CompoundStationInput {
  radius1: number;
  radius2: number;
  delta1: number;
  delta2: number;
}

/**
 * Forward compound curve from R1, R2, Δ1, Δ2 (vertex triangle of Schofield & Breach,
 * Engineering Surveying 6th ed. §10.3). Throws `GeometryInputError` for bad radii or angles.
 */
export function computeCompoundCurve(input: CompoundCurveInput): CompoundCurve {
  const { r1, r2, d1, d2 } = requireArcPair(input);
  requireCurveAngleRad(d1 + d2, "delta");
  return toCompoundCurve(evaluateCompoundCore(r1, r2, d1, d2), input);
}

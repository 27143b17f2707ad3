import { radToDeg } from "./angles";
import { makeArc } from "./alignment-elements";
import type { ArcElement } from "./alignment-types";
import { GeometryInputError } from "./errors";
import { requireArcPair, requireFinite } from "./validate";
import { addVec, scaleVec, unitAtRad, type Vec2 } from "./vec2";

/** Inputs of {@link computeReverseCurve}; angles in decimal degrees (unsigned). */
export interface ReverseCurveInput {
  radius1: number;
  delta1: number;
  radius2: number;
  delta2: number;
  /** Tangent between the arcs; 0 (default) means they meet at a PRC. */
  tangentLength?: number;
  /** Turn of the first arc. Default "left"; the second turns the other way. */
  firstDirection?: "left" | "right";
  /** Station of the PC. Default 0. */
  pcStation?: number;
}

/** Two opposite arcs, local frame: PC at the origin, back tangent along +x. */
export interface ReverseCurve {
  arcs: [ArcElement, ArcElement];
  /** "PRC" when the arcs meet, else the PT of arc 1 and PC of arc 2 bound a tangent. */
  join: "PRC" | "tangent";
  tangentLength: number;
  length: number;
  /** Net change of direction PC → PT, left positive. */
  netDeflectionDeg: number;
  pcStation: number;
  ptStation: number;
  pt: Vec2;
}

/**
 * Reverse curve: an arc one way, an optional tangent, an arc the other way (definitions:
 * Schofield & Breach §10.3; FM 5-233 ch. 3 advises against them except when necessary).
 */
export function computeReverseCurve(input: ReverseCurveInput): ReverseCurve {
  const { r1, r2, d1, d2 } = requireArcPair(input);
  const tangent = requireFinite(input.tangentLength ?? 0, "tangentLength");
  if (tangent < 0) throw new GeometryInputError("out_of_range", `tangentLength must be 0 or more, got ${tangent}`, { field: "tangentLength" });
  const sign: 1 | -1 = (input.firstDirection ?? "left") === "left" ? 1 : -1;
  const pc = requireFinite(input.pcStation ?? 0, "pcStation");
  const first = makeArc([0, 0], 0, r1, d1, sign, pc, 0);
  const heading = sign * d1;
  const start2 = addVec(first.end, scaleVec(unitAtRad(heading), tangent));
  const second = makeArc(start2, heading, r2, d2, sign === 1 ? -1 : 1, first.endStation + tangent, 0);
  return {
    arcs: [first, second],
    join: tangent === 0 ? "PRC" : "tangent",
    tangentLength: tangent,
    length: first.length + tangent + second.length,
    netDeflectionDeg: radToDeg(sign * (d1 - d2)),
    pcStation: pc,
    ptStation: second.endStation,
    pt: second.end,
  };
}

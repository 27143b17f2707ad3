import { radToDeg } from "./angles";
import type { AlignmentInput } from "./alignment-types";
import { GeometryInputError } from "./errors";
import { SAME_POINT_REL, ZERO_DEFLECTION_RAD } from "./tolerances";
import { parseLengthUnit } from "./units";
import { normalizeRadSigned } from "./angles";
import { requireFinite, roundForMessage } from "./validate";
import type { Vec2 } from "./vec2";

/** The straight legs between consecutive points and the signed deflection at each PI. */
export interface AlignmentLegs {
  points: Vec2[];
  /** Leg j runs from point j to point j + 1. */
  lengths: number[];
  /** Math direction (radians counter-clockwise from east) of each leg. */
  headings: number[];
  /** Signed deflection at each point (left positive); 0 at the ends. */
  deflections: number[];
  /** Size of the alignment, for relative tolerances. */
  scale: number;
}

/**
 * Checks the alignment input (units, at least two points, finite coordinates, no curve at the
 * ends, no repeated point, no reversal, no curve where the line does not turn) and measures legs.
 */
export function measureAlignmentLegs(input: AlignmentInput): AlignmentLegs {
  if (input === null || typeof input !== "object") {
    throw new GeometryInputError("invalid_alignment", "alignment must be an object", { field: "alignment" });
  }
  parseLengthUnit(input.units);
  requireFinite(input.startStation, "startStation");
  const raw = Array.isArray(input.points) ? input.points : [];
  if (raw.length < 2) {
    throw new GeometryInputError("invalid_alignment", `an alignment needs at least 2 points, got ${raw.length}`, { field: "points" });
  }
  const points = raw.map((p, i): Vec2 => [requireFinite(p?.x, `points.${i}.x`), requireFinite(p?.y, `points.${i}.y`)]);
  for (const i of [0, raw.length - 1]) {
    if (raw[i]!.curve !== undefined) {
      throw new GeometryInputError("invalid_alignment", `the ${i === 0 ? "first" : "last"} point cannot carry a curve`, { field: `points.${i}.curve`, piIndex: i });
    }
  }
  const lengths = points.slice(1).map((p, j) => Math.hypot(p[0] - points[j]![0], p[1] - points[j]![1]));
  const scale = lengths.reduce((a, b) => a + b, 0) + Math.max(...points.map((p) => Math.abs(p[0]) + Math.abs(p[1]))) * 1e-6;
  lengths.forEach((len, j) => {
    if (len <= SAME_POINT_REL * scale) {
      throw new GeometryInputError("repeated_point", `points ${j} and ${j + 1} are the same point`, { field: `points.${j + 1}`, piIndex: j + 1 });
    }
  });
  const headings = points.slice(1).map((p, j) => Math.atan2(p[1] - points[j]![1], p[0] - points[j]![0]));
  const deflections = points.map((_, i) => (i === 0 || i === points.length - 1 ? 0 : normalizeRadSigned(headings[i]! - headings[i - 1]!)));
  deflections.forEach((d, i) => checkDeflection(d, i, raw[i]!.curve !== undefined));
  return { points, lengths, headings, deflections, scale };
}

function checkDeflection(d: number, i: number, hasCurve: boolean): void {
  if (Math.abs(d) >= Math.PI - ZERO_DEFLECTION_RAD) {
    throw new GeometryInputError("invalid_angle", `the alignment reverses direction at PI ${i} (deflection ${roundForMessage(radToDeg(d))}°)`, {
      field: `points.${i}`,
      piIndex: i,
    });
  }
  if (hasCurve && Math.abs(d) < ZERO_DEFLECTION_RAD) {
    throw new GeometryInputError("zero_deflection", `PI ${i} has a curve but the alignment does not turn there (Δ = 0)`, {
      field: `points.${i}.curve`,
      piIndex: i,
    });
  }
}

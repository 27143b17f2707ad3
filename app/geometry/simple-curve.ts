import { degToRad, radToDeg } from "./angles";
import { computeDegreeFromRadius, computeRadiusFromDegree, type DegreeDefinition } from "./degree-of-curve";
import { GeometryInputError } from "./errors";
import { VERIFY_LENGTH_REL } from "./tolerances";
import { requireCurveAngleRad, requireFinite, requirePositive } from "./validate";

/** Knowns of a simple circular curve. Give `radius` or `degreeOfCurveDeg`, and `deltaDeg`. */
export interface SimpleCurveInput {
  /** Radius in working length units. */
  radius?: number;
  /** Degree of curve in decimal degrees; its definition fixes the length unit (ft or m). */
  degreeOfCurveDeg?: number;
  /** Definition of `degreeOfCurveDeg` and of the reported degree. Default "arc-100ft". */
  degreeDefinition?: DegreeDefinition;
  /** Central (intersection) angle Δ in decimal degrees, 0 < Δ < 180. */
  deltaDeg: number;
  /** Station of the PI (gives PC and PT). */
  piStation?: number;
  /** Station of the PC (alternative to piStation). */
  pcStation?: number;
}

/** Elements of a simple curve; lengths in working units, angles in decimal degrees. */
export interface SimpleCurve {
  radius: number;
  deltaDeg: number;
  tangent: number;
  length: number;
  external: number;
  middleOrdinate: number;
  longChord: number;
  /** Absent for a chord definition when the radius is under 50 ft (no 100-ft chord fits). */
  degreeOfCurveDeg?: number;
  degreeDefinition: DegreeDefinition;
  pcStation?: number;
  piStation?: number;
  ptStation?: number;
}

/**
 * Simple circular curve: T = R tan(Δ/2), L = RΔ, E = R(sec(Δ/2) − 1), M = R(1 − cos(Δ/2)),
 * LC = 2R sin(Δ/2) (Schofield & Breach, Engineering Surveying 6th ed. §10.1). Stations follow
 * Sta PC = Sta PI − T and Sta PT = Sta PC + L, never PI + T (same source).
 */
export function computeSimpleCurve(input: SimpleCurveInput): SimpleCurve {
  const definition = input.degreeDefinition ?? "arc-100ft";
  const radius = resolveRadius(input, definition);
  const deltaRad = requireCurveAngleRad(degToRad(requireFinite(input.deltaDeg, "deltaDeg")), "deltaDeg");
  const half = deltaRad / 2;
  const tangent = radius * Math.tan(half);
  const length = radius * deltaRad;
  const curve: SimpleCurve = {
    radius,
    deltaDeg: radToDeg(deltaRad),
    tangent,
    length,
    external: radius * (1 / Math.cos(half) - 1),
    middleOrdinate: radius * (1 - Math.cos(half)),
    longChord: 2 * radius * Math.sin(half),
    degreeDefinition: definition,
  };
  if (radius >= 50 || definition !== "chord-100ft") curve.degreeOfCurveDeg = computeDegreeFromRadius(radius, definition);
  if (input.piStation !== undefined && input.pcStation !== undefined) {
    throw new GeometryInputError("inconsistent_knowns", "give the PI station or the PC station, not both", { field: "pcStation" });
  }
  const pc = input.piStation !== undefined ? requireFinite(input.piStation, "piStation") - tangent : input.pcStation;
  if (pc !== undefined) {
    curve.pcStation = requireFinite(pc, "pcStation");
    curve.piStation = curve.pcStation + tangent;
    curve.ptStation = curve.pcStation + length;
  }
  return curve;
}

function resolveRadius(input: SimpleCurveInput, definition: DegreeDefinition): number {
  const fromDegree =
    input.degreeOfCurveDeg === undefined ? undefined : computeRadiusFromDegree(input.degreeOfCurveDeg, definition);
  if (input.radius === undefined) {
    if (fromDegree === undefined) {
      throw new GeometryInputError("missing_knowns", "a simple curve needs a radius or a degree of curve", { field: "radius" });
    }
    return fromDegree;
  }
  const r = requirePositive(input.radius, "radius", "a positive number of length units");
  if (fromDegree !== undefined && Math.abs(fromDegree - r) > VERIFY_LENGTH_REL * r) {
    throw new GeometryInputError(
      "inconsistent_knowns",
      `radius ${r} and degree of curve ${input.degreeOfCurveDeg}° (${definition}) disagree: that degree gives R = ${fromDegree}`,
      { field: "degreeOfCurveDeg" },
    );
  }
  return r;
}

import { degToRad, radToDeg } from "./angles";
import { GeometryInputError } from "./errors";
import { requirePositive } from "./validate";

/**
 * How a degree of curve D is defined:
 * - "arc-100ft": D subtends a 100-ft arc, R = 18000/(πD) = 5729.578/D (US highways; Brockenbrough &
 *   Boedecker, Highway Engineering Handbook ch. 2 Eq. 2.3).
 * - "arc-20m": D subtends a 20-m arc, R = 3600/(πD) = 1145.916/D (metric practice; Besavilla,
 *   Surveying for Civil and Geodetic Licensure Exam).
 * - "chord-100ft": D subtends a 100-ft chord, R = 50/sin(D/2) (traditional US railroads).
 * The length unit of R follows the definition (ft or m).
 */
export type DegreeDefinition = "arc-100ft" | "arc-20m" | "chord-100ft";

/** Radius (ft or m, per the definition) from a degree of curve in decimal degrees. */
export function computeRadiusFromDegree(degreeDeg: number, definition: DegreeDefinition): number {
  const d = requirePositive(degreeDeg, "degreeOfCurveDeg", "a positive angle in degrees");
  if (definition === "arc-100ft") return 18000 / (Math.PI * d);
  if (definition === "arc-20m") return 3600 / (Math.PI * d);
  if (d >= 180) {
    throw new GeometryInputError("invalid_angle", `a chord-definition degree of curve must be below 180°, got ${d}°`, {
      field: "degreeOfCurveDeg",
    });
  }
  return 50 / Math.sin(degToRad(d) / 2);
}

/** Degree of curve in decimal degrees from a radius (ft or m, per the definition). */
export function computeDegreeFromRadius(radius: number, definition: DegreeDefinition): number {
  const r = requirePositive(radius, "radius");
  if (definition === "arc-100ft") return 18000 / (Math.PI * r);
  if (definition === "arc-20m") return 3600 / (Math.PI * r);
  if (r < 50) {
    throw new GeometryInputError("out_of_range", `a 100-ft chord does not fit a radius of ${r} ft`, { field: "radius" });
  }
  return radToDeg(2 * Math.asin(50 / r));
}

/**
 * Curve length measured the chord-definition way, 100·Δ/Dc (sum of 100-ft chords), as written in
 * older US rights-of-way (e.g. U.S. Statutes at Large 48:789, 1934). Not the true arc R·Δ.
 */
export function computeChordDefinitionLength(radius: number, deltaRad: number): number {
  return (100 * radToDeg(deltaRad)) / computeDegreeFromRadius(radius, "chord-100ft");
}

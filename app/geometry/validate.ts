import { degToRad } from "./angles";
import { GeometryInputError } from "./errors";

/** Throws `invalid_number` unless `value` is a finite number. Returns it typed. */
export function requireFinite(value: unknown, field: string): number {
  if (typeof value !== "number" || !Number.isFinite(value)) {
    throw new GeometryInputError("invalid_number", `${field} must be a finite number, got ${String(value)}`, {
      field,
    });
  }
  return value;
}

/** Throws `out_of_range` unless `value` is a finite number > 0 (a radius, a tangent, a length). */
export function requirePositive(value: unknown, field: string, what = "a positive length"): number {
  const v = requireFinite(value, field);
  if (v <= 0) {
    throw new GeometryInputError("out_of_range", `${field} must be ${what}, got ${v}`, { field, value: v });
  }
  return v;
}

/** Throws `invalid_angle` unless 0 < deltaRad < π (a curve cannot turn through 0° or ≥ 180°). */
export function requireCurveAngleRad(deltaRad: number, field: string): number {
  const v = requireFinite(deltaRad, field);
  if (!(v > 0 && v < Math.PI)) {
    const deg = (v * 180) / Math.PI;
    throw new GeometryInputError(
      "invalid_angle",
      `${field} must be more than 0° and less than 180°, got ${roundForMessage(deg)}°`,
      { field, value: deg },
    );
  }
  return v;
}

/** Rounds a number for an error message without hiding its sign or magnitude. */
export function roundForMessage(value: number): string {
  return Number.isFinite(value) ? String(Number(value.toPrecision(10))) : String(value);
}

/** The two radii and central angles (degrees in, radians out) of a two-arc curve, each checked. */
export function requireArcPair(input: { radius1: number; radius2: number; delta1: number; delta2: number }) {
  return {
    r1: requirePositive(input.radius1, "radius1", "a positive number of length units"),
    r2: requirePositive(input.radius2, "radius2", "a positive number of length units"),
    d1: requireCurveAngleRad(degToRad(requireFinite(input.delta1, "delta1")), "delta1"),
    d2: requireCurveAngleRad(degToRad(requireFinite(input.delta2, "delta2")), "delta2"),
  };
}

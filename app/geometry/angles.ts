import { GeometryInputError } from "./errors";

const TWO_PI = 2 * Math.PI;

/** Degrees → radians. */
export function degToRad(deg: number): number {
  return (deg * Math.PI) / 180;
}

/** Radians → degrees. */
export function radToDeg(rad: number): number {
  return (rad * 180) / Math.PI;
}

/** Angle reduced to [0, 2π). */
export function normalizeRadPositive(rad: number): number {
  const r = rad % TWO_PI;
  return r < 0 ? r + TWO_PI : r;
}

/** Angle reduced to (−π, π]: the signed turn from one direction to another. */
export function normalizeRadSigned(rad: number): number {
  const r = normalizeRadPositive(rad);
  return r > Math.PI ? r - TWO_PI : r;
}

// Symbol form: 38°15'20", 38° 15' 20.5", 38°15' (minutes/seconds optional).
const SYMBOL_DMS = /^(\d+(?:\.\d+)?)\s*°\s*(?:(\d+(?:\.\d+)?)\s*['′]\s*(?:(\d+(?:\.\d+)?)\s*(?:["″]|''))?)?$/;
// Separated form: 38-15-20 or 38 15 20.5 (a lone number is decimal degrees).
const SEPARATED_DMS = /^(\d+(?:\.\d+)?)(?:(?:\s+|-)(\d+(?:\.\d+)?)(?:(?:\s+|-)(\d+(?:\.\d+)?))?)?$/;

/**
 * Parses an angle to decimal degrees: a finite number, decimal text ("38.2555", "-12.5") or
 * degrees-minutes-seconds ("38°15'20\"", "38-15-20", "38 15 20.5", "-38°15'20.5\"").
 * Minutes and seconds must be below 60 and only the last component may carry decimals.
 * Throws `invalid_angle` for anything else (never guesses).
 */
export function parseAngleDeg(input: string | number, field = "angle"): number {
  if (typeof input === "number") {
    if (Number.isFinite(input)) return input;
    throw new GeometryInputError("invalid_angle", `${field} must be a finite angle, got ${input}`, { field });
  }
  const text = String(input).trim();
  const sign = text.startsWith("-") ? -1 : 1;
  const body = text.replace(/^[+-]\s*/, "");
  const m = SYMBOL_DMS.exec(body) ?? SEPARATED_DMS.exec(body);
  if (!m) throw invalidAngle(field, text);
  const parts = [m[1], m[2], m[3]].filter((p): p is string => p !== undefined);
  if (parts.slice(0, -1).some((p) => p.includes("."))) throw invalidAngle(field, text);
  const [d = 0, mi = 0, s = 0] = parts.map(Number);
  if (mi >= 60 || s >= 60) throw invalidAngle(field, text, "minutes and seconds must be below 60");
  return sign * (d + mi / 60 + s / 3600);
}

function invalidAngle(field: string, text: string, why?: string): GeometryInputError {
  const reason = why ? `: ${why}` : "";
  return new GeometryInputError(
    "invalid_angle",
    `${field} is not an angle in decimal degrees or degrees-minutes-seconds, got "${text}"${reason}`,
    { field },
  );
}

/** Options for {@link formatDms}. */
export interface FormatDmsOptions {
  /** Decimal places on the seconds. Default 0. */
  secondsDecimals?: number;
}

/**
 * Formats decimal degrees as D°MM'SS" (e.g. 38°15'20"). Rounds the seconds first and carries
 * 60" → 1' and 60' → 1° (rounding rule of recorded descriptions, common practice).
 */
export function formatDms(deg: number, options: FormatDmsOptions = {}): string {
  if (!Number.isFinite(deg)) {
    throw new GeometryInputError("invalid_angle", `cannot format ${deg} as an angle`, { field: "angle" });
  }
  const places = options.secondsDecimals ?? 0;
  const scale = 10 ** places;
  const units = Math.round(Math.abs(deg) * 3600 * scale);
  return (units > 0 && deg < 0 ? "-" : "") + formatDmsUnits(units, places);
}

/** Formats a non-negative angle given as an integer count of 10^-places seconds. */
export function formatDmsUnits(units: number, places: number): string {
  const scale = 10 ** places;
  const d = Math.floor(units / (3600 * scale));
  const mi = Math.floor((units - d * 3600 * scale) / (60 * scale));
  const sUnits = units - d * 3600 * scale - mi * 60 * scale;
  const sText = (sUnits / scale).toFixed(places);
  const sPadded = sText.padStart(places > 0 ? places + 3 : 2, "0");
  return `${d}°${String(mi).padStart(2, "0")}'${sPadded}"`;
}

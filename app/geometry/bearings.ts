import { degToRad, formatDmsUnits, normalizeRadPositive, parseAngleDeg, radToDeg } from "./angles";
import { GeometryInputError } from "./errors";

/**
 * Directions. An azimuth is measured clockwise from grid north in degrees [0, 360); a quadrant
 * bearing is N/S, an angle 0–90°, E/W; the math direction of a vector is counter-clockwise from
 * +x (east) in radians. Coordinates are [x = easting, y = northing].
 */

const BEARING = /^([NS])\s*(.*?)\s*([EW])$/i;

/**
 * Parses a quadrant bearing ("N 62°10'30\" E", "N62-10-30E", "S 0°00'00\" W") to an azimuth in
 * degrees [0, 360). Throws `invalid_bearing` when the form is wrong or the angle exceeds 90°.
 */
export function parseBearingToAzimuthDeg(text: string, field = "bearing"): number {
  const m = BEARING.exec(String(text).trim());
  const angleText = m?.[2];
  if (!m || angleText === undefined || angleText === "" || angleText.startsWith("-")) {
    throw new GeometryInputError("invalid_bearing", `${field} is not a quadrant bearing like N 62°10'30" E, got "${text}"`, {
      field,
    });
  }
  const angleDeg = parseAngleDeg(angleText, field);
  if (angleDeg > 90) {
    throw new GeometryInputError("invalid_bearing", `${field} angle must be 0° to 90°, got "${text}"`, { field });
  }
  const ns = m[1]!.toUpperCase();
  const ew = m[3]!.toUpperCase();
  const az = ns === "N" ? (ew === "E" ? angleDeg : 360 - angleDeg) : ew === "E" ? 180 - angleDeg : 180 + angleDeg;
  return az % 360;
}

/** Options for {@link formatAzimuthAsBearing}. */
export interface FormatBearingOptions {
  /** Decimal places on the seconds. Default 0. */
  secondsDecimals?: number;
}

/**
 * Formats an azimuth (degrees clockwise from north) as a quadrant bearing, e.g. 235.5 →
 * S 55°30'00" W. The azimuth is rounded to the displayed second before the quadrant is chosen,
 * so a value just short of due east prints as N 90°00'00" E rather than a 60" seconds field.
 */
export function formatAzimuthAsBearing(azimuthDeg: number, options: FormatBearingOptions = {}): string {
  if (!Number.isFinite(azimuthDeg)) {
    throw new GeometryInputError("invalid_angle", `cannot format azimuth ${azimuthDeg}`, { field: "azimuthDeg" });
  }
  const places = options.secondsDecimals ?? 0;
  const perDeg = 3600 * 10 ** places;
  const full = 360 * perDeg;
  const units = ((Math.round(azimuthDeg * perDeg) % full) + full) % full;
  const quarter = 90 * perDeg;
  let text: [string, number, string];
  if (units <= quarter) text = ["N", units, "E"];
  else if (units < 2 * quarter) text = ["S", 2 * quarter - units, "E"];
  else if (units < 3 * quarter) text = ["S", units - 2 * quarter, "W"];
  else text = ["N", full - units, "W"];
  return `${text[0]} ${formatDmsUnits(text[1], places)} ${text[2]}`;
}

/** Azimuth (degrees clockwise from north, [0, 360)) of the vector [dx, dy]. */
export function azimuthDegOfVector(dx: number, dy: number): number {
  if (dx === 0 && dy === 0) {
    throw new GeometryInputError("out_of_range", "a zero-length vector has no direction", { field: "vector" });
  }
  return radToDeg(normalizeRadPositive(Math.atan2(dx, dy)));
}

/** Azimuth in degrees → math direction in radians (counter-clockwise from east). */
export function mathRadFromAzimuthDeg(azimuthDeg: number): number {
  return normalizeRadPositive(Math.PI / 2 - degToRad(azimuthDeg));
}

/** Math direction in radians (counter-clockwise from east) → azimuth in degrees [0, 360). */
export function azimuthDegFromMathRad(mathRad: number): number {
  const deg = radToDeg(normalizeRadPositive(Math.PI / 2 - mathRad));
  return deg >= 360 ? 0 : deg;
}

/** Unit vector [east, north] pointing along an azimuth given in degrees. */
export function unitVectorFromAzimuthDeg(azimuthDeg: number): [number, number] {
  const a = degToRad(azimuthDeg);
  return [Math.sin(a), Math.cos(a)];
}

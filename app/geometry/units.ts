import { GeometryInputError } from "./errors";

/** Working length units of an alignment. */
export type LengthUnit = "m" | "ft" | "usft";

/**
 * Metres per unit. International foot = 0.3048 m exactly; US survey foot = 1200/3937 m
 * (NIST/NGS, 85 FR 62698, 2020, which also deprecates the survey foot from 2023).
 */
export const METRES_PER_UNIT: Readonly<Record<LengthUnit, number>> = {
  m: 1,
  ft: 0.3048,
  usft: 1200 / 3937,
};

/** Area units for reporting takes. */
export type AreaUnit = "m2" | "ha" | "ft2" | "usft2" | "acre" | "usacre";

/**
 * Square metres per area unit. 1 ha = 10 000 m²; acre = 43 560 ft² in the matching foot, so the
 * international acre is 4046.8564224 m² exactly and the US survey acre 43 560 usft²
 * (NIST Handbook 44 App. C; 85 FR 62698 tabulates the survey-foot units).
 */
export const SQUARE_METRES_PER_AREA_UNIT: Readonly<Record<AreaUnit, number>> = {
  m2: 1,
  ha: 10_000,
  ft2: 0.3048 * 0.3048,
  usft2: (1200 / 3937) * (1200 / 3937),
  acre: 43_560 * 0.3048 * 0.3048,
  usacre: 43_560 * (1200 / 3937) * (1200 / 3937),
};

/** Throws `invalid_unit` unless `unit` is "m", "ft" or "usft". */
export function parseLengthUnit(unit: unknown, field = "units"): LengthUnit {
  if (unit === "m" || unit === "ft" || unit === "usft") return unit;
  throw new GeometryInputError("invalid_unit", `${field} must be "m", "ft" or "usft", got ${JSON.stringify(unit)}`, {
    field,
  });
}

/** Length in `unit` → metres. */
export function convertLengthToMetres(value: number, unit: LengthUnit): number {
  return value * METRES_PER_UNIT[unit];
}

/** Metres → length in `unit`. */
export function convertLengthFromMetres(valueM: number, unit: LengthUnit): number {
  return valueM / METRES_PER_UNIT[unit];
}

/** Length from one unit to another, through metres. */
export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  return from === to ? value : (value * METRES_PER_UNIT[from]) / METRES_PER_UNIT[to];
}

/** Area from one unit to another, through square metres. */
export function convertArea(value: number, from: AreaUnit, to: AreaUnit): number {
  return from === to ? value : (value * SQUARE_METRES_PER_AREA_UNIT[from]) / SQUARE_METRES_PER_AREA_UNIT[to];
}

/** The square unit matching a length unit (m → m², ft → ft², usft → usft²). */
export function squareUnitOf(unit: LengthUnit): AreaUnit {
  return unit === "m" ? "m2" : unit === "ft" ? "ft2" : "usft2";
}

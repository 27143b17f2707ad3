/** Linear units the product works in. "usft" is the US survey foot. */
export type LengthUnit = "m" | "ft" | "usft";

/**
 * Metres per unit. International foot 0.3048 m exactly; US survey foot
 * 1200/3937 m exactly (NIST, as used by NAD83 State Plane ftUS zones).
 */
export const METRES_PER_UNIT: Record<LengthUnit, number> = {
  m: 1,
  ft: 0.3048,
  usft: 1200 / 3937,
};

/** Converts an area between units: value × (m per `from` / m per `to`)². */
export function convertArea(value: number, from: LengthUnit, to: LengthUnit): number {
  if (from === to) return value;
  const ratio = METRES_PER_UNIT[from] / METRES_PER_UNIT[to];
  return value * ratio * ratio;
}

/** Converts a length between units. */
export function convertLength(value: number, from: LengthUnit, to: LengthUnit): number {
  return from === to ? value : (value * METRES_PER_UNIT[from]) / METRES_PER_UNIT[to];
}

/**
 * Identifies the unit from a proj4 definition's metres-per-unit factor, or
 * null for anything else (e.g. a link or a chain). Tolerance 1e-9 relative
 * because WKT files round 1200/3937 to 0.304800609601219.
 */
export function unitFromMetresPerUnit(toMeter: number): LengthUnit | null {
  for (const [unit, m] of Object.entries(METRES_PER_UNIT) as [LengthUnit, number][]) {
    if (Math.abs(toMeter - m) <= m * 1e-9) return unit;
  }
  return null;
}

import { convertArea, squareUnitOf, type AreaUnit, type LengthUnit } from "~/geometry/units";

/** Distances are written to 0.001 of the unit (metric 0.001 m: from memory; finer than the 0.01 ft of recorded examples). */
export const DISTANCE_DECIMALS = 3;

const LENGTH_WORDS: Record<LengthUnit, string> = { m: "m", ft: "ft", usft: "US survey ft" };

/** The square unit and the large unit an area is stated in: m² and ha, ft² and acres, or the US survey equivalents. */
const AREA_PAIRS: Record<LengthUnit, { small: AreaUnit; large: AreaUnit; smallWord: string; largeWord: string }> = {
  m: { small: "m2", large: "ha", smallWord: "m²", largeWord: "ha" },
  ft: { small: "ft2", large: "acre", smallWord: "ft²", largeWord: "acres" },
  usft: { small: "usft2", large: "usacre", smallWord: "US survey ft²", largeWord: "US survey acres" },
};

/** Rounds to the written decimals (half away from zero, as `toFixed` does for these magnitudes). */
export function roundDistance(value: number): number {
  return Number(value.toFixed(DISTANCE_DECIMALS));
}

/** "12.345 m", "12.345 ft", "12.345 US survey ft" (3 decimals unless told). */
export function formatDistance(value: number, units: LengthUnit, decimals = DISTANCE_DECIMALS): string {
  return `${value.toFixed(decimals)} ${LENGTH_WORDS[units]}`;
}

/** Grid coordinates as written: "N 4419375.339, E 561964.576". */
export function formatCoordinates(p: [number, number]): string {
  return `N ${p[1].toFixed(DISTANCE_DECIMALS)}, E ${p[0].toFixed(DISTANCE_DECIMALS)}`;
}

/** An area (project units²) in both of its units: the square unit to 0.01, the large unit to 0.0001. */
export function describeArea(area: number, units: LengthUnit): { small: number; large: number; smallUnit: AreaUnit; largeUnit: AreaUnit; text: string } {
  const pair = AREA_PAIRS[units];
  const small = convertArea(area, squareUnitOf(units), pair.small);
  const large = convertArea(area, squareUnitOf(units), pair.large);
  return { small, large, smallUnit: pair.small, largeUnit: pair.large, text: `${small.toFixed(2)} ${pair.smallWord} (${large.toFixed(4)} ${pair.largeWord})` };
}

/** "1 in 2,345,678" for a ratio of perimeter to misclosure, or a plain statement when nothing is left over. */
export function formatPrecisionRatio(perimeter: number, misclosure: number): string {
  if (!(misclosure > 0)) return "no measurable misclosure";
  return `1 in ${Math.round(perimeter / misclosure).toLocaleString("en-US")}`;
}

/** The words for the two area units of a length unit: {small: "m²", large: "ha"} and so on. */
export function areaWords(units: LengthUnit): { small: string; large: string } {
  return { small: AREA_PAIRS[units].smallWord, large: AREA_PAIRS[units].largeWord };
}

/** The words for a length unit ("m", "ft", "US survey ft"). */
export function lengthWord(units: LengthUnit): string {
  return LENGTH_WORDS[units];
}

import type { TakeRules } from "~/geometry/take-types";
import { convertArea, convertLengthFromMetres, squareUnitOf, type LengthUnit } from "~/geometry/units";

/**
 * Starting values for a new project, per square metre and in a neutral currency. They are
 * placeholders a project team replaces with its own (common practice: agencies set remnant
 * thresholds and unit costs locally; none of these is a published figure).
 */
const DEFAULTS_METRIC: TakeRules = {
  remnantMinArea: 250,
  remnantMinFraction: 0.1,
  landValuePerArea: 60,
  buildingValue: 280_000,
  severancePercent: 15,
  easementRatePerArea: 6,
  adminCostPerParcel: 12_000,
  contingencyPercent: 20,
  proximityDistance: 3,
};

/** The default rules expressed in a project's length unit (areas and per-area rates converted). */
export function defaultTakeRules(units: LengthUnit): TakeRules {
  const squareUnitPerM2 = convertArea(1, "m2", squareUnitOf(units));
  return {
    ...DEFAULTS_METRIC,
    remnantMinArea: round(DEFAULTS_METRIC.remnantMinArea * squareUnitPerM2, 0),
    landValuePerArea: round(DEFAULTS_METRIC.landValuePerArea / squareUnitPerM2, 2),
    easementRatePerArea: round(DEFAULTS_METRIC.easementRatePerArea / squareUnitPerM2, 2),
    proximityDistance: round(convertLengthFromMetres(DEFAULTS_METRIC.proximityDistance, units), 1),
  };
}

/** Defaults, then the project's rules, then the alternative's own: later ones win key by key. */
export function resolveTakeRules(units: LengthUnit, ...layers: (Partial<TakeRules> | null | undefined)[]): TakeRules {
  const rules = { ...defaultTakeRules(units) };
  for (const layer of layers) for (const [k, v] of Object.entries(layer ?? {})) if (typeof v === "number") rules[k as keyof TakeRules] = v;
  return rules;
}

function round(v: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(v * f) / f;
}

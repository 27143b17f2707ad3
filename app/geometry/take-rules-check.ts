import { GeometryInputError } from "./errors";
import type { TakeRules } from "./take-types";

const KEYS: (keyof TakeRules)[] = [
  "remnantMinArea",
  "remnantMinFraction",
  "landValuePerArea",
  "buildingValue",
  "severancePercent",
  "easementRatePerArea",
  "adminCostPerParcel",
  "contingencyPercent",
  "proximityDistance",
];

/** Throws `out_of_range` unless every rule is a finite number ≥ 0 (and the fraction ≤ 1). */
export function requireTakeRules(rules: TakeRules): TakeRules {
  for (const k of KEYS) {
    const v = rules[k];
    if (typeof v !== "number" || !Number.isFinite(v) || v < 0 || (k === "remnantMinFraction" && v > 1)) {
      throw new GeometryInputError("out_of_range", `rules.${k} must be a number ${k === "remnantMinFraction" ? "from 0 to 1" : "of 0 or more"}, got ${String(v)}`, { field: `rules.${k}` });
    }
  }
  return rules;
}

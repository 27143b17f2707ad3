import { resolveTakeRules } from "~/calculations/take-rules";
import type { TakeRules } from "~/geometry/take-types";
import { areaUnitLabel, lengthUnitLabel, type Units } from "./format";

export type RuleKey = keyof TakeRules;
export type RuleOverrides = Partial<TakeRules>;
/** Where the value in effect comes from: this alternative's override, the project's rules, or the placeholder default. */
export type RuleSource = "alternative" | "project" | "default";

export interface RuleField {
  key: RuleKey;
  label: string;
  /** What the number is measured in, for the project's units. */
  unit: (units: Units) => string;
  min: number;
  max: number;
}

/** Every take and cost rule with its unit and the limits of TakeRulesSchema (app/schemas/take-schemas.ts). */
export const RULE_FIELDS: readonly RuleField[] = [
  { key: "remnantMinArea", label: "Uneconomic remnant: remainder under this area", unit: areaUnitLabel, min: 0, max: 1e12 },
  { key: "remnantMinFraction", label: "Uneconomic remnant: remainder under this fraction of the parcel", unit: () => "fraction, 0–1", min: 0, max: 1 },
  { key: "landValuePerArea", label: "Land value where a parcel has none", unit: (u) => `per ${areaUnitLabel(u)}`, min: 0, max: 1e12 },
  { key: "buildingValue", label: "Value of a displaced building where it has none", unit: () => "per building", min: 0, max: 1e12 },
  { key: "severancePercent", label: "Severance damages on partial takes", unit: () => "% of land", min: 0, max: 1000 },
  { key: "easementRatePerArea", label: "Construction easement rate", unit: (u) => `per ${areaUnitLabel(u)}`, min: 0, max: 1e12 },
  { key: "adminCostPerParcel", label: "Appraisal, title and closing", unit: () => "per parcel", min: 0, max: 1e12 },
  { key: "contingencyPercent", label: "Contingency", unit: () => "% of the other lines", min: 0, max: 1000 },
  { key: "proximityDistance", label: "Building this close to the new line is a proximity impact", unit: lengthUnitLabel, min: 0, max: 10_000 },
];

export interface RuleRow {
  key: RuleKey;
  /** The value the engine uses for this alternative. */
  value: number;
  source: RuleSource;
  /** What applies without this alternative's override (the project's value, or the default). */
  inherited: number;
  inheritedSource: Exclude<RuleSource, "alternative">;
}

/**
 * Each rule's value in effect and its source, by the same layering the server applies
 * (resolveTakeRules: defaults, then the project's rules, then the alternative's, key by key).
 */
export function describeRuleSources(units: Units, projectRules: RuleOverrides | null | undefined, alternativeRules: RuleOverrides | null | undefined): RuleRow[] {
  const inEffect = resolveTakeRules(units, projectRules, alternativeRules);
  const inherited = resolveTakeRules(units, projectRules);
  return RULE_FIELDS.map(({ key }) => {
    const inheritedSource = typeof projectRules?.[key] === "number" ? "project" : "default";
    return { key, value: inEffect[key], source: typeof alternativeRules?.[key] === "number" ? "alternative" : inheritedSource, inherited: inherited[key], inheritedSource };
  });
}

/** The alternative's overrides with `key` set to `value`, or without it (the inherited value applies again). */
export function setRuleOverride(rules: RuleOverrides | undefined, key: RuleKey, value: number | undefined): RuleOverrides {
  const { [key]: _, ...rest } = rules ?? {};
  return value === undefined ? rest : { ...rest, [key]: value };
}

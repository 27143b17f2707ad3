import { resolveTakeRules } from "~/calculations/take-rules";
import type { TakeRules } from "~/geometry/take-types";
import { describeRule } from "~/components/projects/take-rule-labels";
import type { Units } from "./format";

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

/** Largest value TakeRulesSchema (app/schemas/take-schemas.ts) accepts for each rule; all start at 0. */
const RULE_MAX: Record<RuleKey, number> = {
  remnantMinArea: 1e12,
  remnantMinFraction: 1,
  landValuePerArea: 1e12,
  buildingValue: 1e12,
  severancePercent: 1000,
  easementRatePerArea: 1e12,
  adminCostPerParcel: 1e12,
  contingencyPercent: 1000,
  proximityDistance: 10_000,
};

/** Every take and cost rule, worded and measured as the project page words them (`describeRule`), with its limits. */
export const RULE_FIELDS: readonly RuleField[] = (Object.keys(RULE_MAX) as RuleKey[]).map((key) => ({
  key,
  label: describeRule(key, "m").label,
  unit: (units: Units) => describeRule(key, units).unit,
  min: 0,
  max: RULE_MAX[key],
}));

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

import { expect, test } from "vitest";
import { describeRuleSources, RULE_FIELDS, setRuleOverride } from "./rule-sources";

const row = (rows: ReturnType<typeof describeRuleSources>, key: string) => rows.find((r) => r.key === key)!;

test("with no overrides every rule is the placeholder default, in the project's units", () => {
  const metric = describeRuleSources("m", null, {});
  expect(metric.map((r) => r.key)).toEqual(RULE_FIELDS.map((f) => f.key));
  expect(metric.every((r) => r.source === "default" && r.value === r.inherited)).toBe(true);
  expect(row(metric, "remnantMinArea").value).toBe(250);
  // 1 ft = 0.3048 m exactly (international foot, 1959): 250 m² = 250 / 0.09290304 = 2 690.97 ft² → 2 691;
  // 60 per m² = 60 × 0.09290304 = 5.574 per ft² → 5.57; 3 m = 9.84 ft → 9.8.
  const feet = describeRuleSources("ft", undefined, undefined);
  expect(row(feet, "remnantMinArea").value).toBe(2691);
  expect(row(feet, "landValuePerArea").value).toBe(5.57);
  expect(row(feet, "proximityDistance").value).toBe(9.8);
});

test("a project's rule shows as the project's; the alternative's override wins over it and the default", () => {
  const rows = describeRuleSources("m", { adminCostPerParcel: 15_000, contingencyPercent: 30 }, { adminCostPerParcel: 20_000, remnantMinArea: 3500 });
  expect(row(rows, "adminCostPerParcel")).toEqual({ key: "adminCostPerParcel", value: 20_000, source: "alternative", inherited: 15_000, inheritedSource: "project" });
  expect(row(rows, "remnantMinArea")).toEqual({ key: "remnantMinArea", value: 3500, source: "alternative", inherited: 250, inheritedSource: "default" });
  expect(row(rows, "contingencyPercent")).toEqual({ key: "contingencyPercent", value: 30, source: "project", inherited: 30, inheritedSource: "project" });
  expect(row(rows, "severancePercent").source).toBe("default");
});

test("an override of 0 is an override (not a missing value)", () => {
  expect(row(describeRuleSources("m", null, { severancePercent: 0 }), "severancePercent")).toMatchObject({ value: 0, source: "alternative", inherited: 15 });
});

test("setting and clearing an override leaves the other overrides alone", () => {
  const set = setRuleOverride({ remnantMinArea: 3500 }, "adminCostPerParcel", 20_000);
  expect(set).toEqual({ remnantMinArea: 3500, adminCostPerParcel: 20_000 });
  const cleared = setRuleOverride(set, "remnantMinArea", undefined);
  expect(cleared).toEqual({ adminCostPerParcel: 20_000 });
  expect("remnantMinArea" in cleared).toBe(false);
  expect(setRuleOverride(undefined, "contingencyPercent", 10)).toEqual({ contingencyPercent: 10 });
});

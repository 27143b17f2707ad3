import { expect, test } from "vitest";
import { defaultTakeRules, resolveTakeRules } from "./take-rules";

test("default per-area figures convert with the area unit: 1 ft² = 0.09290304 m² exactly (NIST SP 811, B.8)", () => {
  const m = defaultTakeRules("m");
  const ft = defaultTakeRules("ft");
  expect(ft.remnantMinArea).toBe(Math.round(m.remnantMinArea / 0.09290304));
  expect(ft.landValuePerArea).toBeCloseTo(m.landValuePerArea * 0.09290304, 2);
  expect(ft.proximityDistance).toBeCloseTo(m.proximityDistance / 0.3048, 1);
  expect(ft.severancePercent).toBe(m.severancePercent);
});

test("the alternative's rules override the project's, which override the defaults, key by key", () => {
  const rules = resolveTakeRules("m", { remnantMinArea: 400, severancePercent: 5 }, { severancePercent: 12 });
  expect(rules.remnantMinArea).toBe(400);
  expect(rules.severancePercent).toBe(12);
  expect(rules.contingencyPercent).toBe(defaultTakeRules("m").contingencyPercent);
});

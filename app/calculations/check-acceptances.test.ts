import { expect, test } from "vitest";
import { applyCheckAcceptances } from "./check-acceptances";
import type { DesignCheckResult } from "~/geometry/design-check-types";

const check = (id: string, severity: "ok" | "warning"): DesignCheckResult => ({ id, severity, message: "m", value: 1, limit: 2, source: "s" });

test("an accepted warning carries its reason; a passing check ignores an acceptance", () => {
  const { checks, stale } = applyCheckAcceptances([check("min-radius:pi-1", "warning"), check("min-radius:pi-2", "ok")], [
    { id: "min-radius:pi-1", reason: "Existing bridge fixes the curve; speed zone posted" },
    { id: "min-radius:pi-2", reason: "old" },
  ]);
  expect(checks[0]!.accepted?.reason).toMatch(/bridge/);
  expect(checks[1]!.accepted).toBeUndefined();
  expect(stale.map((s) => s.id)).toEqual(["min-radius:pi-2"]);
});

test("an acceptance for a check that no longer exists is reported stale", () => {
  const { stale } = applyCheckAcceptances([], [{ id: "compound-ratio:pi-4", reason: "ramp" }]);
  expect(stale).toHaveLength(1);
});

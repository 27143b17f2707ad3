import type { DesignCheckInput, DesignCheckResult } from "./design-check-types";
import { CHECK_LIMIT_REL } from "./tolerances";
import { roundForMessage } from "./validate";

/** Source of the compound-radius ratio rule. */
export const RATIO_SOURCE = "TxDOT Roadway Design Manual §4.7.1 (citing AASHTO): flatter/sharper radius ≤ 1.5, ≤ 2.0 at intersections and ramps";

/**
 * Ratio of the flatter to the sharper radius of a compound curve: ≤ 1.5 on open roads, ≤ 2.0 for
 * intersections and turning roadways (TxDOT Roadway Design Manual §4.7.1, citing AASHTO).
 */
export function checkRadiusRatio(piIndex: number, r1: number, r2: number, context: DesignCheckInput["context"] = "open-road"): DesignCheckResult {
  const value = Math.max(r1, r2) / Math.min(r1, r2);
  const limit = context === "intersection" ? 2 : 1.5;
  const ok = value <= limit * (1 + CHECK_LIMIT_REL);
  return {
    id: `compound-ratio:pi-${piIndex}`,
    piIndex,
    severity: ok ? "ok" : "warning",
    message: `ratio of flatter to sharper radius is ${roundForMessage(value)}; the ${context} limit is ${limit}`,
    value,
    limit,
    source: RATIO_SOURCE,
  };
}

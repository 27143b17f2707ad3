export type { DesignCheckInput, DesignCheckResult } from "./design-check-types";
import type { CurveSummary } from "./alignment-types";
import type { DesignCheckInput, DesignCheckResult } from "./design-check-types";
import { checkRadiusRatio } from "./radius-ratio-check";
import { checkCurvePair } from "./curve-pair-checks";
import { computeMinimumRadius } from "./min-radius";
import { CHECK_LIMIT_REL } from "./tolerances";
import { convertLength, type LengthUnit } from "./units";
import { roundForMessage } from "./validate";

/** Runs every applicable check on the curves of an alignment (curves in stationing order). */
export function runDesignChecks(curves: CurveSummary[], units: LengthUnit, input: DesignCheckInput = {}): DesignCheckResult[] {
  const results: DesignCheckResult[] = [];
  for (const c of curves) {
    if (input.designSpeed !== undefined) results.push(checkMinimumRadius(c, units, input));
    if (c.type === "compound") results.push(checkRadiusRatio(c.piIndex, c.radius1!, c.radius2!, input.context));
  }
  for (let k = 0; k + 1 < curves.length; k++) {
    const a = curves[k]!;
    const b = curves[k + 1]!;
    if (b.piIndex === a.piIndex + 1) results.push(...checkCurvePair(a, b, units, input));
  }
  return results;
}

function checkMinimumRadius(c: CurveSummary, units: LengthUnit, input: DesignCheckInput): DesignCheckResult {
  const speedUnit = input.speedUnit ?? (units === "m" ? "km/h" : "mph");
  const min = computeMinimumRadius({ designSpeed: input.designSpeed!, speedUnit, emaxPercent: input.emaxPercent ?? 8 });
  const limit = convertLength(min.rounded, min.unit, units);
  const value = c.type === "simple" ? c.radius! : Math.min(c.radius1!, c.radius2!);
  const ok = value >= limit * (1 - CHECK_LIMIT_REL);
  const speed = `${input.designSpeed} ${speedUnit}`;
  return {
    id: `min-radius:pi-${c.piIndex}`,
    piIndex: c.piIndex,
    severity: ok ? "ok" : "warning",
    message: ok
      ? `radius ${roundForMessage(value)} meets the minimum ${roundForMessage(limit)} for ${speed} at emax ${input.emaxPercent ?? 8}%`
      : `radius ${roundForMessage(value)} is below the minimum ${roundForMessage(limit)} for ${speed} at emax ${input.emaxPercent ?? 8}%`,
    value,
    limit,
    source: min.source,
  };
}

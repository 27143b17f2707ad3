import type { CurveSummary } from "./alignment-types";
import type { DesignCheckInput, DesignCheckResult } from "./design-check-types";
import { checkRadiusRatio } from "./radius-ratio-check";
import { CHECK_LIMIT_REL } from "./tolerances";
import { convertLength, type LengthUnit } from "./units";
import { roundForMessage } from "./validate";

const MPH_PER_KMH = 1 / 1.609344;

/** Source strings of the curve-pair checks. */
export const BROKEN_BACK_SOURCE = "TxDOT Roadway Design Manual §4.7.1: avoid broken-back curves; tangent at least 15 × design speed (ft per mph, from memory)";
export const REVERSE_SOURCE = "FM 5-233 ch. 3 (reverse curves only when absolutely necessary); TxDOT RDM §4.7.1 (tangent for superelevation transition); agency design manual §7.5.3.1: desirably ≥ 0.6V";

/**
 * Checks two curves at consecutive PIs. Opposite turns: the tangent between reverse curves
 * (a PRC with no tangent always warns). Same turn with a tangent: broken-back if the tangent is
 * shorter than the minimum. Same turn with no tangent: a compound join, so the radius ratio.
 */
export function checkCurvePair(a: CurveSummary, b: CurveSummary, units: LengthUnit, input: DesignCheckInput): DesignCheckResult[] {
  const tangent = Math.max(0, b.pcStation - a.ptStation);
  const joined = tangent <= CHECK_LIMIT_REL * (a.length + b.length);
  if (a.direction === b.direction) {
    if (joined) return [checkRadiusRatio(b.piIndex, lastRadius(a), firstRadius(b), input.context)];
    const limit = input.brokenBackMinTangent ?? speedLimit(input, units, "broken-back");
    if (limit === undefined) return [];
    return [tangentResult(`broken-back:pi-${b.piIndex}`, b.piIndex, tangent, limit, BROKEN_BACK_SOURCE, "broken-back curves")];
  }
  const limit = input.reverseMinTangent ?? speedLimit(input, units, "reverse");
  if (joined) {
    return [{ id: `reverse-tangent:pi-${b.piIndex}`, piIndex: b.piIndex, severity: "warning", message: "reverse curves meet at a PRC with no tangent between them", value: 0, limit: limit ?? 0, source: REVERSE_SOURCE }];
  }
  if (limit === undefined) return [];
  return [tangentResult(`reverse-tangent:pi-${b.piIndex}`, b.piIndex, tangent, limit, REVERSE_SOURCE, "reverse curves")];
}

function tangentResult(id: string, piIndex: number, value: number, limit: number, source: string, what: string): DesignCheckResult {
  const ok = value >= limit * (1 - CHECK_LIMIT_REL);
  return {
    id,
    piIndex,
    severity: ok ? "ok" : "warning",
    message: `tangent of ${roundForMessage(value)} between ${what} is ${ok ? "at least" : "shorter than"} ${roundForMessage(limit)}`,
    value,
    limit,
    source,
  };
}

/** Speed-based minimum tangent in alignment units: 15·V ft (V mph) or 0.6·V m (V km/h). */
function speedLimit(input: DesignCheckInput, units: LengthUnit, kind: "broken-back" | "reverse"): number | undefined {
  if (input.designSpeed === undefined) return undefined;
  const unit = input.speedUnit ?? (units === "m" ? "km/h" : "mph");
  const mph = unit === "mph" ? input.designSpeed : input.designSpeed * MPH_PER_KMH;
  const kmh = unit === "km/h" ? input.designSpeed : input.designSpeed / MPH_PER_KMH;
  return kind === "broken-back" ? convertLength(15 * mph, "ft", units) : convertLength(0.6 * kmh, "m", units);
}

function lastRadius(c: CurveSummary): number {
  return c.radius ?? c.radius2!;
}

function firstRadius(c: CurveSummary): number {
  return c.radius ?? c.radius1!;
}

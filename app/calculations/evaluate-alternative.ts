import type { AlignmentElement, AlignmentInput } from "~/geometry/alignment-types";
import { computeAlignmentGeometry, type AlignmentGeometry } from "~/geometry/compute-alignment-geometry";
import type { DesignCheckInput, DesignCheckResult } from "~/geometry/design-check-types";
import { selfOverlapMessage } from "~/geometry/take-assemble";
import type { CorridorInput, TakeResult, TakeRules } from "~/geometry/take-types";
import { summarizeAlternative, type AlternativeSummary } from "./alternative-summary";
import { applyCheckAcceptances, type CheckAcceptance, type ReviewedCheck } from "./check-acceptances";

/** What the overlay needs from a take session (the engine's incremental one, or a one-shot). */
export interface TakeComputer {
  compute(elements: AlignmentElement[], corridor: CorridorInput, rules: TakeRules): TakeResult;
}

export interface EvaluationInputs {
  alignment: AlignmentInput;
  corridor: CorridorInput;
  rules: TakeRules;
  design: DesignCheckInput;
  acceptedChecks: CheckAcceptance[];
}

export interface Evaluation {
  geometry: AlignmentGeometry;
  checks: ReviewedCheck[];
  staleAcceptances: CheckAcceptance[];
  takes: TakeResult;
  summary: AlternativeSummary;
}

/** Alignment → checks → corridor → takes → summary, for one set of inputs. Throws GeometryInputError. */
export function evaluateAlternative(inputs: EvaluationInputs, takes: TakeComputer): Evaluation {
  const geometry = computeAlignmentGeometry(inputs.alignment, { design: inputs.design });
  const result = takes.compute(geometry.elements, inputs.corridor, inputs.rules);
  const reviewed = applyCheckAcceptances([...geometry.checks, ...selfOverlapChecks(result)], inputs.acceptedChecks);
  return { geometry, checks: reviewed.checks, staleAcceptances: reviewed.stale, takes: result, summary: summarizeAlternative(geometry, reviewed.checks, result) };
}

/**
 * A corridor that covers the same ground twice is a warning beside the design checks: that ground
 * is taken once, but a right-of-way that comes back on itself is seldom meant, so the planner must
 * see it where they review the design.
 */
export function selfOverlapChecks(result: TakeResult): DesignCheckResult[] {
  return (result.corridorSelfOverlaps ?? []).map((o, k) => ({
    id: `corridor-self-overlap-${k + 1}`,
    severity: "warning",
    message: selfOverlapMessage(o),
    value: o.area,
    limit: 0,
    source: "Common practice: a right-of-way is one strip of land, so no ground may lie in it twice",
  }));
}

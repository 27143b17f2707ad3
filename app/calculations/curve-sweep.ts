import type { AlignmentCurveInput, AlignmentInput } from "~/geometry/alignment-types";
import { GeometryInputError } from "~/geometry/errors";
import { computeMinimumRadius } from "~/geometry/min-radius";
import { convertLength } from "~/geometry/units";
import { evaluateAlternative, type EvaluationInputs, type TakeComputer } from "./evaluate-alternative";

export type SweepVariable = "radius" | "radius1" | "radius2" | "delta1";

export interface SweepRequest {
  pointIndex: number;
  vary: SweepVariable;
  from: number;
  to: number;
  steps: number;
}

export interface SweepStep {
  value: number;
  takeArea: number | null;
  estimatedCost: number | null;
  parcelsAffected: number | null;
  displacements: number | null;
  checks: { status: "pass" | "accepted" | "warnings"; warnings: string[] } | null;
  /** Why this value gives no alignment (e.g. the tangents overrun the next PI). */
  error?: string;
}

/**
 * Land take against curve choice at one PI: evaluates `steps` evenly spaced values of one curve
 * parameter, each through the same take session (so only parcels near the curve are redone).
 */
export function sweepCurve(inputs: EvaluationInputs, request: SweepRequest, takes: TakeComputer): { steps: SweepStep[]; minimumRadius: number | null } {
  const base = curveAt(inputs.alignment, request);
  const steps: SweepStep[] = [];
  for (let i = 0; i < request.steps; i++) {
    const value = request.from + ((request.to - request.from) * i) / (request.steps - 1);
    const alignment = withCurve(inputs.alignment, request.pointIndex, varied(base, request.vary, value));
    try {
      const { summary, checks } = evaluateAlternative({ ...inputs, alignment }, takes);
      const warnings = checks.filter((c) => c.severity === "warning" && !c.accepted).map((c) => c.message);
      steps.push({
        value,
        takeArea: summary.takeArea,
        estimatedCost: summary.estimatedCost,
        parcelsAffected: summary.parcelsAffected,
        displacements: summary.displacements,
        checks: { status: summary.checkStatus, warnings },
      });
    } catch (error) {
      if (!(error instanceof GeometryInputError)) throw error;
      steps.push({ value, takeArea: null, estimatedCost: null, parcelsAffected: null, displacements: null, checks: null, error: error.message });
    }
  }
  return { steps, minimumRadius: minimumRadiusOf(inputs) };
}

function curveAt(alignment: AlignmentInput, request: SweepRequest): AlignmentCurveInput {
  const point = alignment.points[request.pointIndex];
  if (!point || request.pointIndex >= alignment.points.length - 1) {
    throw new GeometryInputError("out_of_range", `pointIndex ${request.pointIndex} is not a PI of this alignment (PIs are 1 to ${alignment.points.length - 2})`, { field: "pointIndex" });
  }
  const curve = point.curve;
  if (request.vary === "radius") return curve?.type === "simple" ? curve : { type: "simple", radius: request.from };
  if (curve?.type !== "compound") {
    throw new GeometryInputError("out_of_range", `PI ${request.pointIndex} has no compound curve, so ${request.vary} cannot be varied; sweep "radius" or make it compound first`, { field: "vary" });
  }
  return curve;
}

function varied(curve: AlignmentCurveInput, vary: SweepVariable, value: number): AlignmentCurveInput {
  if (vary === "radius") return { type: "simple", radius: value };
  if (curve.type !== "compound") return curve;
  if (vary === "radius1") return { ...curve, radius1: value };
  if (vary === "radius2") return { ...curve, radius2: value };
  const { radius1, radius2 } = curve;
  return { type: "compound", radius1, radius2, delta1: value };
}

function withCurve(alignment: AlignmentInput, index: number, curve: AlignmentCurveInput): AlignmentInput {
  return { ...alignment, points: alignment.points.map((p, i) => (i === index ? { ...p, curve } : p)) };
}

function minimumRadiusOf(inputs: EvaluationInputs): number | null {
  const { designSpeed, speedUnit, emaxPercent } = inputs.design;
  if (designSpeed === undefined || speedUnit === undefined) return null;
  try {
    const min = computeMinimumRadius({ designSpeed, speedUnit, emaxPercent: emaxPercent ?? 8 });
    return convertLength(min.rounded, min.unit, inputs.alignment.units);
  } catch {
    return null;
  }
}

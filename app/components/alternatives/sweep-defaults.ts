import type { AlignmentCurveInput } from "~/geometry/alignment-types";
import type { SweepVariable } from "./api-types";

/** The variables a PI's curve can be swept over: the radius of a simple curve (or of a new one at an angle point); R1, R2 and Δ1 of a compound one. */
export function sweepVariablesFor(curve: AlignmentCurveInput | undefined): SweepVariable[] {
  return curve?.type === "compound" ? ["radius1", "radius2", "delta1"] : ["radius"];
}

export const VARIABLE_LABELS: Record<SweepVariable, string> = { radius: "Radius R", radius1: "Radius R1", radius2: "Radius R2", delta1: "Δ1 (split of the deflection)" };

/**
 * A starting range around the current value: half to twice a radius (and at least to the
 * minimum radius when known), 10–90 % of the deflection for Δ1; 20 steps.
 */
export function defaultSweepRange(vary: SweepVariable, curve: AlignmentCurveInput | undefined, deflectionDeg: number, minimumRadius: number | null): { from: number; to: number; steps: number } {
  if (vary === "delta1") {
    const d = Math.abs(deflectionDeg);
    return { from: round(d * 0.1, 2), to: round(d * 0.9, 2), steps: 20 };
  }
  const current = curve?.type === "simple" ? curve.radius : curve?.type === "compound" ? (vary === "radius2" ? curve.radius2 : curve.radius1) : (minimumRadius ?? 300) * 1.5;
  const from = Math.min(current * 0.5, minimumRadius !== null ? minimumRadius * 0.8 : Infinity);
  return { from: round(from, 0), to: round(Math.max(current * 2, from * 2), 0), steps: 20 };
}

/** The curve with one swept value applied (what clicking a chart point does). */
export function applySweepValue(curve: AlignmentCurveInput | undefined, vary: SweepVariable, value: number): AlignmentCurveInput {
  if (vary === "radius" || curve?.type !== "compound") return { type: "simple", radius: value };
  const { radius1, radius2 } = curve;
  const delta1 = "delta1" in curve ? curve.delta1 : undefined;
  if (vary === "radius1") return delta1 === undefined ? { ...curve, radius1: value } : { type: "compound", radius1: value, radius2, delta1 };
  if (vary === "radius2") return delta1 === undefined ? { ...curve, radius2: value } : { type: "compound", radius1, radius2: value, delta1 };
  return { type: "compound", radius1, radius2, delta1: value };
}

function round(v: number, digits: number): number {
  const f = 10 ** digits;
  return Math.round(v * f) / f;
}

import { sampleAngles } from "./compound-angle-grid";
import type { Known } from "./compound-knowns";
import type { CompoundParams } from "./compound-reduction";
import { buildArcSweep } from "./compound-sweep-arcs";
import { sweepArcLengths } from "./compound-sweep-lengths";
import { buildParallelSweep } from "./compound-sweep-parallel";
import { buildPaths, findPathZeros, type PathNode, type PathPoint } from "./compound-sweep-path";
import { findSampledZeros, type ScalarFn } from "./compound-zero-scan";

/**
 * A two-dimensional case written as a search over one angle x (the outer angle): at each x the
 * closed forms leave one equation a·cos y + b·sin y + c = 0 in the other angle y (so y has up to
 * two closed-form values, one per branch) and one remaining known, whose signed residual at
 * (x, y) is what the search drives to zero.
 */
export interface SweepModel {
  /** Sets the outer angle x (radians, in (0, π)). */
  setOuter(x: number): void;
  /** Coefficients of a·cos y + b·sin y + c = 0 at the current outer angle. */
  readonly a: number;
  readonly b: number;
  readonly c: number;
  /** Signed residual of the remaining known at inner angle y (current x), continuous wherever the curve is valid. */
  residual(y: number): number;
  /** The curve [R1, R2, Δ1, Δ2] at inner angle y (current x), or undefined if not a valid curve. */
  params(y: number): CompoundParams | undefined;
}

// 128 samples of the outer angle (1.4°), bisected where the inner angle swings: a sign change or
// a same-signed dip between neighbours is refined exactly, so the samples only have to follow
// the residual's shape (64 gave the same roots as 256 on 12 000 draws with Δi from 1° to 177°).
const SAMPLES = 128;
const END_HALVINGS = 20;
// A dip this close to zero (the residuals are relative) is a double root: report it.
const TOUCH = 1e-12;
// Inner-angle step between neighbouring samples above which they are bisected (2.8°), and how
// deep: 2⁻²⁰ of a sample spacing resolves a swing 10⁻⁶ rad wide.
const MAX_INNER_STEP = Math.PI / 64;
const MAX_REFINE_DEPTH = 20;
// More roots than this means a continuum (R1 = R2 leaves the split open); the caller refuses it.
const MAX_ROOTS = 12;

/**
 * Every root of a two-dimensional case: a one-variable search where one angle can be eliminated
 * in closed form (compound-sweep-arcs.ts, compound-sweep-parallel.ts), else, with both arcs known
 * only by length, a search along the zero contour of one condition (compound-sweep-lengths.ts).
 * Undefined for a set neither covers (the caller falls back to its grid search). The returned
 * roots are not yet verified against the knowns; the caller does that.
 */
export function sweepTwoFreeAngles(knowns: Known[]): CompoundParams[] | undefined {
  const model = buildArcSweep(knowns) ?? buildParallelSweep(knowns);
  return model ? findSweepRoots(model) : sweepArcLengths(knowns);
}

/** Samples the outer angle, finds where the inner equation has solutions, then every root along them. */
export function findSweepRoots(model: SweepModel): CompoundParams[] {
  const xs = OUTER_SAMPLES;
  // One model evaluation per sample serves the margin and both branches.
  const samples = xs.map((x) => sampleAt(model, x));
  const margins = samples.map((p) => p.margin);
  const margin: ScalarFn = (x) => (model.setOuter(x), currentMargin(model));
  const folds = findSampledZeros(margin, xs, margins).sort((p, q) => p - q);
  const h = (p: PathPoint) => (model.setOuter(p.x), model.residual(currentInnerAngle(model, p.sign)));
  const roots: CompoundParams[] = [];
  for (const [lo, hi] of solvableIntervals(margin, xs, margins, folds)) {
    const inside = refineSteepSteps(
      model,
      samples.filter((p) => p.x > lo && p.x < hi),
    );
    for (const { edges, closed } of buildPaths(lo, hi, folds.includes(lo), folds.includes(hi), inside, h)) {
      for (const p of findPathZeros(edges, closed, h, TOUCH)) {
        model.setOuter(p.x);
        const params = model.params(currentInnerAngle(model, p.sign));
        if (params) roots.push(params);
        if (roots.length > MAX_ROOTS) return roots;
      }
    }
  }
  return roots;
}

interface SweepSample extends PathNode {
  margin: number;
  /** Inner angle on the + and − branches. */
  angles: [number, number];
}

function sampleAt(model: SweepModel, x: number): SweepSample {
  model.setOuter(x);
  const angles: [number, number] = [currentInnerAngle(model, 1), currentInnerAngle(model, -1)];
  return { x, margin: currentMargin(model), angles, values: [model.residual(angles[0]), model.residual(angles[1])] };
}

/**
 * Where the inner angle swings between neighbouring samples (the solved equation nearly
 * degenerate: a, b, c all small), bisects until it moves at most MAX_INNER_STEP on each branch,
 * so the search follows the curve in both angles and a narrow pair of roots there is not
 * stepped over.
 */
function refineSteepSteps(model: SweepModel, samples: SweepSample[]): SweepSample[] {
  const out: SweepSample[] = [];
  const between = (p: SweepSample, q: SweepSample, depth: number) => {
    const steep = [0, 1].some((b) => Math.abs(wrapAngle(q.angles[b]! - p.angles[b]!)) > MAX_INNER_STEP);
    if (!steep || depth >= MAX_REFINE_DEPTH) return;
    const mid = sampleAt(model, (p.x + q.x) / 2);
    between(p, mid, depth + 1);
    out.push(mid);
    between(mid, q, depth + 1);
  };
  samples.forEach((p, k) => {
    if (k > 0) between(samples[k - 1]!, p, 0);
    out.push(p);
  });
  return out;
}

function wrapAngle(a: number): number {
  return a > Math.PI ? a - 2 * Math.PI : a <= -Math.PI ? a + 2 * Math.PI : a;
}

/** (a² + b² − c²)/(a² + b² + c²): ≥ 0 where a cos y + b sin y + c = 0 has a solution. */
function currentMargin(model: SweepModel): number {
  const [a2, b2, c2] = [model.a * model.a, model.b * model.b, model.c * model.c];
  return (a2 + b2 - c2) / (a2 + b2 + c2);
}

const OUTER_SAMPLES = sampleAngles(SAMPLES, END_HALVINGS);

/** The intervals of x where the inner equation is solvable (margin ≥ 0), bounded by folds or the ends. */
function solvableIntervals(margin: ScalarFn, xs: number[], margins: number[], folds: number[]): [number, number][] {
  const cuts = [xs[0]!, ...folds, xs[xs.length - 1]!];
  const out: [number, number][] = [];
  for (let i = 0; i + 1 < cuts.length; i++) {
    const [lo, hi] = [cuts[i]!, cuts[i + 1]!];
    if (!(hi > lo)) continue;
    // The sign inside: a sample strictly inside if there is one, else the midpoint (an island).
    const k = xs.findIndex((x) => x > lo && x < hi);
    if ((k >= 0 && xs[k]! < hi ? margins[k]! : margin((lo + hi) / 2)) >= 0) out.push([lo, hi]);
  }
  return out;
}

/** The inner angle on branch `sign` at the model's current outer angle, in (−π, π]. */
function currentInnerAngle(model: SweepModel, sign: 1 | -1): number {
  const rho = Math.hypot(model.a, model.b);
  const theta = Math.atan2(model.b, model.a);
  // a cos y + b sin y = ρ cos(y − θ) = −c; clamped because a fold endpoint can miss by round-off.
  const y = theta + sign * Math.acos(Math.min(1, Math.max(-1, -model.c / rho)));
  return wrapAngle(y);
}

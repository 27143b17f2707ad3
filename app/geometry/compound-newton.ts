import type { Known } from "./compound-knowns";
import { computeLeanResiduals, unitCoefficientsAt } from "./compound-lean";
import { buildReduction, type CompoundParams, type Reduction } from "./compound-reduction";
import type { CompoundState } from "./compound-state";
import { runLevenbergMarquardt, sumSquares } from "./levenberg-marquardt";
import { SOLVER_RESIDUAL_TOL } from "./tolerances";
import { predictTwinStart } from "./compound-twin";
import { sweepTwoFreeAngles } from "./compound-sweep";

export type { CompoundParams } from "./compound-reduction";

const MAX_ITERATIONS = 40;
// Loose on purpose: the full Newton polish and the forward verification are the real gates.
const ACCEPT_RESIDUAL = 1e-7;
// 36 per axis in 2-D (only a fallback now: every independent two-angle set goes to
// compound-sweep.ts first); this grid lost about one twin root in 2500 draws.
const GRID_POINTS = [0, 160, 36, 10] as const;
const MAX_STARTS = 10;
const LM_OPTIONS = { maxIterations: MAX_ITERATIONS, residualTol: SOLVER_RESIDUAL_TOL, acceptResidual: ACCEPT_RESIDUAL };

/**
 * Numerical solve for what the closed forms left open. Two free angles: the exact one-variable
 * or contour search of compound-sweep.ts, which finds every root deterministically. Otherwise
 * (one free angle, or a two-angle set the sweep does not cover): scan the free coordinates on a
 * grid, keep the grid's local minima of the squared residual as starts, and polish each by
 * damped Gauss–Newton (Levenberg–Marquardt) with a forward-difference Jacobian; in 2-D also from
 * each root's predicted twin (compound-twin.ts). Returns converged roots (not yet verified
 * against the knowns; the caller does that).
 */
export function solveCompoundNumerically(knowns: Known[], seed: CompoundState): CompoundParams[] {
  const red = buildReduction(seed, knowns);
  const dims = red.bounds.length;
  if (dims === 0) return red.solveFixedAngles();
  if (dims === 2) {
    // Every independent two-angle set has a sweep; the grid below stays as a safety net.
    const swept = sweepTwoFreeAngles(knowns);
    if (swept) return swept;
  }
  const roots: CompoundParams[] = [];
  const found: number[][] = [];
  const cell = red.bounds.map(([lo, hi]) => (hi - lo) / GRID_POINTS[Math.min(dims, 3)]!);
  const solveFrom = (start: number[], force = false) => {
    // A start within a tenth of a grid cell of a root already found would only find it again.
    if (!force && found.some((f) => f.every((v, d) => Math.abs(v - start[d]!) < 0.1 * cell[d]!))) return;
    const u = runLevenbergMarquardt((x) => residuals(knowns, red, x), start, LM_OPTIONS);
    const p = u && red.toParams(u);
    if (u && p) {
      roots.push(p);
      found.push(u);
    }
  };
  scanStarts(knowns, red).forEach((s) => solveFrom(s));
  if (dims === 2) {
    // Twins near a fold share one basin of the scan; start where the local model puts the other.
    for (const u of [...found]) {
      const twin = predictTwinStart((x) => residuals(knowns, red, x), u, cell);
      if (twin) solveFrom(twin, true);
    }
  }
  if (dims === 1) {
    // Two roots closer than a grid cell (near a double root) share one basin in the scan:
    // restart just either side of each root found to pick up its twin. (In 2-D four restarts
    // per root cost too much; the twin prediction above takes one.)
    for (const u of [...found]) for (const k of [-1.5, -0.4, 0.4, 1.5]) solveFrom([u[0]! + k * cell[0]!], true);
  }
  return roots;
}

function residuals(knowns: Known[], red: Reduction, u: number[]): number[] | undefined {
  const p = red.toParams(u);
  if (!p) return undefined;
  const r = computeLeanResiduals(knowns, p[0], p[1], unitCoefficientsAt(p[2], p[3]));
  return r.every(Number.isFinite) ? r : undefined;
}

function scanStarts(knowns: Known[], red: Reduction): number[][] {
  const dims = red.bounds.length;
  const n = GRID_POINTS[Math.min(dims, 3)]!;
  const costs = new Map<number, number>();
  const vectors = new Map<number, number[]>();
  const coord = (idx: number[]) => idx.map((k, d) => red.bounds[d]![0] + ((k + 0.5) / n) ** red.gridPower * (red.bounds[d]![1] - red.bounds[d]![0]));
  const total = n ** dims;
  for (let flat = 0; flat < total; flat++) {
    const r = residuals(knowns, red, coord(unflatten(flat, n, dims)));
    if (!r) continue;
    costs.set(flat, sumSquares(r));
    if (dims === 1) vectors.set(flat, r);
  }
  const minima: [number, number][] = [];
  for (const [flat, cost] of costs) {
    const idx = unflatten(flat, n, dims);
    if (neighbours(idx, n).every((f) => (costs.get(f) ?? Infinity) >= cost)) minima.push([flat, cost]);
  }
  const starts = minima.sort((a, b) => a[1] - b[1]).slice(0, MAX_STARTS).map(([flat]) => coord(unflatten(flat, n, dims)));
  return dims === 1 ? [...starts, ...signChangeStarts(vectors, coord)] : starts;
}

/** 1-D only: where a residual changes sign between grid points, a root is bracketed; start there too. */
function signChangeStarts(vectors: Map<number, number[]>, coord: (idx: number[]) => number[]): number[][] {
  const out: number[][] = [];
  for (const [flat, r] of vectors) {
    const next = vectors.get(flat + 1);
    if (!next) continue;
    if (r.some((v, j) => v * next[j]! < 0 && Math.abs(v - next[j]!) < 1)) out.push(coord([flat + 0.5]));
  }
  return out.slice(0, MAX_STARTS);
}

function unflatten(flat: number, n: number, dims: number): number[] {
  const idx: number[] = [];
  for (let d = 0; d < dims; d++) {
    idx.push(flat % n);
    flat = Math.floor(flat / n);
  }
  return idx;
}

function neighbours(idx: number[], n: number): number[] {
  const out: number[] = [];
  const offsets = 3 ** idx.length;
  for (let o = 0; o < offsets; o++) {
    let flat = 0;
    let mul = 1;
    let self = true;
    let inside = true;
    for (let d = 0, rest = o; d < idx.length; d++, rest = Math.floor(rest / 3)) {
      const k = idx[d]! + (rest % 3) - 1;
      if (rest % 3 !== 1) self = false;
      if (k < 0 || k >= n) inside = false;
      flat += k * mul;
      mul *= n;
    }
    if (!self && inside) out.push(flat);
  }
  return out;
}

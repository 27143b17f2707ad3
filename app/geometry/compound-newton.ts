import { evaluateCompoundCore } from "./compound-core";
import { readKnown, residualOf, type Known } from "./compound-knowns";
import type { CompoundState } from "./compound-state";
import { SOLVER_RESIDUAL_TOL } from "./tolerances";

/** Parameters [R1, R2, Δ1 rad, Δ2 rad]. */
export type CompoundParams = [number, number, number, number];

const MAX_ITERATIONS = 60;
const FD_STEP = 1e-7;
const ACCEPT_RESIDUAL = 1e-10;

/**
 * Damped Gauss–Newton (Levenberg–Marquardt) over x = (ln R1, ln R2, Δ1, Δ2) from a grid of starts
 * seeded with whatever the closed forms already fixed. Log radii keep radii positive; steps
 * leaving 0 < Δ1, Δ2 and Δ1 + Δ2 < π are rejected. Returns each converged root once (unverified).
 */
export function solveCompoundNumerically(knowns: Known[], seed: CompoundState): CompoundParams[] {
  const roots: CompoundParams[] = [];
  for (const start of buildStarts(knowns, seed)) {
    const x = runLevenbergMarquardt(knowns, start);
    if (x) roots.push([Math.exp(x[0]), Math.exp(x[1]), x[2], x[3]]);
  }
  return roots;
}

const TOTAL_GRID = Array.from({ length: 14 }, (_, i) => ((i + 0.5) / 14) * Math.PI);
const SPLIT_GRID = Array.from({ length: 11 }, (_, i) => 0.04 + (0.92 * i) / 10);
const RATIO_GRID = Array.from({ length: 9 }, (_, i) => 10 ** (-1 + i / 4));
const MAX_STARTS = 8;

/**
 * Coarse scan of (Δ, split of Δ, R2/R1) with the scale matched to one known length, keeping the
 * grid's local minima of the residual as starts; fixed parameters from the seed are not scanned.
 */
function buildStarts(knowns: Known[], seed: CompoundState): [number, number, number, number][] {
  const totals = seed.d !== undefined ? [seed.d] : seed.d1 !== undefined && seed.d2 !== undefined ? [seed.d1 + seed.d2] : TOTAL_GRID;
  const splitFixed = seed.d1 !== undefined || seed.d2 !== undefined;
  const ratios = seed.r1 !== undefined && seed.r2 !== undefined ? [seed.r2 / seed.r1] : RATIO_GRID;
  const splits = splitFixed ? [0] : SPLIT_GRID;
  const cells: { x: [number, number, number, number]; cost: number; key: [number, number, number] }[] = [];
  totals.forEach((d, i) =>
    splits.forEach((f, j) =>
      ratios.forEach((rho, k) => {
        const d1 = splitFixed ? (seed.d1 ?? d - seed.d2!) : f * d;
        const x = scaleStart(knowns, seed, rho, d1, d - d1);
        const r = residuals(knowns, x);
        if (r) cells.push({ x, cost: sumSquares(r), key: [i, j, k] });
      }),
    ),
  );
  const costAt = new Map(cells.map((c) => [c.key.join(","), c.cost]));
  const isLocalMin = (c: (typeof cells)[number]) =>
    [-1, 0, 1].every((a) => [-1, 0, 1].every((b) => [-1, 0, 1].every((e) => {
      const n = costAt.get([c.key[0] + a, c.key[1] + b, c.key[2] + e].join(","));
      return n === undefined || n >= c.cost;
    })));
  return cells.filter(isLocalMin).sort((p, q) => p.cost - q.cost).slice(0, MAX_STARTS).map((c) => c.x);
}

function scaleStart(knowns: Known[], seed: CompoundState, rho: number, d1: number, d2: number): [number, number, number, number] {
  let r1 = seed.r1 ?? (seed.r2 !== undefined ? seed.r2 / rho : undefined);
  if (r1 === undefined) {
    // Lengths are homogeneous of degree 1 in (R1, R2): scale a unit curve to the first length known.
    const unit = evaluateCompoundCore(1, rho, d1, d2);
    const first = knowns.find((k) => k.kind === "length");
    r1 = first ? first.value / readKnown(unit, first.key) : 1;
  }
  const r2 = seed.r2 ?? rho * r1;
  return [Math.log(r1), Math.log(r2), d1, d2];
}

function residuals(knowns: Known[], x: number[]): number[] | undefined {
  const [a, b, d1, d2] = x as [number, number, number, number];
  if (!(d1 > 0 && d2 > 0 && d1 + d2 < Math.PI)) return undefined;
  const core = evaluateCompoundCore(Math.exp(a), Math.exp(b), d1, d2);
  const r = knowns.map((k) => residualOf(core, k));
  return r.every(Number.isFinite) ? r : undefined;
}

function runLevenbergMarquardt(knowns: Known[], x0: [number, number, number, number]): [number, number, number, number] | undefined {
  let x = x0;
  let r = residuals(knowns, x);
  if (!r) return undefined;
  let cost = sumSquares(r);
  let lambda = 1e-3;
  for (let it = 0; it < MAX_ITERATIONS && maxAbs(r) > SOLVER_RESIDUAL_TOL; it++) {
    const jac = jacobian(knowns, x, r);
    if (!jac) return undefined;
    const step = dampedStep(jac, r, lambda);
    const next = step && (x.map((v, i) => v + step[i]!) as [number, number, number, number]);
    const rNext = next && residuals(knowns, next);
    if (next && rNext && sumSquares(rNext) < cost) {
      [x, r, cost] = [next, rNext, sumSquares(rNext)];
      lambda = Math.max(lambda * 0.1, 1e-15);
    } else {
      lambda *= 10;
      if (lambda > 1e10) break;
    }
  }
  return maxAbs(r) <= ACCEPT_RESIDUAL ? x : undefined;
}

function jacobian(knowns: Known[], x: number[], r: number[]): number[][] | undefined {
  const cols: number[][] = [];
  for (let j = 0; j < 4; j++) {
    const xp = [...x];
    xp[j]! += FD_STEP;
    let rp = residuals(knowns, xp);
    let h = FD_STEP;
    if (!rp) {
      xp[j]! -= 2 * FD_STEP;
      rp = residuals(knowns, xp);
      h = -FD_STEP;
    }
    if (!rp) return undefined;
    cols.push(rp.map((v, i) => (v - r[i]!) / h));
  }
  return r.map((_, i) => cols.map((c) => c[i]!));
}

/** Solves (JᵀJ + λ·diag(JᵀJ)) δ = −Jᵀr by Gaussian elimination with partial pivoting. */
function dampedStep(jac: number[][], r: number[], lambda: number): number[] | undefined {
  const a = [0, 1, 2, 3].map((i) => [0, 1, 2, 3].map((j) => jac.reduce((s, row) => s + row[i]! * row[j]!, 0)));
  const g = [0, 1, 2, 3].map((i) => -jac.reduce((s, row, k) => s + row[i]! * r[k]!, 0));
  for (let i = 0; i < 4; i++) a[i]![i]! += lambda * Math.max(a[i]![i]!, 1e-12);
  for (let c = 0; c < 4; c++) {
    let p = c;
    for (let i = c + 1; i < 4; i++) if (Math.abs(a[i]![c]!) > Math.abs(a[p]![c]!)) p = i;
    if (a[p]![c] === 0) return undefined;
    [a[c], a[p], g[c], g[p]] = [a[p]!, a[c]!, g[p]!, g[c]!];
    for (let i = c + 1; i < 4; i++) {
      const f = a[i]![c]! / a[c]![c]!;
      for (let k = c; k < 4; k++) a[i]![k]! -= f * a[c]![k]!;
      g[i]! -= f * g[c]!;
    }
  }
  const out = [0, 0, 0, 0];
  for (let i = 3; i >= 0; i--) {
    let s = g[i]!;
    for (let k = i + 1; k < 4; k++) s -= a[i]![k]! * out[k]!;
    out[i] = s / a[i]![i]!;
  }
  return out.every(Number.isFinite) ? out : undefined;
}

function sumSquares(r: number[]): number {
  return r.reduce((s, v) => s + v * v, 0);
}

function maxAbs(r: number[]): number {
  return r.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
}

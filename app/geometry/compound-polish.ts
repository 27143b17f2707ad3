import { evaluateCompoundCore } from "./compound-core";
import { residualOf, type Known } from "./compound-knowns";
import { rankOf } from "./compound-rank";
import type { CompoundParams } from "./compound-reduction";

const MAX_STEPS = 8;
const STEP = 1e-6;

/**
 * A few full Newton steps on the square system (four knowns, unknowns ln R1, ln R2, Δ1, Δ2) with a
 * central-difference Jacobian, keeping a step only when it lowers the largest residual. Closed
 * forms and the projected search both land near the root; this takes them to round-off.
 */
export function polishCompoundRoot(knowns: Known[], params: CompoundParams): CompoundParams {
  if (knowns.length !== 4) return params;
  let x = [Math.log(params[0]), Math.log(params[1]), params[2], params[3]];
  let r = residualsAt(knowns, x);
  if (!r) return params;
  for (let i = 0; i < MAX_STEPS && maxAbs(r) > 0; i++) {
    const step = newtonStep(knowns, x, r);
    const next = step && x.map((v, k) => v - step[k]!);
    const rNext = next && residualsAt(knowns, next);
    if (!next || !rNext || maxAbs(rNext) >= maxAbs(r)) break;
    [x, r] = [next, rNext];
  }
  return [Math.exp(x[0]!), Math.exp(x[1]!), x[2]!, x[3]!];
}

function residualsAt(knowns: Known[], x: number[]): number[] | undefined {
  const [a, b, d1, d2] = x as [number, number, number, number];
  if (!(d1 > 0 && d2 > 0 && d1 + d2 < Math.PI)) return undefined;
  const core = evaluateCompoundCore(Math.exp(a), Math.exp(b), d1, d2);
  const r = knowns.map((k) => residualOf(core, k));
  return r.every(Number.isFinite) ? r : undefined;
}

/**
 * True when the knowns pin the curve down near this root: their Jacobian in (ln R1, ln R2, Δ1, Δ2)
 * has full rank. Fails for a continuum of solutions, e.g. R1 = R2, where any split of Δ fits.
 */
export function isIsolatedRoot(knowns: Known[], params: CompoundParams): boolean {
  const x = [Math.log(params[0]), Math.log(params[1]), params[2], params[3]];
  const r = residualsAt(knowns, x);
  const cols = r && jacobianColumns(knowns, x);
  if (!cols) return false;
  return rankOf(knowns.map((_, i) => cols.map((c) => c[i]!))) === 4;
}

function jacobianColumns(knowns: Known[], x: number[]): number[][] | undefined {
  const cols: number[][] = [];
  for (let j = 0; j < 4; j++) {
    const up = [...x];
    const down = [...x];
    up[j]! += STEP;
    down[j]! -= STEP;
    const ru = residualsAt(knowns, up);
    const rd = residualsAt(knowns, down);
    if (!ru || !rd) return undefined;
    cols.push(ru.map((v, i) => (v - rd[i]!) / (2 * STEP)));
  }
  return cols;
}

function newtonStep(knowns: Known[], x: number[], r: number[]): number[] | undefined {
  const cols = jacobianColumns(knowns, x);
  if (!cols) return undefined;
  const a = r.map((_, i) => [...cols.map((c) => c[i]!), r[i]!]);
  return solveAugmented(a);
}

/** Gaussian elimination with partial pivoting on an n×(n+1) augmented matrix. */
function solveAugmented(a: number[][]): number[] | undefined {
  const n = a.length;
  for (let c = 0; c < n; c++) {
    let p = c;
    for (let i = c + 1; i < n; i++) if (Math.abs(a[i]![c]!) > Math.abs(a[p]![c]!)) p = i;
    if (a[p]![c] === 0) return undefined;
    [a[c], a[p]] = [a[p]!, a[c]!];
    for (let i = c + 1; i < n; i++) {
      const f = a[i]![c]! / a[c]![c]!;
      for (let k = c; k <= n; k++) a[i]![k]! -= f * a[c]![k]!;
    }
  }
  const out = new Array<number>(n).fill(0);
  for (let i = n - 1; i >= 0; i--) {
    let s = a[i]![n]!;
    for (let k = i + 1; k < n; k++) s -= a[i]![k]! * out[k]!;
    out[i] = s / a[i]![i]!;
  }
  return out.every(Number.isFinite) ? out : undefined;
}

function maxAbs(r: number[]): number {
  return r.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
}

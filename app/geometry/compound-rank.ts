import { evaluateCompoundCore } from "./compound-core";
import { residualOf, type Known } from "./compound-knowns";
import { RANK_REL_TOL } from "./tolerances";

// An arbitrary, non-special curve: dependencies between knowns (Δ = Δ1 + Δ2, any two of R, Δ,
// t, L for one arc, …) show as a rank drop here, while independent sets have full rank.
const GENERIC = { r1: 613.7, r2: 241.3, d1: 0.7313, d2: 0.5219 };

// The gradient at the generic curve depends only on which known it is, not on its value.
const GRADIENT_CACHE = new Map<string, number[]>();

function gradientOf(known: Known): number[] {
  const cached = GRADIENT_CACHE.get(known.key);
  if (cached) return cached;
  const g = computeGradient(known);
  GRADIENT_CACHE.set(known.key, g);
  return g;
}

function computeGradient(known: Known): number[] {
  const x0 = [Math.log(GENERIC.r1), Math.log(GENERIC.r2), GENERIC.d1, GENERIC.d2];
  const at = (x: number[]): number => {
    const core = evaluateCompoundCore(Math.exp(x[0]!), Math.exp(x[1]!), x[2]!, x[3]!);
    // Residual against the generic value itself, so that lengths are measured relatively.
    return residualOf(core, known.kind === "length" ? { ...known, value: 1 } : { ...known, value: 0 });
  };
  const h = 1e-5;
  const base = known.kind === "length" ? 1 + at(x0) : 1;
  return x0.map((_, j) => {
    const up = [...x0];
    const down = [...x0];
    up[j]! += h;
    down[j]! -= h;
    return (at(up) - at(down)) / (2 * h) / base;
  });
}

/** Rank of a set of row vectors by Gaussian elimination with row normalisation. */
export function rankOf(rows: number[][]): number {
  const m = rows.map((r) => {
    const n = Math.hypot(...r);
    return n > 0 ? r.map((v) => v / n) : r;
  });
  let rank = 0;
  for (let col = 0; col < 4 && rank < m.length; col++) {
    let pivot = rank;
    for (let i = rank + 1; i < m.length; i++) if (Math.abs(m[i]![col]!) > Math.abs(m[pivot]![col]!)) pivot = i;
    if (Math.abs(m[pivot]![col]!) < RANK_REL_TOL) continue;
    [m[rank], m[pivot]] = [m[pivot]!, m[rank]!];
    for (let i = rank + 1; i < m.length; i++) {
      const f = m[i]![col]! / m[rank]![col]!;
      for (let k = col; k < 4; k++) m[i]![k]! -= f * m[rank]![k]!;
    }
    rank++;
  }
  return rank;
}

/**
 * Picks a largest independent subset of the knowns (greedy, in the given order) and reports how
 * many of the four parameters R1, R2, Δ1, Δ2 the whole set fixes.
 */
export function selectIndependentKnowns(knowns: Known[]): { chosen: Known[]; rank: number } {
  const chosen: Known[] = [];
  const rows: number[][] = [];
  for (const k of knowns) {
    const g = gradientOf(k);
    if (rankOf([...rows, g]) > rows.length) {
      rows.push(g);
      chosen.push(k);
    }
    if (rows.length === 4) break;
  }
  return { chosen, rank: rows.length };
}

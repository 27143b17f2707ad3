import { findCyclicZeros, findSampledZeros } from "./compound-zero-scan";

/** One piece of a branch between two outer angles; an end at a fold is reached quadratically. */
export interface PathEdge {
  x0: number;
  x1: number;
  sign: 1 | -1;
  fold0: boolean;
  fold1: boolean;
  /** Residuals at x0 and x1 on this branch, already computed. */
  h0: number;
  h1: number;
}

/** A sample of the outer angle with the residual on the + and − branches there. */
export interface PathNode {
  x: number;
  values: [number, number];
}

/** A point of the solution curve: outer angle and branch of the inner angle. */
export interface PathPoint {
  x: number;
  sign: 1 | -1;
}

// A fold edge is sampled at quarter steps of its own parameter: near a fold two roots can lie
// closer to it than the last uniform sample.
const FOLD_SUBSAMPLES = [0.25, 0.5, 0.75];

/**
 * The solution curve of the inner equation over one solvable interval [lo, hi], as paths of
 * edges. The two branches (±) meet at a fold, where x turns back; walking through the fold with
 * x = x_f − (x_f − x_k)·s² (s through zero) keeps the residual smooth (x − x_f is quadratic in
 * the curve's own parameter at a fold), so a sign change or dip next to a fold is seen like any
 * other. Closed when both ends are folds, open at a domain end.
 */
export function buildPaths(
  lo: number,
  hi: number,
  loFold: boolean,
  hiFold: boolean,
  inside: PathNode[],
  h: (p: PathPoint) => number,
): { edges: PathEdge[]; closed: boolean }[] {
  const node = (x: number): PathNode => ({ x, values: [h({ x, sign: 1 }), h({ x, sign: -1 })] });
  const nodes = [node(lo), ...(inside.length > 0 ? inside : [node((lo + hi) / 2)]), node(hi)];
  const branch = (sign: 1 | -1): PathEdge[] =>
    nodes.slice(1).map((n1, i) => ({
      x0: nodes[i]!.x,
      x1: n1.x,
      sign,
      fold0: i === 0 && loFold,
      fold1: i === nodes.length - 2 && hiFold,
      h0: nodes[i]!.values[sign === 1 ? 0 : 1],
      h1: n1.values[sign === 1 ? 0 : 1],
    }));
  const [up, down] = [branch(1), branch(-1)];
  if (hiFold) return [{ edges: [...up, ...reversePath(down)], closed: loFold }];
  if (loFold) return [{ edges: [...reversePath(down), ...up], closed: false }];
  return [
    { edges: up, closed: false },
    { edges: down, closed: false },
  ];
}

function reversePath(edges: PathEdge[]): PathEdge[] {
  return edges
    .slice()
    .reverse()
    .map((e) => ({ x0: e.x1, x1: e.x0, sign: e.sign, fold0: e.fold1, fold1: e.fold0, h0: e.h1, h1: e.h0 }));
}

/** The point at path parameter τ (edge ⌊τ⌋, local u = τ − ⌊τ⌋). */
export function pointOnPath(edges: PathEdge[], tau: number): PathPoint {
  const i = Math.min(edges.length - 1, Math.max(0, Math.floor(tau)));
  const e = edges[i]!;
  const u = Math.min(1, Math.max(0, tau - i));
  const d = e.x1 - e.x0;
  const x =
    e.fold0 && e.fold1 ? e.x0 + (d * (1 - Math.cos(Math.PI * u))) / 2 : e.fold0 ? e.x0 + d * u * u : e.fold1 ? e.x1 - d * (1 - u) * (1 - u) : e.x0 + d * u;
  return { x, sign: e.sign };
}

/** Every zero of `h` along a path (a closed one is treated as periodic). */
export function findPathZeros(edges: PathEdge[], closed: boolean, h: (p: PathPoint) => number, touch: number): PathPoint[] {
  const n = edges.length;
  const taus: number[] = [];
  const values: number[] = [];
  for (let i = 0; i < n; i++) {
    const e = edges[i]!;
    taus.push(i);
    values.push(e.h0);
    if (!e.fold0 && !e.fold1) continue;
    for (const u of FOLD_SUBSAMPLES) {
      taus.push(i + u);
      values.push(h(pointOnPath(edges, i + u)));
    }
  }
  const f = (t: number) => h(pointOnPath(edges, t));
  if (closed) return findCyclicZeros(f, taus, values, n, touch).map((t) => pointOnPath(edges, t));
  return findSampledZeros(f, [...taus, n], [...values, edges[n - 1]!.h1], touch).map((t) => pointOnPath(edges, t));
}

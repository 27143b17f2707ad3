import type { ContourChain, PlanePoint } from "./compound-contour";
import { findCyclicZeros, findSampledZeros, refineZero } from "./compound-zero-scan";

type PlaneFn = (x: number, y: number) => number;

// Steps (fractions of the reach) tried on either side of a chord point to bracket the contour.
const BRACKET_STEPS = [0.125, 0.25, 0.5, 1];

/**
 * Every point of one contour chain of g where r is zero. Between two nodes the chain is followed
 * exactly: a point on the chord is carried onto g = 0 across the chord (Brent's method on the
 * nearest sign change within `reach`), so r is sampled on the contour itself, and its sign
 * changes and dips between nodes are refined as a function of the position along the chain.
 */
export function findChainZeros(chain: ContourChain, g: PlaneFn, r: PlaneFn, reach: number, touch: number): PlanePoint[] {
  const nodes = chain.closed ? [...chain.nodes, chain.nodes[0]!] : chain.nodes;
  const n = nodes.length - 1;
  if (n < 1) return [];
  // Nodes are already on the contour (placed on their grid edges); points between are carried onto it.
  const at = (t: number): PlanePoint => (Number.isInteger(t) ? nodes[t]! : onContour(g, nodes, t, reach));
  const f = (t: number) => {
    const [x, y] = at(t);
    return r(x, y);
  };
  const ts = Array.from({ length: n }, (_, k) => k);
  const values = ts.map(f);
  const zeros = chain.closed ? findCyclicZeros(f, ts, values, n, touch) : findSampledZeros(f, [...ts, n], [...values, f(n)], touch);
  return zeros.map(at);
}

/** The point of g = 0 across the chord at chain position t (segment ⌊t⌋, fraction t − ⌊t⌋). */
function onContour(g: PlaneFn, nodes: PlanePoint[], t: number, reach: number): PlanePoint {
  const k = Math.min(nodes.length - 2, Math.max(0, Math.floor(t)));
  const u = t - k;
  const [a, b] = [nodes[k]!, nodes[k + 1]!];
  const p: PlanePoint = [a[0] + u * (b[0] - a[0]), a[1] + u * (b[1] - a[1])];
  const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
  if (!(len > 0)) return p;
  const normal: PlanePoint = [-(b[1] - a[1]) / len, (b[0] - a[0]) / len];
  const along = (s: number) => g(p[0] + s * normal[0], p[1] + s * normal[1]);
  const g0 = along(0);
  if (g0 === 0) return p;
  for (const step of BRACKET_STEPS) {
    for (const s of [step * reach, -step * reach]) {
      const gs = along(s);
      if (g0 * gs < 0) {
        const z = refineZero(along, 0, s, g0, gs);
        return [p[0] + z * normal[0], p[1] + z * normal[1]];
      }
    }
  }
  // No sign change within reach (a chord cutting a sharp bend): keep the chord point.
  return p;
}

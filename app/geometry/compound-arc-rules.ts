import { learn, type CompoundState } from "./compound-state";

/**
 * Closed forms for one arc: any two of R, Δ, t = R tan(Δ/2), L = RΔ fix the arc
 * (Schofield & Breach §10.1 relations), plus the angle sums Δ = Δ1 + Δ2 = φ_PC + φ_PT and, with
 * the parallel condition, φ_PC = Δ1 and φ_PT = Δ2. Returns true when anything was learned.
 */
export function applyArcAndAngleRules(s: CompoundState): boolean {
  let changed = applyArcPair(s, "r1", "d1", "t1", "l1");
  changed = applyArcPair(s, "r2", "d2", "t2", "l2") || changed;
  changed = applySum(s, "d", "d1", "d2") || changed;
  changed = applySum(s, "d", "p1", "p2") || changed;
  if (s.parallel) {
    if (s.p1 !== undefined) changed = learn(s, "d1", s.p1) || changed;
    if (s.d1 !== undefined) changed = learn(s, "p1", s.d1) || changed;
    if (s.p2 !== undefined) changed = learn(s, "d2", s.p2) || changed;
    if (s.d2 !== undefined) changed = learn(s, "p2", s.d2) || changed;
  }
  return changed;
}

type Keys<T extends string> = T;

function applyArcPair(
  s: CompoundState,
  rk: Keys<"r1" | "r2">,
  dk: Keys<"d1" | "d2">,
  tk: Keys<"t1" | "t2">,
  lk: Keys<"l1" | "l2">,
): boolean {
  const { [rk]: r, [dk]: d, [tk]: t, [lk]: l } = s;
  let changed = false;
  if (r !== undefined && d === undefined) {
    if (t !== undefined) changed = learn(s, dk, 2 * Math.atan(t / r));
    else if (l !== undefined) changed = learn(s, dk, l / r);
  } else if (d !== undefined && r === undefined) {
    if (t !== undefined) changed = learn(s, rk, t / Math.tan(d / 2));
    else if (l !== undefined) changed = learn(s, rk, l / d);
  } else if (r === undefined && d === undefined && t !== undefined && l !== undefined) {
    const angle = solveHalfTangentRatio(t / l);
    if (angle !== undefined) changed = learn(s, dk, angle) && learn(s, rk, l / angle);
  }
  const r2 = s[rk];
  const d2 = s[dk];
  if (r2 !== undefined && d2 !== undefined) {
    changed = learn(s, tk, r2 * Math.tan(d2 / 2)) || changed;
    changed = learn(s, lk, r2 * d2) || changed;
  }
  return changed;
}

function applySum(s: CompoundState, total: "d", a: "d1" | "p1", b: "d2" | "p2"): boolean {
  const [x, y, z] = [s[total], s[a], s[b]];
  if (x === undefined && y !== undefined && z !== undefined) return learn(s, total, y + z);
  if (x !== undefined && y !== undefined && z === undefined) return learn(s, b, x - y);
  if (x !== undefined && y === undefined && z !== undefined) return learn(s, a, x - z);
  return false;
}

/** Δ in (0, π) with tan(Δ/2)/Δ = ratio; the function rises from 1/2 to ∞, so one root at most. */
export function solveHalfTangentRatio(ratio: number): number | undefined {
  if (!(ratio > 0.5) || !Number.isFinite(ratio)) return undefined;
  let lo = 0;
  let hi = Math.PI;
  for (let i = 0; i < 200 && hi - lo > 1e-17; i++) {
    const mid = (lo + hi) / 2;
    const g = mid === 0 ? 0.5 : Math.tan(mid / 2) / mid;
    if (g < ratio) lo = mid;
    else hi = mid;
  }
  // Newton polish: bisection alone stalls a few ulps short of the best root.
  let x = (lo + hi) / 2;
  for (let i = 0; i < 3; i++) {
    const tn = Math.tan(x / 2);
    const f = tn - ratio * x;
    const df = 0.5 * (1 + tn * tn) - ratio;
    if (df !== 0) x -= f / df;
  }
  return x > 0 && x < Math.PI ? x : undefined;
}

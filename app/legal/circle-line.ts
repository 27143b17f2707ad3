import type { Vec2 } from "~/geometry/vec2";

/**
 * Points where the infinite line through `a` and `b` meets the circle (centre `o`, radius `r`):
 * substituting p = a + t·(b − a) into |p − o|² = r² gives a quadratic in t, solved in the
 * cancellation-free form t = (−B ∓ √D)/A with the root of larger magnitude first (Press et al.,
 * Numerical Recipes, 3rd ed., §5.6 "Quadratic and cubic equations"). Empty when they miss.
 */
export function intersectLineCircle(a: Vec2, b: Vec2, o: Vec2, r: number): Vec2[] {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const fx = a[0] - o[0];
  const fy = a[1] - o[1];
  const A = dx * dx + dy * dy;
  if (!(A > 0)) return [];
  const B = fx * dx + fy * dy;
  const C = fx * fx + fy * fy - r * r;
  const D = B * B - A * C;
  if (D < 0) return [];
  const q = -(B + Math.sign(B || 1) * Math.sqrt(D));
  const roots = q === 0 ? [0] : [q / A, C / q];
  return roots.map((t) => [a[0] + t * dx, a[1] + t * dy]);
}

/** The point of {@link intersectLineCircle} nearest `near`, or undefined when the line misses the circle. */
export function nearestLineCirclePoint(a: Vec2, b: Vec2, o: Vec2, r: number, near: Vec2): Vec2 | undefined {
  let best: Vec2 | undefined;
  let bestD = Infinity;
  for (const p of intersectLineCircle(a, b, o, r)) {
    const d = Math.hypot(p[0] - near[0], p[1] - near[1]);
    if (d < bestD) [best, bestD] = [p, d];
  }
  return best;
}

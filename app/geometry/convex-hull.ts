import { crossVec, subVec, type Vec2 } from "./vec2";

/**
 * Convex hull, counter-clockwise, by Andrew's monotone chain (A. M. Andrew, "Another efficient
 * algorithm for convex hulls in two dimensions", Information Processing Letters 9, 1979).
 * Collinear points are dropped.
 */
export function convexHull(points: Vec2[]): Vec2[] {
  const p = [...points].sort((a, b) => a[0] - b[0] || a[1] - b[1]);
  if (p.length < 3) return p;
  const turn = (o: Vec2, a: Vec2, b: Vec2) => crossVec(subVec(a, o), subVec(b, o));
  const lower: Vec2[] = [];
  for (const q of p) {
    while (lower.length >= 2 && turn(lower[lower.length - 2]!, lower[lower.length - 1]!, q) <= 0) lower.pop();
    lower.push(q);
  }
  const upper: Vec2[] = [];
  for (let i = p.length - 1; i >= 0; i--) {
    const q = p[i]!;
    while (upper.length >= 2 && turn(upper[upper.length - 2]!, upper[upper.length - 1]!, q) <= 0) upper.pop();
    upper.push(q);
  }
  return [...lower.slice(0, -1), ...upper.slice(0, -1)];
}

/**
 * True when two convex polygons (counter-clockwise) overlap by more than `gap` along every edge
 * normal — the separating axis theorem (Gottschalk, Lin & Manocha, "OBBTree", SIGGRAPH 1996, §4):
 * convex sets are disjoint exactly when some edge normal of one of them separates them.
 */
export function convexPolygonsOverlap(a: Vec2[], b: Vec2[], gap = 0): boolean {
  return !separatedByEdgeOf(a, b, gap) && !separatedByEdgeOf(b, a, gap);
}

function separatedByEdgeOf(a: Vec2[], b: Vec2[], gap: number): boolean {
  for (let i = 0; i < a.length; i++) {
    const p = a[i]!;
    const q = a[(i + 1) % a.length]!;
    const edge = subVec(q, p);
    const len = Math.hypot(edge[0], edge[1]);
    if (len === 0) continue;
    // Signed distance beyond the edge's line (outward, to the right of a counter-clockwise
    // edge): every point of `a` is at or behind it; `b` is separated when none of it reaches
    // more than `gap` behind.
    let deepest = Infinity;
    for (const v of b) deepest = Math.min(deepest, -crossVec(edge, subVec(v, p)) / len);
    if (deepest >= -gap) return true;
  }
  return false;
}

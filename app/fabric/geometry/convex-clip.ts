import type { Position } from "geojson";

type XY = [number, number];

/** True when a closed ring turns the same way at every corner (collinear corners allowed): a convex polygon. */
export function isConvexRing(ring: Position[]): boolean {
  const n = ring.length - 1;
  if (n < 3) return false;
  let sign = 0;
  for (let i = 0; i < n; i++) {
    const a = ring[i]!, b = ring[(i + 1) % n]!, c = ring[(i + 2) % n]!;
    const cross = (b[0]! - a[0]!) * (c[1]! - b[1]!) - (b[1]! - a[1]!) * (c[0]! - b[0]!);
    if (cross === 0) continue;
    if (sign === 0) sign = Math.sign(cross);
    else if (Math.sign(cross) !== sign) return false;
  }
  return sign !== 0;
}

/** Shoelace area of an open vertex cycle, positive when counter-clockwise. */
function signedArea(p: XY[]): number {
  let s = 0;
  for (let i = 0; i < p.length; i++) {
    const a = p[i]!, b = p[(i + 1) % p.length]!;
    s += a[0] * b[1] - b[0] * a[1];
  }
  return s / 2;
}

/**
 * Area of the intersection of two convex polygons (closed rings, either winding), by Sutherland–Hodgman clipping of one by each edge of the other
 * (Sutherland & Hodgman, "Reentrant polygon clipping", CACM 17(1), 1974). Coordinates are
 * taken relative to the first vertex of `a`, so projected values near 10^6 keep their digits.
 */
export function convexOverlapArea(a: Position[], b: Position[]): number {
  const ox = a[0]![0]!, oy = a[0]![1]!;
  const local = (r: Position[]): XY[] => r.slice(0, -1).map((p) => [p[0]! - ox, p[1]! - oy]);
  let out = local(a);
  const clip = local(b);
  // Clip against a counter-clockwise ring: turn a clockwise one round.
  if (signedArea(clip) < 0) clip.reverse();
  for (let i = 0; i < clip.length && out.length > 0; i++) {
    const p = clip[i]!, q = clip[(i + 1) % clip.length]!;
    const input = out;
    out = [];
    for (let k = 0; k < input.length; k++) {
      const cur = input[k]!, prev = input[(k + input.length - 1) % input.length]!;
      const sc = sideOf(p, q, cur), sp = sideOf(p, q, prev);
      if (sc >= 0) {
        if (sp < 0) out.push(cut(prev, cur, sp, sc));
        out.push(cur);
      } else if (sp >= 0) out.push(cut(prev, cur, sp, sc));
    }
  }
  return out.length < 3 ? 0 : Math.abs(signedArea(out));
}

/** Left of p→q (inside a counter-clockwise clip polygon) when ≥ 0: twice the signed triangle area. */
function sideOf(p: XY, q: XY, v: XY): number {
  return (q[0] - p[0]) * (v[1] - p[1]) - (q[1] - p[1]) * (v[0] - p[0]);
}

/** Where segment s→e crosses the clip line, from the two side values (opposite signs). */
function cut(s: XY, e: XY, ss: number, se: number): XY {
  const t = ss / (ss - se);
  return [s[0] + (e[0] - s[0]) * t, s[1] + (e[1] - s[1]) * t];
}

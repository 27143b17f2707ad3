import { extendBounds } from "./corridor-pieces";
import type { Bounds, SliceSide } from "./corridor-types";
import { crossVec, subVec, type Vec2 } from "./vec2";

/**
 * Triangle from the slice centre (origin) along the two rays, long enough to contain the slice:
 * its far side is at distance L·cos(δ/2) ≥ the farthest reach of the outer circle. Flat,
 * counter-clockwise, relative to the centre. δ ≤ 90° keeps L within √2 of that reach.
 */
export function makeWedge(u1: Vec2, u2: Vec2, outer: SliceSide, sweepRad: number): number[] {
  const reach = Math.hypot(outer.center[0], outer.center[1]) + outer.radius;
  const L = (reach / Math.cos(sweepRad / 2)) * 1.01;
  return [0, 0, u1[0] * L, u1[1] * L, u2[0] * L, u2[1] * L];
}

/**
 * Bounds of an annular slice: its corners, plus each point of the outer arc (from `pa` to `pb`
 * counter-clockwise, relative to the slice centre `c`) whose direction from the outer circle's
 * own centre is ±x or ±y — where an arc reaches its extremes.
 */
export function annularBounds(c: Vec2, outer: SliceSide, pa: Vec2, pb: Vec2, corners: Vec2[]): Bounds {
  const b: Bounds = [Infinity, Infinity, -Infinity, -Infinity];
  for (const p of corners) extendBounds(b, p[0], p[1]);
  const da = subVec(pa, outer.center);
  const db = subVec(pb, outer.center);
  for (const d of [[1, 0], [0, 1], [-1, 0], [0, -1]] as Vec2[]) {
    if (crossVec(da, d) >= 0 && crossVec(d, db) >= 0) {
      extendBounds(b, c[0] + outer.center[0] + d[0] * outer.radius, c[1] + outer.center[1] + d[1] * outer.radius);
    }
  }
  return b;
}

import type { SliceSide } from "./corridor-types";
import { crossVec, dotVec, subVec, type Vec2 } from "./vec2";

/**
 * Geometry of one side of an annular slice, in coordinates relative to the slice's centre c.
 * A tapered side is r(θ) = r_a + (r_b − r_a)·θ/δ, an Archimedean spiral between the rays (the
 * width is linear in station and station linear in θ); it is carried by the circle through the
 * spiral at both rays and the middle ray. That circle always contains c (the osculating circle of
 * r = a + bθ does, since its radius ρ = (r² + b²)^{3/2}/(r² + 2b²) satisfies r < 2ρ·cos ψ), so the
 * region "inside the circle, between the rays" is exactly the region under that arc.
 */

/** Circle through three points (circumcircle, closed form), relative coordinates. */
export function circleThrough(a: Vec2, m: Vec2, b: Vec2): SliceSide {
  const d = 2 * (a[0] * (m[1] - b[1]) + m[0] * (b[1] - a[1]) + b[0] * (a[1] - m[1]));
  const a2 = a[0] * a[0] + a[1] * a[1];
  const m2 = m[0] * m[0] + m[1] * m[1];
  const b2 = b[0] * b[0] + b[1] * b[1];
  const x = (a2 * (m[1] - b[1]) + m2 * (b[1] - a[1]) + b2 * (a[1] - m[1])) / d;
  const y = (a2 * (b[0] - m[0]) + m2 * (a[0] - b[0]) + b2 * (m[0] - a[0])) / d;
  return { center: [x, y], radius: Math.hypot(a[0] - x, a[1] - y) };
}

/** Distance from the origin along unit ray `u` to the circle `side` (relative coordinates; origin inside). */
export function rayToCircle(u: Vec2, side: SliceSide): number {
  if (side.center[0] === 0 && side.center[1] === 0) return side.radius;
  const proj = dotVec(side.center, u);
  const c2 = dotVec(side.center, side.center);
  return proj + Math.sqrt(Math.max(0, proj * proj - c2 + side.radius * side.radius));
}

/**
 * Area of the region between rays `ua` → `ub` (counter-clockwise, ≤ 90° apart) inside the circle
 * `side`, whose arc meets the rays at `pa`, `pb` (relative coordinates). Triangle (c, pa, pb) plus
 * the circular segment beyond the chord, r²/2·(φ − sin φ) (CRC Standard Mathematical Tables,
 * "circular segment"); a concentric side is the sector ½δr².
 */
export function wedgeCircleArea(pa: Vec2, pb: Vec2, side: SliceSide, sweepRad: number): number {
  const r = side.radius;
  if (side.center[0] === 0 && side.center[1] === 0) return 0.5 * sweepRad * r * r;
  const chordVec = subVec(pb, pa);
  const chord = Math.hypot(chordVec[0], chordVec[1]);
  const phi = 2 * Math.asin(Math.min(1, chord / (2 * r)));
  const centreSide = crossVec(chordVec, subVec(side.center, pa));
  const originSide = crossVec(chordVec, [-pa[0], -pa[1]]);
  const segment = centreSide * originSide >= 0 ? ((r * r) / 2) * (phi - Math.sin(phi)) : ((r * r) / 2) * (2 * Math.PI - phi + Math.sin(phi));
  return 0.5 * crossVec(pa, pb) + segment;
}

/** True when the origin (the slice centre) lies inside the circle. */
export function containsOrigin(side: SliceSide): boolean {
  return Math.hypot(side.center[0], side.center[1]) < side.radius;
}

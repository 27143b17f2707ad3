/**
 * Marrow Brook, the invented creek: a meander through the town's wide creek
 * row (a function v = c(u), so lots on either side can follow its bank
 * exactly) and on through the rural tracts along fixed lattice rays.
 */
import type { Uv } from "./warp";

/** Half the width of the water surface, metres. */
export const CREEK_HALF_WIDTH = 4.5;

/** Centre-line v of the creek at u, inside a creek row whose middle is vMid. */
export function creekV(u: number, vMid: number): number {
  return vMid + 13 * Math.sin(u / 52 + 0.7) + 5 * Math.sin(u / 19);
}

/** Sample positions strictly between a and b (ascending), every `step` metres on a fixed lattice of u. */
export function samplesBetween(a: number, b: number, step = 6): number[] {
  const out: number[] = [];
  for (let k = Math.floor(a / step) + 1; k * step < b; k++) if (k * step > a + 0.5 && k * step < b - 0.5) out.push(k * step);
  return out;
}

/** The water polygon between u0 and u1 (design plane, counter-clockwise). */
export function creekWaterRing(u0: number, u1: number, vMid: number): Uv[] {
  const us = [u0, ...samplesBetween(u0, u1), u1];
  const south = us.map((u): Uv => [u, creekV(u, vMid) - CREEK_HALF_WIDTH]);
  const north = us.map((u): Uv => [u, creekV(u, vMid) + CREEK_HALF_WIDTH]).reverse();
  return [...south, ...north, south[0]!];
}

/** Meander offset across a rural creek reach, zero at both ends (t in 0..1). */
export function ruralMeander(t: number, reach: number): number {
  return 22 * Math.sin(Math.PI * 2 * t * 3 + reach) * Math.sin(Math.PI * t);
}

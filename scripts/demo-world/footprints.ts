/**
 * Building footprint shapes on the design plane: rectangles, some rotated a
 * few degrees, some L-shaped, placed inside a lot's inner rectangle with
 * front, side and rear setbacks, or at a rural building site.
 */
import type { Rng } from "./prng";
import type { Plot, Site } from "./plan-types";
import type { Uv } from "./warp";

export interface Footprint {
  ring: Uv[];
  /** Floor area in m² on the design plane (the bend changes it by well under 1 %). */
  area: number;
  kind: "house" | "shop" | "works" | "garage" | "barn" | "school";
}

const rotate = (ring: Uv[], [cu, cv]: Uv, a: number): Uv[] =>
  ring.map(([u, v]) => [cu + (u - cu) * Math.cos(a) - (v - cv) * Math.sin(a), cv + (u - cu) * Math.sin(a) + (v - cv) * Math.cos(a)]);

/** Rectangle u0..u1 × v0..v1, counter-clockwise. */
const rect = (u0: number, v0: number, u1: number, v1: number): Uv[] => [[u0, v0], [u1, v0], [u1, v1], [u0, v1]];

/** An L: the rectangle with one back corner notched out. */
function lShape(u0: number, v0: number, u1: number, v1: number, notchU: number, notchV: number, left: boolean): Uv[] {
  const [a, b] = [Math.min(v0, v1), Math.max(v0, v1)];
  const backIsHigh = v1 > v0;
  const nv = backIsHigh ? b - notchV : a + notchV;
  const ring: Uv[] = left
    ? [[u0, a], [u1, a], [u1, b], [u0 + notchU, b], [u0 + notchU, nv], [u0, nv]]
    : [[u0, a], [u1, a], [u1, nv], [u1 - notchU, nv], [u1 - notchU, b], [u0, b]];
  return backIsHigh ? ring : ring.map(([u, v]): Uv => [u, a + b - v]);
}

/** Footprints for a town lot, or none when the lot is too small to build on. */
export function lotFootprints(rng: Rng, plot: Plot, kind: "house" | "shop" | "works" | "school"): Footprint[] {
  const frontage = plot.uR - plot.uL;
  const dir = Math.sign(plot.vBack - plot.vFront);
  const depthAvail = Math.abs(plot.vBack - plot.vFront);
  const side = kind === "shop" ? 0.6 : kind === "house" ? Math.min(3, frontage * 0.12) : 6;
  const setback = kind === "shop" ? rng.range(0.5, 2) : kind === "house" ? rng.range(5, 8) : rng.range(8, 14);
  const width = Math.min(frontage - 2 * side, kind === "house" ? rng.range(9, 15) : kind === "shop" ? 40 : rng.range(45, 75));
  const depth = Math.min(depthAvail - setback - 4, kind === "house" ? rng.range(9, 13) : kind === "shop" ? rng.range(14, 24) : rng.range(20, 45));
  if (width < 6 || depth < 6) return [];
  const uMid = (plot.uL + plot.uR) / 2 + (kind === "house" ? rng.range(-1, 1) * (frontage - 2 * side - width) / 2 : 0);
  const [u0, u1] = [uMid - width / 2, uMid + width / 2];
  const [v0, v1] = [plot.vFront + dir * setback, plot.vFront + dir * (setback + depth)];
  const out: Footprint[] = [];
  const roll = rng.next();
  if ((kind === "house" || kind === "school") && roll < 0.28 && width > 9) {
    const [nu, nv] = [width * rng.range(0.35, 0.55), depth * rng.range(0.35, 0.5)];
    out.push({ ring: lShape(u0, v0, u1, v1, nu, nv, rng.chance(0.5)), area: width * depth - nu * nv, kind });
  } else {
    let ring = rect(u0, Math.min(v0, v1), u1, Math.max(v0, v1));
    const slack = Math.min(u0 - plot.uL, plot.uR - u1, setback);
    const angle = rng.range(-0.1, 0.1);
    if (kind === "house" && roll < 0.5 && slack > (Math.abs(Math.sin(angle)) * Math.max(width, depth)) / 2 + 0.3) ring = rotate(ring, [uMid, (v0 + v1) / 2], angle);
    out.push({ ring, area: width * depth, kind });
  }
  const rearRoom = depthAvail - setback - depth - 4;
  if (kind === "house" && rearRoom > 8 && frontage > 14 && rng.chance(0.35)) {
    const g0 = plot.vFront + dir * (setback + depth + 2);
    const gu = rng.chance(0.5) ? plot.uL + side : plot.uR - side - 6;
    out.push({ ring: rect(gu, Math.min(g0, g0 + dir * 6), gu + 6, Math.max(g0, g0 + dir * 6)), area: 36, kind: "garage" });
  }
  return out;
}

/** A farmhouse and barn at a rural site, turned to face the road. */
export function siteFootprints(rng: Rng, site: Site, withBarn: boolean): Footprint[] {
  const [cu, cv] = site.centre;
  const house = rotate(rect(cu - 7, cv - 5, cu + 7, cv + 5), site.centre, site.angle);
  const out: Footprint[] = [{ ring: house, area: 140, kind: "house" }];
  if (withBarn) {
    const [bw, bd] = [rng.range(18, 30), rng.range(12, 20)];
    out.push({ ring: rotate(rect(cu + 16, cv - bd / 2, cu + 16 + bw, cv + bd / 2), site.centre, site.angle), area: bw * bd, kind: "barn" });
  }
  return out;
}

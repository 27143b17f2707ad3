/**
 * Cutting one row of a block into lots: frontages drawn from the zone's
 * range, side lines slightly skewed (front and back positions differ) so the
 * fabric looks surveyed over time rather than stamped.
 */
import type { Rng } from "./prng";
import type { Plot } from "./plan-types";
import { samplesBetween } from "./creek";
import type { Uv } from "./warp";

/** A side line of lots: u where it meets the street (f) and the back line (b). */
export interface Cut {
  f: number;
  b: number;
}

/** Cuts [ua, ub] into frontages in [lo, hi]; ends are exact so blocks keep square corners. */
export function cutRow(rng: Rng, ua: number, ub: number, lo: number, hi: number): Cut[] {
  const cuts: Cut[] = [{ f: ua, b: ua }];
  let at = ua;
  for (;;) {
    const step = rng.range(lo, hi);
    if (ub - (at + step) < lo * 0.8) break;
    at += step;
    const skew = Math.min(2, step / 8);
    cuts.push({ f: at + rng.range(-skew, skew), b: at + rng.range(-skew, skew) });
  }
  cuts.push({ f: ub, b: ub });
  return cuts;
}

/** Merges some neighbouring lots (a double lot) so sizes vary within a row. */
export function mergeSome(rng: Rng, cuts: Cut[], p: number): Cut[] {
  return cuts.filter((_, i) => i === 0 || i === cuts.length - 1 || !rng.chance(p));
}

/** The back line of a row: straight at v, or a creek bank following bank(u). */
export type Back = { kind: "line"; v: number } | { kind: "bank"; bank: (u: number) => number };

const backV = (back: Back, u: number): number => (back.kind === "line" ? back.v : back.bank(u));

/** Ring of the lot between two cuts, fronting the street at vFront. */
export function lotRing(left: Cut, right: Cut, vFront: number, back: Back): Uv[] {
  const ring: Uv[] = [[left.f, vFront], [right.f, vFront], [right.b, backV(back, right.b)]];
  // Back lines are shared with the lots behind, whose corners differ: vertices on a common u lattice
  // keep both sides on the same bent line once warped (no slivers or overlaps).
  for (const u of samplesBetween(left.b, right.b).reverse()) ring.push([u, backV(back, u)]);
  ring.push([left.b, backV(back, left.b)]);
  return ring;
}

/** The inner rectangle of a lot (inside its skewed sides and off its back line). */
export function lotPlot(left: Cut, right: Cut, vFront: number, back: Back): Plot {
  const uL = Math.max(left.f, left.b);
  const uR = Math.min(right.f, right.b);
  const dir = Math.sign(backV(back, (uL + uR) / 2) - vFront);
  let vBack = backV(back, uL);
  for (const u of [uR, ...samplesBetween(uL, uR, 2)]) {
    const v = backV(back, u);
    vBack = dir > 0 ? Math.min(vBack, v) : Math.max(vBack, v);
  }
  return { uL, uR, vFront, vBack };
}

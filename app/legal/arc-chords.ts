import { countChords } from "~/geometry/densify";
import { addVec, crossVec, dotVec, rotateVec, subVec, type Vec2 } from "~/geometry/vec2";

/** How a circle's arc is chorded: finely near the lines that may cross it, coarsely elsewhere. */
export interface ChordPlan {
  /** Sagitta near any of `near` (units). */
  fine: number;
  /** Sagitta elsewhere (units); must stay well below `nearDistance`. */
  coarse: number;
  /** Segments (parcel edges) whose neighbourhood needs the fine chords. */
  near: [Vec2, Vec2][];
  /** A segment is near where it comes within this of the circle (units). */
  nearDistance: number;
}

/**
 * Points of the arc about `o` of radius `r` from `a` to `b` (the short way, so at most a half
 * turn), `a` and `b` included. Where a `near` segment passes within `nearDistance` of the circle the
 * chords keep a sagitta of `fine`; elsewhere `coarse`. A chord can leave the arc by at most its
 * sagitta (middle ordinate, Schofield & Breach §10.1), so away from every parcel line the coarse
 * chords cannot change which side of the right-of-way any parcel line lies on.
 */
export function chordArc(o: Vec2, r: number, a: Vec2, b: Vec2, plan: ChordPlan): Vec2[] {
  const va = subVec(a, o);
  const phi = Math.atan2(crossVec(va, subVec(b, o)), dotVec(va, subVec(b, o)));
  if (phi === 0) return [a, b];
  const fine = mergeIntervals(plan.near.flatMap((s) => nearFractions(o, r, va, phi, s, plan.nearDistance)));
  const out: Vec2[] = [a];
  let at = 0;
  const fill = (to: number, tol: number) => {
    if (!(to > at)) return;
    const n = countChords(r, Math.abs(phi) * (to - at), tol);
    for (let k = 1; k <= n; k++) out.push(addVec(o, rotateVec(va, phi * (at + ((to - at) * k) / n))));
    at = to;
  };
  for (const [lo, hi] of fine) {
    if (lo > at) fill(lo, plan.coarse);
    fill(hi, plan.fine);
  }
  if (at < 1) fill(1, plan.coarse);
  out[out.length - 1] = b;
  return out;
}

/**
 * Fractions [0, 1] of the arc's sweep within `d` of segment `s`: the angles the segment's part
 * inside the annulus r ± d spans, widened by d/r on each side (the arc within d of a point).
 */
function nearFractions(o: Vec2, r: number, va: Vec2, phi: number, s: [Vec2, Vec2], d: number): [number, number][] {
  const out: [number, number][] = [];
  const pad = d / r / Math.abs(phi);
  for (const [t0, t1] of annulusParts(o, r - d, r + d, s)) {
    const p = pointAt(s, t0);
    const q = pointAt(s, t1);
    const vp = subVec(p, o);
    const start = Math.atan2(crossVec(va, vp), dotVec(va, vp)) / phi;
    const sweep = Math.atan2(crossVec(vp, subVec(q, o)), dotVec(vp, subVec(q, o))) / phi;
    const lo = Math.max(0, Math.min(start, start + sweep) - pad);
    const hi = Math.min(1, Math.max(start, start + sweep) + pad);
    if (lo <= hi) out.push([lo, hi]);
  }
  return out;
}

/** Parameter ranges of segment `s` (0 at its start, 1 at its end) inside the annulus rIn ≤ |p − o| ≤ rOut. */
function annulusParts(o: Vec2, rIn: number, rOut: number, [a, b]: [Vec2, Vec2]): [number, number][] {
  const outer = insideDisc(o, rOut, a, b);
  if (!outer) return [];
  const inner = rIn > 0 ? insideDisc(o, rIn, a, b) : null;
  if (!inner || inner[1] <= outer[0] || inner[0] >= outer[1]) return [outer];
  const parts: [number, number][] = [];
  if (inner[0] > outer[0]) parts.push([outer[0], inner[0]]);
  if (inner[1] < outer[1]) parts.push([inner[1], outer[1]]);
  return parts;
}

/** The parameter range of segment a→b inside the disc |p − o| ≤ r (|p(t) − o|² is a convex quadratic in t). */
function insideDisc(o: Vec2, r: number, a: Vec2, b: Vec2): [number, number] | null {
  const d = subVec(b, a);
  const f = subVec(a, o);
  const A = dotVec(d, d);
  const B = dotVec(f, d);
  const C = dotVec(f, f) - r * r;
  const D = B * B - A * C;
  if (!(A > 0) || D < 0) return null;
  const root = Math.sqrt(D);
  const lo = Math.max(0, (-B - root) / A);
  const hi = Math.min(1, (-B + root) / A);
  return lo <= hi ? [lo, hi] : null;
}

function pointAt([a, b]: [Vec2, Vec2], t: number): Vec2 {
  return [a[0] + (b[0] - a[0]) * t, a[1] + (b[1] - a[1]) * t];
}

function mergeIntervals(list: [number, number][]): [number, number][] {
  const sorted = list.slice().sort((x, y) => x[0] - y[0]);
  const out: [number, number][] = [];
  for (const [lo, hi] of sorted) {
    const last = out[out.length - 1];
    if (last && lo <= last[1]) last[1] = Math.max(last[1], hi);
    else out.push([lo, hi]);
  }
  return out;
}

import type { CorridorPiece } from "./corridor-types";
import { segmentPieceIntervals, type TaggedInterval } from "./take-intervals";

/** Where a ring's boundary crosses the corridor boundary: edge, parameter, point and boundary tag. */
export interface RingCrossing {
  edge: number;
  t: number;
  tag: number;
  x: number;
  y: number;
}

/** A stretch of the ring outside the corridor, from where it leaves (`exit`) to where it re-enters (`entry`). */
export interface RingRun {
  exit: RingCrossing;
  entry: RingCrossing;
}

/** The outside stretches of a ring; `state` says whether it crosses, or lies wholly inside or outside. */
export interface RingWalk {
  runs: RingRun[];
  state: "crossing" | "inside" | "outside";
}

/** A stretch of the ring inside the corridor, from (e0, t0) to (e1, t1) going forward. */
interface Stretch {
  e0: number;
  t0: number;
  tag0: number;
  e1: number;
  t1: number;
  tag1: number;
}

/**
 * Walks a flat ring's edges, finds the parts inside the corridor pieces (merged across pieces and
 * edges; gaps and touches shorter than `eps` units are round-off and closed up) and returns the
 * stretches in between as runs, in ring order.
 */
export function walkRing(ring: ArrayLike<number>, pieces: CorridorPiece[], eps = 1e-9): RingWalk {
  const n = ring.length;
  const lengths: number[] = [];
  for (let i = 0; i < n; i += 2) {
    const dx = ring[(i + 2) % n]! - ring[i]!;
    const dy = ring[(i + 3) % n]! - ring[i + 1]!;
    lengths.push(Math.sqrt(dx * dx + dy * dy));
  }
  const stretches: Stretch[] = [];
  const ivs: TaggedInterval[] = [];
  for (let e = 0; e < lengths.length; e++) {
    if (lengths[e] === 0) continue;
    ivs.length = 0;
    const px = ring[2 * e]!;
    const py = ring[2 * e + 1]!;
    const qx = ring[(2 * e + 2) % n]!;
    const qy = ring[(2 * e + 3) % n]!;
    const x0 = Math.min(px, qx);
    const x1 = Math.max(px, qx);
    const y0 = Math.min(py, qy);
    const y1 = Math.max(py, qy);
    for (const p of pieces) {
      const pb = p.bounds;
      if (pb[0] <= x1 && x0 <= pb[2] && pb[1] <= y1 && y0 <= pb[3]) segmentPieceIntervals(px, py, qx, qy, p, ivs);
    }
    if (ivs.length > 1) ivs.sort(byStart);
    for (const iv of ivs) append(stretches, e, iv, lengths, eps);
  }
  if (stretches.length > 1 && along(lengths, stretches[stretches.length - 1]!, stretches[0]!, eps, true) <= eps) {
    const last = stretches.pop()!;
    const first = stretches[0]!;
    first.e0 = last.e0;
    first.t0 = last.t0;
    first.tag0 = last.tag0;
  }
  const kept = stretches.filter((s) => stretchLength(lengths, s, eps) > eps);
  if (kept.length === 0) return { runs: [], state: "outside" };
  if (kept.length === 1 && along(lengths, kept[0]!, kept[0]!, eps, true) <= eps) return { runs: [], state: "inside" };
  const runs = kept.map((s, k): RingRun => {
    const next = kept[(k + 1) % kept.length]!;
    return { exit: crossingAt(ring, s.e1, s.t1, s.tag1), entry: crossingAt(ring, next.e0, next.t0, next.tag0) };
  });
  return { runs, state: "crossing" };
}

const byStart = (a: TaggedInterval, b: TaggedInterval) => a.t0 - b.t0;

/** Adds edge e's inside interval to the stretches, merging it into the last one across a gap ≤ eps. */
function append(list: Stretch[], e: number, iv: TaggedInterval, lengths: number[], eps: number): void {
  const last = list[list.length - 1];
  const gap = last ? (last.e1 === e ? (iv.t0 - last.t1) * lengths[e]! : gapTo(lengths, last, e, iv.t0, eps)) : Infinity;
  if (!last || gap > eps) {
    list.push({ e0: e, t0: iv.t0, tag0: iv.tag0, e1: e, t1: iv.t1, tag1: iv.tag1 });
    return;
  }
  if (e !== last.e1 || iv.t1 > last.t1) {
    last.e1 = e;
    last.t1 = iv.t1;
    last.tag1 = iv.tag1;
  }
}

/** Distance along the ring from the end of `a` (on an earlier edge) to parameter t0 on edge e. */
function gapTo(lengths: number[], a: Stretch, e: number, t0: number, cap: number): number {
  let d = (1 - a.t1) * lengths[a.e1]!;
  for (let k = (a.e1 + 1) % lengths.length; k !== e && d <= cap; k = (k + 1) % lengths.length) d += lengths[k]!;
  return d + t0 * lengths[e]!;
}

/**
 * Distance along the ring from the end of `a` forward to the start of `b`: negative when `b`
 * overlaps `a` on the same edge (never when `wrap`, where b may lie before a and the way goes
 * round the ring). Stops adding once past `cap`, since only "≤ eps" is ever asked.
 */
function along(lengths: number[], a: Stretch, b: Stretch, cap: number, wrap = false): number {
  if (a.e1 === b.e0 && (!wrap || b.t0 >= a.t1)) return (b.t0 - a.t1) * lengths[a.e1]!;
  let d = (1 - a.t1) * lengths[a.e1]!;
  for (let e = (a.e1 + 1) % lengths.length; e !== b.e0 && d <= cap; e = (e + 1) % lengths.length) d += lengths[e]!;
  return d + b.t0 * lengths[b.e0]!;
}

function stretchLength(lengths: number[], s: Stretch, cap: number): number {
  if (s.e0 === s.e1 && s.t1 >= s.t0) return (s.t1 - s.t0) * lengths[s.e0]!;
  let d = (1 - s.t0) * lengths[s.e0]!;
  for (let e = (s.e0 + 1) % lengths.length; e !== s.e1 && d <= cap; e = (e + 1) % lengths.length) d += lengths[e]!;
  return d + s.t1 * lengths[s.e1]!;
}

function crossingAt(ring: ArrayLike<number>, edge: number, t: number, tag: number): RingCrossing {
  const n = ring.length;
  const px = ring[2 * edge]!;
  const py = ring[2 * edge + 1]!;
  return { edge, t, tag, x: px + (ring[(2 * edge + 2) % n]! - px) * t, y: py + (ring[(2 * edge + 3) % n]! - py) * t };
}

import type { Bounds, CorridorPiece } from "./corridor-types";
import { boundsOverlap } from "./corridor-pieces";
import { segmentPieceIntervals, type Interval } from "./take-intervals";

/**
 * Number of maximal stretches of a ring's boundary that lie outside the corridor, going once
 * around (0 when the whole ring is inside, 1 when it never enters). Every connected piece of
 * (polygon − corridor) touches the polygon's boundary outside the corridor — the corridor has no
 * holes — so this counts an upper bound on the remainder pieces; a total of 1 means exactly one.
 * Gaps and stretches shorter than `1e-9` units are round-off and are closed up.
 */
export function countOutsideRuns(ring: ArrayLike<number>, pieces: CorridorPiece[]): number {
  const n = ring.length;
  let runs = 0;
  let firstAtStart = false;
  let endedAtOne = false;
  let anyInside = false;
  const ivs: Interval[] = [];
  for (let i = 0; i < n; i += 2) {
    const px = ring[i]!;
    const py = ring[i + 1]!;
    const qx = ring[(i + 2) % n]!;
    const qy = ring[(i + 3) % n]!;
    const len = Math.hypot(qx - px, qy - py);
    if (len === 0) continue;
    ivs.length = 0;
    const b: Bounds = [Math.min(px, qx), Math.min(py, qy), Math.max(px, qx), Math.max(py, qy)];
    for (const p of pieces) if (boundsOverlap(p.bounds, b)) segmentPieceIntervals(px, py, qx, qy, p, ivs);
    const outside = complementOf(ivs, 1e-9 / len);
    if (outside.length === 0 || outside.length > 1 || outside[0]![0] > 0 || outside[0]![1] < 1) anyInside = true;
    for (const o of outside) {
      if (!(o[0] === 0 && endedAtOne)) runs++;
      if (i === 0 && o[0] === 0) firstAtStart = true;
      endedAtOne = o[1] === 1;
    }
    if (outside.length === 0) endedAtOne = false;
  }
  if (!anyInside) return 1;
  return firstAtStart && endedAtOne && runs > 1 ? runs - 1 : runs;
}

/** The parts of [0, 1] outside the union of `inside`, closing gaps and dropping parts shorter than `eps`. */
function complementOf(inside: Interval[], eps: number): Interval[] {
  inside.sort((a, b) => a[0] - b[0]);
  const out: Interval[] = [];
  let at = 0;
  for (const [a, b] of inside) {
    if (a - at > eps) out.push([at, a]);
    if (b > at) at = b;
  }
  if (1 - at > eps) out.push([at, 1]);
  return out;
}

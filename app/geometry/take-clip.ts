/**
 * Sutherland–Hodgman clipping of a ring against a convex polygon (Sutherland & Hodgman,
 * "Reentrant polygon clipping", CACM 17(1), 1974). A concave subject ring comes out as one ring
 * that may run back and forth along the clip edges; those degenerate edges cancel in any signed
 * per-edge integral (shoelace area, the disc formula), so areas stay exact.
 */

/** A clipped ring in a scratch buffer: flat `[x0, y0, …]` in `data[0 .. length)`. Valid until the next clip. */
export interface ClippedRing {
  data: Float64Array;
  length: number;
}

let bufA = new Float64Array(64);
let bufB = new Float64Array(64);
const result: ClippedRing = { data: bufA, length: 0 };

/**
 * Clips flat ring `ring` (absolute coordinates), shifted by −(ox, oy), against the convex
 * counter-clockwise flat polygon `clip` (relative coordinates). The result is relative and lives
 * in a shared scratch buffer: use it before clipping again.
 */
export function clipRingConvex(ring: ArrayLike<number>, ox: number, oy: number, clip: ArrayLike<number>): ClippedRing {
  const m = clip.length;
  let n = ring.length;
  grow(2 * n + 4);
  let src = bufA;
  let dst = bufB;
  for (let i = 0; i < n; i += 2) {
    src[i] = ring[i]! - ox;
    src[i + 1] = ring[i + 1]! - oy;
  }
  for (let k = 0; k < m && n > 0; k += 2) {
    const ax = clip[k]!;
    const ay = clip[k + 1]!;
    const ex = clip[(k + 2) % m]! - ax;
    const ey = clip[(k + 3) % m]! - ay;
    if (dst.length < 2 * n + 4) {
      // Each step at most doubles the vertices (every vertex plus one crossing); grow and keep src.
      const kept = src.slice(0, n);
      grow(2 * n + 4);
      src = bufA;
      dst = bufB;
      src.set(kept);
    }
    n = clipByEdge(src, n, dst, ax, ay, ex, ey);
    const t = src;
    src = dst;
    dst = t;
  }
  result.data = src;
  result.length = n;
  return result;
}

function grow(size: number): void {
  if (bufA.length >= size) return;
  bufA = new Float64Array(2 * size);
  bufB = new Float64Array(2 * size);
}

/** Writes into `out` the part of `input[0..n)` left of the line a + t·e (cross(e, p − a) ≥ 0); returns its length. */
function clipByEdge(input: Float64Array, n: number, out: Float64Array, ax: number, ay: number, ex: number, ey: number): number {
  let k = 0;
  let px = input[n - 2]!;
  let py = input[n - 1]!;
  let pd = ex * (py - ay) - ey * (px - ax);
  for (let i = 0; i < n; i += 2) {
    const qx = input[i]!;
    const qy = input[i + 1]!;
    const qd = ex * (qy - ay) - ey * (qx - ax);
    if ((qd >= 0) !== (pd >= 0)) {
      const t = pd / (pd - qd);
      out[k++] = px + (qx - px) * t;
      out[k++] = py + (qy - py) * t;
    }
    if (qd >= 0) {
      out[k++] = qx;
      out[k++] = qy;
    }
    px = qx;
    py = qy;
    pd = qd;
  }
  return k;
}

/** Signed shoelace area of a clipped ring. */
export function clippedArea(c: ClippedRing): number {
  const d = c.data;
  const n = c.length;
  if (n < 6) return 0;
  let s = 0;
  let px = d[n - 2]!;
  let py = d[n - 1]!;
  for (let i = 0; i < n; i += 2) {
    s += px * d[i + 1]! - d[i]! * py;
    px = d[i]!;
    py = d[i + 1]!;
  }
  return s / 2;
}

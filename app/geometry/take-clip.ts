/**
 * Sutherland–Hodgman clipping of a ring against a convex polygon (Sutherland & Hodgman,
 * "Reentrant polygon clipping", CACM 17(1), 1974). A concave subject ring comes out as one ring
 * that may run back and forth along the clip edges; those degenerate edges cancel in any signed
 * per-edge integral (shoelace area, the disc formula), so areas stay exact.
 */

/**
 * Clips flat ring `ring` (absolute coordinates), shifted by −(ox, oy), against the convex
 * counter-clockwise flat polygon `clip` (relative coordinates). Returns a flat ring, relative.
 */
export function clipRingConvex(ring: ArrayLike<number>, ox: number, oy: number, clip: ArrayLike<number>): number[] {
  let input: number[] = new Array<number>(ring.length);
  for (let i = 0; i < ring.length; i += 2) {
    input[i] = ring[i]! - ox;
    input[i + 1] = ring[i + 1]! - oy;
  }
  const m = clip.length;
  for (let k = 0; k < m && input.length > 0; k += 2) {
    const ax = clip[k]!;
    const ay = clip[k + 1]!;
    const ex = clip[(k + 2) % m]! - ax;
    const ey = clip[(k + 3) % m]! - ay;
    input = clipByEdge(input, ax, ay, ex, ey);
  }
  return input;
}

/** Keeps the part of `input` left of the directed line a + t·e (cross(e, p − a) ≥ 0). */
function clipByEdge(input: number[], ax: number, ay: number, ex: number, ey: number): number[] {
  const out: number[] = [];
  const n = input.length;
  let px = input[n - 2]!;
  let py = input[n - 1]!;
  let pd = ex * (py - ay) - ey * (px - ax);
  for (let i = 0; i < n; i += 2) {
    const qx = input[i]!;
    const qy = input[i + 1]!;
    const qd = ex * (qy - ay) - ey * (qx - ax);
    if (qd >= 0) {
      if (pd < 0) pushCrossing(out, px, py, pd, qx, qy, qd);
      out.push(qx, qy);
    } else if (pd >= 0) {
      pushCrossing(out, px, py, pd, qx, qy, qd);
    }
    px = qx;
    py = qy;
    pd = qd;
  }
  return out;
}

function pushCrossing(out: number[], px: number, py: number, pd: number, qx: number, qy: number, qd: number): void {
  const t = pd / (pd - qd);
  out.push(px + (qx - px) * t, py + (qy - py) * t);
}

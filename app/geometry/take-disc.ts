/**
 * Exact area of a polygon inside a disc by the per-edge formula: the signed area of
 * triangle(centre, p, q) ∩ disc summed over the edges p → q (the standard decomposition of a
 * polygon into signed triangles from a common vertex, as for the shoelace formula). Each edge is
 * split where it crosses the circle; a part inside contributes ½·(p × q), a part outside the
 * sector ½r²·∠(p, q). Exact up to round-off: no chords.
 */

/**
 * Signed area of (flat ring `ring[0 .. n)`, coordinates relative to the disc centre after adding
 * (dx, dy)) ∩ disc of radius `r`. Counter-clockwise rings are positive.
 */
export function ringDiscArea(ring: ArrayLike<number>, n: number, r: number, dx = 0, dy = 0): number {
  if (n < 6) return 0;
  const r2 = r * r;
  let sum = 0;
  let px = ring[n - 2]! + dx;
  let py = ring[n - 1]! + dy;
  for (let i = 0; i < n; i += 2) {
    const qx = ring[i]! + dx;
    const qy = ring[i + 1]! + dy;
    sum += edgeDiscArea(px, py, qx, qy, r2);
    px = qx;
    py = qy;
  }
  return sum / 2;
}

/** Twice the signed area of triangle(0, p, q) ∩ disc(r² = r2). */
function edgeDiscArea(px: number, py: number, qx: number, qy: number, r2: number): number {
  const ex = qx - px;
  const ey = qy - py;
  const a = ex * ex + ey * ey;
  if (a === 0) return 0;
  const b = px * ex + py * ey;
  const c = px * px + py * py - r2;
  const disc = b * b - a * c;
  if (disc <= 0) return r2 * angle(px, py, qx, qy);
  const s = Math.sqrt(disc);
  const t1 = Math.min(1, Math.max(0, (-b - s) / a));
  const t2 = Math.min(1, Math.max(0, (-b + s) / a));
  const ax = px + ex * t1;
  const ay = py + ey * t1;
  const bx = px + ex * t2;
  const by = py + ey * t2;
  let twice = ax * by - ay * bx;
  if (t1 > 0) twice += r2 * angle(px, py, ax, ay);
  if (t2 < 1) twice += r2 * angle(bx, by, qx, qy);
  return twice;
}

/** Signed angle from direction p to direction q, radians in (−π, π]. */
function angle(px: number, py: number, qx: number, qy: number): number {
  return Math.atan2(px * qy - py * qx, px * qx + py * qy);
}

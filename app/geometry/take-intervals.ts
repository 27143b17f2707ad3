import type { AnnularPiece, CorridorPiece, QuadPiece } from "./corridor-types";

/** A parameter interval [t0, t1] ⊆ [0, 1] along a segment p + t·(q − p). */
export type Interval = [number, number];

/**
 * The parts of segment p → q (absolute coordinates) inside a piece, as parameter intervals.
 * A quad: Cyrus–Beck clipping against its four edges (Cyrus & Beck, "Generalized two- and
 * three-dimensional clipping", Computers & Graphics 3(1), 1978). A slice: the same against the
 * wedge's two rays, then inside the outer circle and outside the inner one (roots of |x − c|² = r²).
 */
export function segmentPieceIntervals(px: number, py: number, qx: number, qy: number, piece: CorridorPiece, out: Interval[]): void {
  if (piece.kind === "quad") {
    const iv = quadInterval(px, py, qx, qy, piece);
    if (iv) out.push(iv);
    return;
  }
  annularIntervals(px, py, qx, qy, piece, out);
}

function quadInterval(px: number, py: number, qx: number, qy: number, piece: QuadPiece): Interval | null {
  const o = piece.corners[0];
  const ax = px - o[0];
  const ay = py - o[1];
  const dx = qx - px;
  const dy = qy - py;
  let t0 = 0;
  let t1 = 1;
  const l = piece.local;
  for (let k = 0; k < 8; k += 2) {
    const ex = l[(k + 2) % 8]! - l[k]!;
    const ey = l[(k + 3) % 8]! - l[k + 1]!;
    const f0 = ex * (ay - l[k + 1]!) - ey * (ax - l[k]!);
    const fd = ex * dy - ey * dx;
    [t0, t1] = halfPlane(t0, t1, f0, fd);
    if (t0 > t1) return null;
  }
  return [t0, t1];
}

/** Narrows [t0, t1] to where f0 + t·fd ≥ 0. */
function halfPlane(t0: number, t1: number, f0: number, fd: number): [number, number] {
  if (fd === 0) return f0 >= 0 ? [t0, t1] : [1, 0];
  const t = -f0 / fd;
  return fd > 0 ? [Math.max(t0, t), t1] : [t0, Math.min(t1, t)];
}

function annularIntervals(px: number, py: number, qx: number, qy: number, piece: AnnularPiece, out: Interval[]): void {
  const ax = px - piece.center[0];
  const ay = py - piece.center[1];
  const dx = qx - px;
  const dy = qy - py;
  const [u1, u2] = piece.turn > 0 ? [piece.rayFrom, piece.rayTo] : [piece.rayTo, piece.rayFrom];
  let [t0, t1] = halfPlane(0, 1, u1[0] * ay - u1[1] * ax, u1[0] * dy - u1[1] * dx);
  [t0, t1] = halfPlane(t0, t1, ax * u2[1] - ay * u2[0], dx * u2[1] - dy * u2[0]);
  if (t0 > t1) return;
  const outer = circleInterval(ax - piece.outer.center[0], ay - piece.outer.center[1], dx, dy, piece.outer.radius);
  if (!outer) return;
  const lo = Math.max(t0, outer[0]);
  const hi = Math.min(t1, outer[1]);
  if (lo > hi) return;
  const inner = circleInterval(ax - piece.inner.center[0], ay - piece.inner.center[1], dx, dy, piece.inner.radius);
  if (!inner || inner[1] <= lo || inner[0] >= hi) {
    out.push([lo, hi]);
    return;
  }
  if (inner[0] > lo) out.push([lo, inner[0]]);
  if (inner[1] < hi) out.push([inner[1], hi]);
}

/** Parameters (unclamped) where a + t·d is inside the circle of radius r about the origin. */
export function circleInterval(ax: number, ay: number, dx: number, dy: number, r: number): Interval | null {
  const a = dx * dx + dy * dy;
  const b = ax * dx + ay * dy;
  const c = ax * ax + ay * ay - r * r;
  if (a === 0) return c <= 0 ? [0, 1] : null;
  const disc = b * b - a * c;
  if (disc < 0) return null;
  const s = Math.sqrt(disc);
  return [(-b - s) / a, (-b + s) / a];
}

import type { AnnularPiece, CorridorPiece, QuadPiece } from "./corridor-types";

/**
 * A parameter interval [t0, t1] ⊆ [0, 1] of a segment p + t·(q − p) inside a piece, with the piece
 * boundary each end lies on: `tag` = piece index × 4 + side (0 right line, 1 end cut, 2 left line,
 * 3 start cut), or −1 when the end is the segment's own end point inside the piece.
 */
export interface TaggedInterval {
  t0: number;
  t1: number;
  tag0: number;
  tag1: number;
}

export const SIDE_RIGHT = 0;
export const SIDE_END = 1;
export const SIDE_LEFT = 2;
export const SIDE_START = 3;

/**
 * The parts of segment p → q (absolute coordinates) inside a piece. A quad: Cyrus–Beck clipping
 * against its four edges (Cyrus & Beck, "Generalized two- and three-dimensional clipping",
 * Computers & Graphics 3(1), 1978). A slice: the same against the wedge's two rays, then inside the
 * outer circle and outside the inner one (roots of |x − c|² = r²).
 */
export function segmentPieceIntervals(px: number, py: number, qx: number, qy: number, piece: CorridorPiece, out: TaggedInterval[]): void {
  if (piece.kind === "quad") quadInterval(px, py, qx, qy, piece, out);
  else annularIntervals(px, py, qx, qy, piece, out);
}

function quadInterval(px: number, py: number, qx: number, qy: number, piece: QuadPiece, out: TaggedInterval[]): void {
  const o = piece.corners[0];
  const ax = px - o[0];
  const ay = py - o[1];
  const dx = qx - px;
  const dy = qy - py;
  const iv: TaggedInterval = { t0: 0, t1: 1, tag0: -1, tag1: -1 };
  const l = piece.local;
  for (let k = 0; k < 8; k += 2) {
    const ex = l[(k + 2) % 8]! - l[k]!;
    const ey = l[(k + 3) % 8]! - l[k + 1]!;
    if (!halfPlane(iv, ex * (ay - l[k + 1]!) - ey * (ax - l[k]!), ex * dy - ey * dx, piece.index * 4 + k / 2)) return;
  }
  out.push(iv);
}

/** Narrows `iv` to where f0 + t·fd ≥ 0, recording `tag` at the end it moves; false when empty. */
function halfPlane(iv: TaggedInterval, f0: number, fd: number, tag: number): boolean {
  if (fd === 0) return f0 >= 0 && iv.t0 <= iv.t1;
  const t = -f0 / fd;
  if (fd > 0 && t > iv.t0) {
    iv.t0 = t;
    iv.tag0 = tag;
  } else if (fd < 0 && t < iv.t1) {
    iv.t1 = t;
    iv.tag1 = tag;
  }
  return iv.t0 <= iv.t1;
}

function annularIntervals(px: number, py: number, qx: number, qy: number, piece: AnnularPiece, out: TaggedInterval[]): void {
  const ax = px - piece.center[0];
  const ay = py - piece.center[1];
  const dx = qx - px;
  const dy = qy - py;
  const left = piece.turn > 0;
  const [u1, u2] = left ? [piece.rayFrom, piece.rayTo] : [piece.rayTo, piece.rayFrom];
  const base = piece.index * 4;
  const iv: TaggedInterval = { t0: 0, t1: 1, tag0: -1, tag1: -1 };
  if (!halfPlane(iv, u1[0] * ay - u1[1] * ax, u1[0] * dy - u1[1] * dx, base + (left ? SIDE_START : SIDE_END))) return;
  if (!halfPlane(iv, ax * u2[1] - ay * u2[0], dx * u2[1] - dy * u2[0], base + (left ? SIDE_END : SIDE_START))) return;
  const outer = circleInterval(ax - piece.outer.center[0], ay - piece.outer.center[1], dx, dy, piece.outer.radius);
  if (!outer) return;
  const outerTag = base + (left ? SIDE_RIGHT : SIDE_LEFT);
  const innerTag = base + (left ? SIDE_LEFT : SIDE_RIGHT);
  if (outer[0] > iv.t0) [iv.t0, iv.tag0] = [outer[0], outerTag];
  if (outer[1] < iv.t1) [iv.t1, iv.tag1] = [outer[1], outerTag];
  if (iv.t0 > iv.t1) return;
  const inner = circleInterval(ax - piece.inner.center[0], ay - piece.inner.center[1], dx, dy, piece.inner.radius);
  if (!inner || inner[1] <= iv.t0 || inner[0] >= iv.t1) {
    out.push(iv);
    return;
  }
  if (inner[0] > iv.t0) out.push({ t0: iv.t0, t1: inner[0], tag0: iv.tag0, tag1: innerTag });
  if (inner[1] < iv.t1) out.push({ t0: inner[1], t1: iv.t1, tag0: innerTag, tag1: iv.tag1 });
}

/** Parameters (unclamped) where a + t·d is inside the circle of radius r about the origin. */
export function circleInterval(ax: number, ay: number, dx: number, dy: number, r: number): [number, number] | null {
  const a = dx * dx + dy * dy;
  const b = ax * dx + ay * dy;
  const c = ax * ax + ay * ay - r * r;
  if (a === 0) return c <= 0 ? [0, 1] : null;
  const disc = b * b - a * c;
  if (disc < 0) return null;
  const s = Math.sqrt(disc);
  return [(-b - s) / a, (-b + s) / a];
}

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
  scratch.t0 = 0;
  scratch.t1 = 1;
  scratch.tag0 = -1;
  scratch.tag1 = -1;
  const l = piece.local;
  for (let k = 0; k < 8; k += 2) {
    const ex = l[(k + 2) % 8]! - l[k]!;
    const ey = l[(k + 3) % 8]! - l[k + 1]!;
    if (!halfPlane(scratch, ex * (ay - l[k + 1]!) - ey * (ax - l[k]!), ex * dy - ey * dx, piece.index * 4 + k / 2)) return;
  }
  out.push({ ...scratch });
}

/** Working interval of `quadInterval`, copied out only when the segment meets the quad. */
const scratch: TaggedInterval = { t0: 0, t1: 1, tag0: -1, tag1: -1 };

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
  const u1 = left ? piece.rayFrom : piece.rayTo;
  const u2 = left ? piece.rayTo : piece.rayFrom;
  const base = piece.index * 4;
  const iv: TaggedInterval = { t0: 0, t1: 1, tag0: -1, tag1: -1 };
  if (!halfPlane(iv, u1[0] * ay - u1[1] * ax, u1[0] * dy - u1[1] * dx, base + (left ? SIDE_START : SIDE_END))) return;
  if (!halfPlane(iv, ax * u2[1] - ay * u2[0], dx * u2[1] - dy * u2[0], base + (left ? SIDE_END : SIDE_START))) return;
  const outer = piece.outer;
  if (!circleRoots(ax - outer.center[0], ay - outer.center[1], dx, dy, outer.radius)) return;
  const outerTag = base + (left ? SIDE_RIGHT : SIDE_LEFT);
  const innerTag = base + (left ? SIDE_LEFT : SIDE_RIGHT);
  if (roots[0] > iv.t0) {
    iv.t0 = roots[0];
    iv.tag0 = outerTag;
  }
  if (roots[1] < iv.t1) {
    iv.t1 = roots[1];
    iv.tag1 = outerTag;
  }
  if (iv.t0 > iv.t1) return;
  const inner = piece.inner;
  if (!circleRoots(ax - inner.center[0], ay - inner.center[1], dx, dy, inner.radius) || roots[1] <= iv.t0 || roots[0] >= iv.t1) {
    out.push(iv);
    return;
  }
  if (roots[0] > iv.t0) out.push({ t0: iv.t0, t1: roots[0], tag0: iv.tag0, tag1: innerTag });
  if (roots[1] < iv.t1) out.push({ t0: roots[1], t1: iv.t1, tag0: innerTag, tag1: iv.tag1 });
}

/** The last roots found by `circleRoots` (reused, so the hot loop allocates nothing). */
const roots: [number, number] = [0, 0];

/** Writes into `roots` the parameters where a + t·d is inside the circle of radius r about the origin; false if nowhere. */
function circleRoots(ax: number, ay: number, dx: number, dy: number, r: number): boolean {
  const a = dx * dx + dy * dy;
  const b = ax * dx + ay * dy;
  const c = ax * ax + ay * ay - r * r;
  if (a === 0) {
    roots[0] = 0;
    roots[1] = 1;
    return c <= 0;
  }
  const disc = b * b - a * c;
  if (disc < 0) return false;
  const s = Math.sqrt(disc);
  roots[0] = (-b - s) / a;
  roots[1] = (-b + s) / a;
  return true;
}

import type { AnnularPiece, CorridorPiece, QuadPiece } from "./corridor-types";
import type { ClippedRing } from "./take-clip";

/**
 * A station span kept relative to pieces — each end is [index in a list of pieces, distance along
 * that piece] — so that a cached span stays exact when the pieces' stations shift: the stations
 * are `pieces[k].stationFrom + along`, the same sum in a cached and in a fresh computation.
 */
export interface RelativeSpan {
  from: [number, number];
  to: [number, number];
}

/** Internal stations of a relative span on the given pieces. */
export function spanStations(span: RelativeSpan, pieces: CorridorPiece[]): [number, number] {
  return [pieces[span.from[0]]!.stationFrom + span.from[1], pieces[span.to[0]]!.stationFrom + span.to[1]];
}

/**
 * Extremes of distance along a piece (from its `stationFrom`) reached by a clipped ring inside
 * it, added to `span`. A quad: the clipped vertices projected on the tangent. A slice: the angles,
 * from the slice's first ray, of the clipped vertices inside the annulus and of the points where
 * clipped edges cross either circle — the extremes of the region's angle lie among them.
 * Coordinates are relative to the piece (its first corner, or its centre).
 */
export function extendQuadSpan(c: ClippedRing, piece: QuadPiece, span: [number, number]): void {
  const len = piece.length;
  const ux = piece.along[0];
  const uy = piece.along[1];
  const offset = piece.along[2];
  const d = c.data;
  for (let i = 0; i < c.length; i += 2) {
    const along = Math.min(len, Math.max(0, d[i]! * ux + d[i + 1]! * uy + offset));
    include(span, along);
  }
}

export function extendAnnularSpan(c: ClippedRing, piece: AnnularPiece, span: [number, number]): void {
  const d = c.data;
  const n = c.length;
  for (let i = 0; i < n; i += 2) {
    const px = d[i]!;
    const py = d[i + 1]!;
    if (inAnnulus(piece, px, py)) include(span, stationAtPoint(piece, px, py));
    const dx = d[(i + 2) % n]! - px;
    const dy = d[(i + 3) % n]! - py;
    crossings(piece, piece.outer, px, py, dx, dy, span);
    crossings(piece, piece.inner, px, py, dx, dy, span);
  }
}

/** Adds the stations where segment p + t·d (0 ≤ t ≤ 1) crosses a side circle inside the annulus. */
function crossings(piece: AnnularPiece, side: AnnularPiece["outer"], px: number, py: number, dx: number, dy: number, span: [number, number]): void {
  const ax = px - side.center[0];
  const ay = py - side.center[1];
  const a = dx * dx + dy * dy;
  if (a === 0) return;
  const b = ax * dx + ay * dy;
  const disc = b * b - a * (ax * ax + ay * ay - side.radius * side.radius);
  if (disc < 0) return;
  const s = Math.sqrt(disc);
  crossingAt(piece, px, py, dx, dy, (-b - s) / a, span);
  crossingAt(piece, px, py, dx, dy, (-b + s) / a, span);
}

function crossingAt(piece: AnnularPiece, px: number, py: number, dx: number, dy: number, t: number, span: [number, number]): void {
  const x = px + t * dx;
  const y = py + t * dy;
  if (t >= 0 && t <= 1 && inAnnulus(piece, x, y)) include(span, stationAtPoint(piece, x, y));
}

function inAnnulus(piece: AnnularPiece, x: number, y: number): boolean {
  const o = piece.outer;
  const i = piece.inner;
  const slack = 1e-9 * o.radius;
  const ox = x - o.center[0];
  const oy = y - o.center[1];
  const ix = x - i.center[0];
  const iy = y - i.center[1];
  const ro = o.radius + slack;
  const ri = Math.max(0, i.radius - slack);
  return ox * ox + oy * oy <= ro * ro && ix * ix + iy * iy >= ri * ri;
}

/** Distance along the centreline from the slice's first ray to the angle of a point (relative to the centre). */
function stationAtPoint(piece: AnnularPiece, x: number, y: number): number {
  const fx = piece.rayFrom[0];
  const fy = piece.rayFrom[1];
  const theta = piece.turn * Math.atan2(fx * y - fy * x, fx * x + fy * y);
  const q = Math.min(1, Math.max(0, theta / piece.sweepRad));
  return q * piece.length;
}

function include(span: [number, number], s: number): void {
  if (s < span[0]) span[0] = s;
  if (s > span[1]) span[1] = s;
}

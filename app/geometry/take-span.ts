import type { AnnularPiece, CorridorPiece, QuadPiece } from "./corridor-types";
import { clipRingConvex } from "./take-clip";
import { circleInterval } from "./take-intervals";
import type { PreparedPolygon } from "./take-shapes";

/**
 * Stations (internal) of the centreline between which the polygon's part inside `piece` lies,
 * or null when it has none. A quad: the clipped vertices projected on the tangent. A slice: the
 * angles, from the slice's first ray, of the clipped vertices inside the annulus and of the points
 * where clipped edges cross either circle — the extremes of the region's angle lie among them.
 */
export function pieceStationSpan(polygons: PreparedPolygon[], piece: CorridorPiece): [number, number] | null {
  const span: [number, number] = [Infinity, -Infinity];
  for (const polygon of polygons) {
    for (const ring of polygon.rings) {
      if (piece.kind === "quad") quadSpan(ring, piece, span);
      else annularSpan(ring, piece, span);
    }
  }
  return span[0] <= span[1] ? span : null;
}

function quadSpan(ring: number[], piece: QuadPiece, span: [number, number]): void {
  const o = piece.corners[0];
  const clipped = clipRingConvex(ring, o[0], o[1], piece.local);
  const len = piece.stationTo - piece.stationFrom;
  const [ux, uy] = piece.direction;
  const bx = o[0] - piece.axisOrigin[0];
  const by = o[1] - piece.axisOrigin[1];
  for (let i = 0; i < clipped.length; i += 2) {
    const along = Math.min(len, Math.max(0, (clipped[i]! + bx) * ux + (clipped[i + 1]! + by) * uy));
    include(span, piece.stationFrom + along);
  }
}

function annularSpan(ring: number[], piece: AnnularPiece, span: [number, number]): void {
  const c = piece.center;
  const clipped = clipRingConvex(ring, c[0], c[1], piece.wedge);
  const n = clipped.length;
  const add = (x: number, y: number) => include(span, stationAtPoint(piece, x, y));
  for (let i = 0; i < n; i += 2) {
    const px = clipped[i]!;
    const py = clipped[i + 1]!;
    if (inAnnulus(piece, px, py)) add(px, py);
    const dx = clipped[(i + 2) % n]! - px;
    const dy = clipped[(i + 3) % n]! - py;
    for (const side of [piece.outer, piece.inner]) {
      const iv = circleInterval(px - side.center[0], py - side.center[1], dx, dy, side.radius);
      if (!iv) continue;
      for (const t of iv) if (t >= 0 && t <= 1 && inAnnulus(piece, px + t * dx, py + t * dy)) add(px + t * dx, py + t * dy);
    }
  }
}

function inAnnulus(piece: AnnularPiece, x: number, y: number): boolean {
  const o = piece.outer;
  const i = piece.inner;
  const slack = 1e-9 * o.radius;
  return Math.hypot(x - o.center[0], y - o.center[1]) <= o.radius + slack && Math.hypot(x - i.center[0], y - i.center[1]) >= i.radius - slack;
}

/** Station of the centreline at the angle of a point (relative to the centre) from the first ray. */
function stationAtPoint(piece: AnnularPiece, x: number, y: number): number {
  const [fx, fy] = piece.rayFrom;
  const theta = piece.turn * Math.atan2(fx * y - fy * x, fx * x + fy * y);
  const q = Math.min(1, Math.max(0, theta / piece.sweepRad));
  return piece.stationFrom + q * (piece.stationTo - piece.stationFrom);
}

function include(span: [number, number], s: number): void {
  if (s < span[0]) span[0] = s;
  if (s > span[1]) span[1] = s;
}

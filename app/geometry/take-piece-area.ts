import type { CorridorPiece } from "./corridor-types";
import { flatRingArea } from "./corridor-pieces";
import { clipRingConvex } from "./take-clip";
import { ringDiscArea } from "./take-disc";
import type { PreparedPolygon } from "./take-shapes";

/**
 * Exact area of (polygon ∩ piece), square units. A quad: Sutherland–Hodgman clip of every ring
 * against the convex quad, then the shoelace formula (holes are clockwise, so they subtract). An
 * annular slice: area(P ∩ wedge ∩ disc(Ro)) − area(P ∩ wedge ∩ disc(Ri)), with the wedge (a
 * triangle from the centre containing the slice) clipped convexly and each disc part by the exact
 * per-edge formula. Coordinates are taken relative to the piece for precision.
 */
export function polygonPieceArea(polygon: PreparedPolygon, piece: CorridorPiece): number {
  let area = 0;
  if (piece.kind === "quad") {
    const o = piece.corners[0];
    for (const ring of polygon.rings) area += flatRingArea(clipRingConvex(ring, o[0], o[1], piece.local));
    return area;
  }
  const c = piece.center;
  const { inner, outer } = piece;
  for (const ring of polygon.rings) {
    const clipped = clipRingConvex(ring, c[0], c[1], piece.wedge);
    if (clipped.length < 6) continue;
    area += ringDiscArea(clipped, outer.radius, -outer.center[0], -outer.center[1]) - ringDiscArea(clipped, inner.radius, -inner.center[0], -inner.center[1]);
  }
  return area;
}

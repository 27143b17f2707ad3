import type { CorridorPiece } from "./corridor-types";
import { clippedArea, clipRingConvex } from "./take-clip";
import { ringDiscArea } from "./take-disc";
import type { PreparedPolygon } from "./take-shapes";
import { extendAnnularSpan, extendQuadSpan } from "./take-span";

/**
 * Exact area of (polygon ∩ piece), square units. A quad: Sutherland–Hodgman clip of every ring
 * against the convex quad, then the shoelace formula (holes are clockwise, so they subtract). An
 * annular slice: area(P ∩ wedge ∩ disc(Ro)) − area(P ∩ wedge ∩ disc(Ri)), with the wedge (a
 * triangle from the centre containing the slice) clipped convexly and each disc part by the exact
 * per-edge formula. Coordinates are taken relative to the piece for precision. When `span` is
 * given, the stations the clipped rings reach are added to it (see take-span.ts).
 */
export function polygonPieceArea(polygon: PreparedPolygon, piece: CorridorPiece, span?: [number, number]): number {
  let area = 0;
  if (piece.kind === "quad") {
    const o = piece.corners[0];
    for (const ring of polygon.rings) {
      const clipped = clipRingConvex(ring, o[0], o[1], piece.local);
      if (clipped.length < 6) continue;
      area += clippedArea(clipped);
      if (span) extendQuadSpan(clipped, piece, span);
    }
    return area;
  }
  const c = piece.center;
  const { inner, outer } = piece;
  for (const ring of polygon.rings) {
    const clipped = clipRingConvex(ring, c[0], c[1], piece.wedge);
    if (clipped.length < 6) continue;
    const a = ringDiscArea(clipped.data, clipped.length, outer.radius, -outer.center[0], -outer.center[1]) - ringDiscArea(clipped.data, clipped.length, inner.radius, -inner.center[0], -inner.center[1]);
    area += a;
    if (span && a !== 0) extendAnnularSpan(clipped, piece, span);
  }
  return area;
}

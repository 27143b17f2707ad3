import { boundsOverlap } from "./corridor-pieces";
import { SLIVER_AREA, TAKE_MIN_AREA } from "./corridor-tolerances";
import type { CorridorPiece } from "./corridor-types";
import { polygonPieceArea } from "./take-piece-area";
import { remainderPieceAreas } from "./take-remainder";
import type { PreparedShape } from "./take-shapes";

/** What the corridor does to one parcel's geometry (independent of rules and costs). */
export interface ParcelMeasure {
  takeArea: number;
  /** Easement strips ∩ parcel, outside the right-of-way. */
  easementArea: number;
  remainderArea: number;
  /** Remainder pieces, largest first, slivers dropped (with no take: the parcel's own polygons). */
  pieceAreas: number[];
  /** Centreline stations the take spans (the easement's when there is no take), minus `base`. */
  span: [number, number] | null;
}

/**
 * Exact take and easement areas of a parcel, its remainder pieces and station span. `row` and
 * `wide` are the right-of-way and widened (easement) pieces whose bounds meet the parcel's; `all`
 * is the whole right-of-way (for the corridor boundary when the remainder splits).
 */
export function measureParcel(shape: PreparedShape, row: CorridorPiece[], wide: CorridorPiece[] | null, all: CorridorPiece[], base: number): ParcelMeasure {
  const rowAreas = pieceAreas(shape, row);
  const takeArea = clampArea(rowAreas.total, shape.area);
  const wideAreas = wide ? pieceAreas(shape, wide) : null;
  const easementArea = wideAreas ? Math.max(0, clampArea(wideAreas.total, shape.area) - takeArea) : 0;
  const pieces: number[] = [];
  if (takeArea > TAKE_MIN_AREA) {
    shape.polygons.forEach((polygon, i) => {
      const near = row.filter((p) => boundsOverlap(p.bounds, polygon.bounds));
      pieces.push(...remainderPieceAreas(polygon, rowAreas.perPolygon[i]!, near, all));
    });
    pieces.sort((a, b) => b - a);
  } else {
    for (const polygon of shape.polygons) if (polygon.area >= SLIVER_AREA) pieces.push(polygon.area);
  }
  const span = takeArea > TAKE_MIN_AREA ? rowAreas.span : wideAreas && easementArea > TAKE_MIN_AREA ? wideAreas.span : null;
  return { takeArea, easementArea, remainderArea: Math.max(0, shape.area - takeArea), pieceAreas: pieces, span: span ? [span[0] - base, span[1] - base] : null };
}

/** Exact area of (shape ∩ pieces), in total and per polygon of the shape, and the stations it spans. */
export function pieceAreas(shape: PreparedShape, pieces: CorridorPiece[]): { total: number; perPolygon: number[]; span: [number, number] | null } {
  const perPolygon = shape.polygons.map(() => 0);
  const span: [number, number] = [Infinity, -Infinity];
  const pieceSpan: [number, number] = [Infinity, -Infinity];
  let total = 0;
  for (const piece of pieces) {
    let inPiece = 0;
    pieceSpan[0] = Infinity;
    pieceSpan[1] = -Infinity;
    shape.polygons.forEach((polygon, i) => {
      if (!boundsOverlap(piece.bounds, polygon.bounds)) return;
      const a = polygonPieceArea(polygon, piece, pieceSpan);
      perPolygon[i]! += a;
      inPiece += a;
    });
    total += inPiece;
    // A piece the shape only touches must not stretch the span.
    if (inPiece > TAKE_MIN_AREA) [span[0], span[1]] = [Math.min(span[0], pieceSpan[0]), Math.max(span[1], pieceSpan[1])];
  }
  return { total, perPolygon, span: span[0] <= span[1] ? span : null };
}

/** Round-off can take an area a hair below 0 or above the parcel's; an area is never outside [0, parcel]. */
function clampArea(a: number, max: number): number {
  return Math.min(Math.max(a, 0), max);
}

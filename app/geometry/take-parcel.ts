import { boundsOverlap } from "./corridor-pieces";
import { SLIVER_AREA, TAKE_MIN_AREA } from "./corridor-tolerances";
import type { CorridorPiece } from "./corridor-types";
import { polygonPieceArea } from "./take-piece-area";
import { remainderPieceAreas } from "./take-remainder";
import type { PreparedShape } from "./take-shapes";
import { pieceStationSpan } from "./take-span";

/** What the corridor does to one parcel's geometry (independent of rules and costs). */
export interface ParcelMeasure {
  takeArea: number;
  /** Easement strips ∩ parcel, outside the right-of-way. */
  easementArea: number;
  remainderArea: number;
  /** Remainder pieces, largest first, slivers dropped. */
  pieceAreas: number[];
  /** Centreline stations the take spans (the easement's when there is no take), minus `base`. */
  span: [number, number] | null;
}

/**
 * Exact take and easement areas of a parcel, its remainder pieces and station span. `row` and
 * `wide` are the right-of-way and widened (easement) pieces whose bounds meet the parcel's; `all`
 * is the whole right-of-way (for the local polygon when the remainder must be split).
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
  const spanFrom = takeArea > TAKE_MIN_AREA ? { pieces: row, areas: rowAreas.perPiece } : wideAreas && easementArea > TAKE_MIN_AREA ? { pieces: wide!, areas: wideAreas.perPiece } : null;
  return { takeArea, easementArea, remainderArea: Math.max(0, shape.area - takeArea), pieceAreas: pieces, span: spanFrom ? spanOf(shape, spanFrom.pieces, spanFrom.areas, base) : null };
}

/** Exact area of (shape ∩ pieces), per piece and per polygon of the shape. */
export function pieceAreas(shape: PreparedShape, pieces: CorridorPiece[]): { total: number; perPiece: number[]; perPolygon: number[] } {
  const perPiece = pieces.map(() => 0);
  const perPolygon = shape.polygons.map(() => 0);
  let total = 0;
  shape.polygons.forEach((polygon, i) => {
    pieces.forEach((piece, k) => {
      if (!boundsOverlap(piece.bounds, polygon.bounds)) return;
      const a = polygonPieceArea(polygon, piece);
      perPiece[k]! += a;
      perPolygon[i]! += a;
      total += a;
    });
  });
  return { total, perPiece, perPolygon };
}

function spanOf(shape: PreparedShape, pieces: CorridorPiece[], areas: number[], base: number): [number, number] | null {
  let lo = Infinity;
  let hi = -Infinity;
  pieces.forEach((p, k) => {
    if (!(areas[k]! > TAKE_MIN_AREA)) return;
    const s = pieceStationSpan(shape.polygons, p);
    if (!s) return;
    lo = Math.min(lo, s[0]);
    hi = Math.max(hi, s[1]);
  });
  return lo <= hi ? [lo - base, hi - base] : null;
}

/** Round-off can take an area a hair below 0 or above the parcel's; an area is never outside [0, parcel]. */
function clampArea(a: number, max: number): number {
  return Math.min(Math.max(a, 0), max);
}

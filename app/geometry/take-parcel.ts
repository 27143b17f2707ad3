import { boundsOverlap } from "./corridor-pieces";
import { SLIVER_AREA, TAKE_MIN_AREA } from "./corridor-tolerances";
import type { CorridorPiece } from "./corridor-types";
import { multiplyCoveredArea, NO_OVERLAPS, overlappingAmong, type PieceOverlaps } from "./take-overlap";
import { polygonPieceArea } from "./take-piece-area";
import { remainderPieceAreas } from "./take-remainder";
import type { PreparedShape } from "./take-shapes";
import type { RelativeSpan } from "./take-span";

/** What the corridor does to one parcel's geometry (independent of rules and costs). */
export interface ParcelMeasure {
  takeArea: number;
  /** Easement strips ∩ parcel, outside the right-of-way. */
  easementArea: number;
  remainderArea: number;
  /** Remainder pieces, largest first, slivers dropped (with no take: the parcel's own polygons). */
  pieceAreas: number[];
  /** Stations the take spans (the easement's when there is none), on the `row` or `wide` pieces measured. */
  span: RelativeSpan | null;
  spanOn: "row" | "wide";
}

/**
 * Exact take and easement areas of a parcel, its remainder pieces and station span. `row` and
 * `wide` are the right-of-way and widened (easement) pieces whose bounds meet the parcel's; `all`
 * is the whole right-of-way (for the corridor boundary when the remainder splits). `overlaps`
 * name the pieces of each that cover the same ground as others, so that ground is taken once.
 */
export function measureParcel(shape: PreparedShape, row: CorridorPiece[], wide: CorridorPiece[] | null, all: CorridorPiece[], overlaps: { row: PieceOverlaps; wide: PieceOverlaps } = { row: NO_OVERLAPS, wide: NO_OVERLAPS }): ParcelMeasure {
  const rowAreas = pieceAreas(shape, row, overlaps.row);
  const takeArea = clampArea(rowAreas.total, shape.area);
  const wideAreas = wide ? pieceAreas(shape, wide, overlaps.wide) : null;
  const easementArea = wideAreas ? Math.max(0, clampArea(wideAreas.total, shape.area) - takeArea) : 0;
  const pieces: number[] = [];
  if (takeArea > TAKE_MIN_AREA) {
    shape.polygons.forEach((polygon, i) => {
      const near = row.filter((p) => boundsOverlap(p.bounds, polygon.bounds));
      pieces.push(...remainderPieceAreas(polygon, rowAreas.perPolygon[i]!, near, all, rowAreas.coveredTwice[i]));
    });
    pieces.sort((a, b) => b - a);
  } else {
    for (const polygon of shape.polygons) if (polygon.area >= SLIVER_AREA) pieces.push(polygon.area);
  }
  const onRow = takeArea > TAKE_MIN_AREA || !wideAreas;
  const span = onRow ? rowAreas.span : wideAreas.span;
  return { takeArea, easementArea, remainderArea: Math.max(0, shape.area - takeArea), pieceAreas: pieces, span, spanOn: onRow ? "row" : "wide" };
}

/**
 * Exact area of (shape ∩ ∪ pieces), in total and per polygon of the shape, and the stations it
 * spans. Each piece's share is exact; where `overlaps` says pieces near a polygon cover the same
 * ground, what they count more than once is taken off again (`coveredTwice` marks that polygon).
 */
export function pieceAreas(shape: PreparedShape, pieces: CorridorPiece[], overlaps: PieceOverlaps = NO_OVERLAPS): { total: number; perPolygon: number[]; span: RelativeSpan | null; coveredTwice: boolean[] } {
  const polygons = shape.polygons;
  const perPolygon = new Array<number>(polygons.length).fill(0);
  let span: RelativeSpan | null = null;
  const along: [number, number] = [Infinity, -Infinity];
  let total = 0;
  for (let k = 0; k < pieces.length; k++) {
    const piece = pieces[k]!;
    let inPiece = 0;
    along[0] = Infinity;
    along[1] = -Infinity;
    for (let i = 0; i < polygons.length; i++) {
      if (!boundsOverlap(piece.bounds, polygons[i]!.bounds)) continue;
      const a = polygonPieceArea(polygons[i]!, piece, along);
      perPolygon[i]! += a;
      inPiece += a;
    }
    total += inPiece;
    // A piece the shape only touches must not stretch the span.
    if (inPiece > TAKE_MIN_AREA && along[0] <= along[1]) span = widen(span, k, along);
  }
  const coveredTwice = polygons.map((polygon, i) => {
    if (overlaps.size === 0) return false;
    const twice = overlappingAmong(pieces.filter((p) => boundsOverlap(p.bounds, polygon.bounds)), overlaps);
    if (twice.length < 2) return false;
    const excess = multiplyCoveredArea(polygon, twice);
    perPolygon[i]! -= excess;
    total -= excess;
    return true;
  });
  return { total, perPolygon, span, coveredTwice };
}

/**
 * Widens a relative span with piece k's extremes. Pieces are listed in station order, so (k, along)
 * compare lexicographically — from geometry alone, so a cached and a fresh span pick the same end.
 */
function widen(span: RelativeSpan | null, k: number, along: [number, number]): RelativeSpan {
  const from: [number, number] = [k, along[0]];
  const to: [number, number] = [k, along[1]];
  if (!span) return { from, to };
  const before = (a: [number, number], b: [number, number]) => a[0] < b[0] || (a[0] === b[0] && a[1] < b[1]);
  return { from: before(from, span.from) ? from : span.from, to: before(span.to, to) ? to : span.to };
}

/** Round-off can take an area a hair below 0 or above the parcel's; an area is never outside [0, parcel]. */
function clampArea(a: number, max: number): number {
  return Math.min(Math.max(a, 0), max);
}

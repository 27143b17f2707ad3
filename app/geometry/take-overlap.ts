import * as polyclip from "polyclip-ts";
import { arcAreas, chordPieces } from "./chorded-pieces";
import type { OverlappingPieces } from "./corridor-self-overlap";
import { OVERLAP_CHORD_TOLERANCE } from "./corridor-tolerances";
import type { CorridorPiece } from "./corridor-types";
import type { PreparedPolygon } from "./take-shapes";

/** For each piece (by index) that overlaps others, the indices of those others. */
export type PieceOverlaps = ReadonlyMap<number, ReadonlySet<number>>;

export const NO_OVERLAPS: PieceOverlaps = new Map();

export function pieceOverlaps(pairs: OverlappingPieces[]): PieceOverlaps {
  const out = new Map<number, Set<number>>();
  const add = (a: number, b: number) => (out.get(a) ?? out.set(a, new Set()).get(a)!).add(b);
  for (const { i, j } of pairs) {
    add(i, j);
    add(j, i);
  }
  return out;
}

/** The pieces of `near` that overlap another piece of `near`: where a polygon's per-piece take areas may count ground twice. */
export function overlappingAmong(near: CorridorPiece[], overlaps: PieceOverlaps): CorridorPiece[] {
  if (overlaps.size === 0) return [];
  const here = new Set(near.map((p) => p.index));
  return near.filter((p) => [...(overlaps.get(p.index) ?? [])].some((j) => here.has(j)));
}

/**
 * The area of `polygon` that `pieces` cover more than once, counted once for every cover beyond
 * the first: Σ area(P ∩ piece) − area(P ∩ ∪ pieces). Subtracted from the exact per-piece sum it
 * gives area(P ∩ ∪ pieces), the ground taken. Both terms are measured (polyclip-ts) on the pieces
 * chorded at OVERLAP_CHORD_TOLERANCE with every chord's circular segment put back
 * (`chorded-pieces.ts`), so only chords cut short where lines cross an arc keep an error.
 */
export function multiplyCoveredArea(polygon: PreparedPolygon, pieces: CorridorPiece[]): number {
  if (pieces.length < 2) return 0;
  const [ox, oy] = polygon.bounds;
  const subject = polygonGeom(polygon, ox, oy);
  const { geoms, chords } = chordPieces(pieces, ox, oy, OVERLAP_CHORD_TOLERANCE);
  let perPiece = 0;
  for (const g of geoms) perPiece += sum(arcAreas(polyclip.intersection(subject, g), chords));
  const once = sum(arcAreas(polyclip.intersection(subject, polyclip.union(geoms[0]!, ...geoms.slice(1))), chords));
  return Math.max(0, perPiece - once);
}

/**
 * The ground `pieces` cover more than once, counted once for every cover beyond the first:
 * Σ area(piece) − area(∪ pieces), measured as in {@link multiplyCoveredArea}. The corridor's own
 * area less this is the ground it covers.
 */
export function groundCoveredAgain(pieces: CorridorPiece[]): number {
  if (pieces.length < 2) return 0;
  const [ox, oy] = pieces[0]!.corners[0];
  const { geoms, chords } = chordPieces(pieces, ox, oy, OVERLAP_CHORD_TOLERANCE);
  const perPiece = geoms.reduce((s, g) => s + sum(arcAreas(g, chords)), 0);
  return Math.max(0, perPiece - sum(arcAreas(polyclip.union(geoms[0]!, ...geoms.slice(1)), chords)));
}

/**
 * Areas of the pieces of polygon − ∪ pieces, in no particular order, measured as in
 * {@link multiplyCoveredArea}; `pieces` are all those whose bounds meet the polygon's.
 */
export function differenceOfUnion(polygon: PreparedPolygon, pieces: CorridorPiece[]): number[] {
  const [ox, oy] = polygon.bounds;
  const { geoms, chords } = chordPieces(pieces, ox, oy, OVERLAP_CHORD_TOLERANCE);
  return arcAreas(polyclip.difference(polygonGeom(polygon, ox, oy), polyclip.union(geoms[0]!, ...geoms.slice(1))), chords);
}

/** A prepared polygon as polyclip rings (closed), shifted by −(ox, oy). */
export function polygonGeom(polygon: PreparedPolygon, ox: number, oy: number): polyclip.Geom {
  return polygon.rings.map((flat) => {
    const pts: [number, number][] = [];
    for (let i = 0; i < flat.length; i += 2) pts.push([flat[i]! - ox, flat[i + 1]! - oy]);
    pts.push(pts[0]!);
    return pts;
  });
}

/** Area of polyclip output (no arcs to restore): each polygon's exterior less its holes. */
export function polyclipArea(geom: polyclip.Geom): number {
  return sum(arcAreas(geom, new Map()));
}

function sum(xs: number[]): number {
  return xs.reduce((s, x) => s + x, 0);
}

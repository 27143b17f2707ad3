import * as polyclip from "polyclip-ts";
import { convexHull, convexPolygonsOverlap } from "./convex-hull";
import { piecesRing } from "./corridor-outline";
import type { Corridor, CorridorPiece } from "./corridor-types";
import { indexBounds } from "./take-index";
import { addVec, rotateVec, scaleVec, subVec, type Vec2 } from "./vec2";

/** Two stretches of one corridor that cover the same ground (a loop or hairpin closer than the corridor is wide). */
export interface CorridorSelfOverlap {
  /** Internal stations of the earlier and of the later stretch. */
  first: [number, number];
  second: [number, number];
  /** Area covered twice, square units (arcs chorded at OVERLAP_CHORD_TOLERANCE: good to a few cm²). */
  area: number;
}

/** Chord tolerance of the polygons whose intersection measures an overlap; it is reported, not taken. */
const OVERLAP_CHORD_TOLERANCE = 1e-3;
/** Overlaps smaller than this (square units) are touching, not overlapping. */
const OVERLAP_MIN_AREA = 1e-3;

/** Two pieces (by their `index`, i < j) that cover the same ground, and how much. */
export interface OverlappingPieces {
  i: number;
  j: number;
  area: number;
}

/** Where the right-of-way covers the same ground twice, as stretches of stations. */
export function findCorridorSelfOverlaps(corridor: Corridor): CorridorSelfOverlap[] {
  return mergeOverlapRuns(findOverlappingPieces(corridor), corridor.pieces);
}

/**
 * The pairs of pieces that overlap. Pieces of one element never overlap (a tangent's quads lie
 * between perpendiculars, an arc's slices in disjoint sectors of its centre) and neighbours
 * share an edge, so only other pairs whose bounds meet are tested: first by the separating axis
 * theorem on convex hulls that contain each piece, and only when those overlap, by clipping the
 * two pieces. A valid alignment in open country finds none quickly. `corridor.pieces` may be any
 * stretch of a corridor's pieces, in station order.
 */
export function findOverlappingPieces(corridor: Pick<Corridor, "pieces">): OverlappingPieces[] {
  const pieces = corridor.pieces;
  const index = indexBounds(pieces.map((p) => p.bounds));
  const hulls = new Map<number, Vec2[]>();
  const hullOf = (i: number) => hulls.get(i) ?? hulls.set(i, containingHull(pieces[i]!)).get(i)!;
  const found: OverlappingPieces[] = [];
  for (let i = 0; i < pieces.length; i++) {
    for (const j of index.search(pieces[i]!.bounds)) {
      if (pieces[j]!.index <= pieces[i]!.index + 1 || pieces[j]!.elementIndex === pieces[i]!.elementIndex) continue;
      if (!convexPolygonsOverlap(hullOf(i), hullOf(j))) continue;
      const area = intersectionArea(pieces, i, j);
      if (area > OVERLAP_MIN_AREA) found.push({ i: pieces[i]!.index, j: pieces[j]!.index, area });
    }
  }
  return found;
}

/** A convex polygon containing the piece: its corners, and for an arc the tangents' meeting points outside it. */
function containingHull(p: CorridorPiece): Vec2[] {
  if (p.kind === "quad") return convexHull(p.corners);
  const points: Vec2[] = [...p.corners];
  const outer = addVec(p.center, p.outer.center);
  for (const [a, b] of [[p.corners[0], p.corners[1]], [p.corners[3], p.corners[2]]] as const) {
    const va = subVec(a, outer);
    const vb = subVec(b, outer);
    const phi = Math.atan2(va[0] * vb[1] - va[1] * vb[0], va[0] * vb[0] + va[1] * vb[1]);
    // Two tangent segments per arc side: their outer corners, at r / cos(φ/4) from the circle's centre.
    for (const k of [0.25, 0.75]) points.push(addVec(outer, scaleVec(rotateVec(va, phi * k), 1 / Math.cos(phi / 4))));
  }
  return convexHull(points);
}

function intersectionArea(pieces: CorridorPiece[], i: number, j: number): number {
  const ring = (k: number) => {
    const r = piecesRing(pieces, k, k, OVERLAP_CHORD_TOLERANCE);
    const o = pieces[i]!.corners[0]; // local coordinates keep the clipper's arithmetic well away from 1e6
    const local = r.map((v): [number, number] => [v[0] - o[0], v[1] - o[1]]);
    return [[...local, local[0]!]];
  };
  const out = polyclip.intersection(ring(i) as polyclip.Geom, ring(j) as polyclip.Geom);
  let area = 0;
  for (const poly of out) for (const [n, r] of poly.entries()) area += (n === 0 ? 1 : -1) * Math.abs(shoelace(r));
  return area;
}

function shoelace(r: [number, number][]): number {
  let s = 0;
  for (let k = 0; k + 1 < r.length; k++) s += r[k]![0] * r[k + 1]![1] - r[k + 1]![0] * r[k]![1];
  return s / 2;
}

/** Joins overlapping piece pairs whose pieces follow on from each other into one stretch pair each. */
export function mergeOverlapRuns(pairs: OverlappingPieces[], pieces: CorridorPiece[]): CorridorSelfOverlap[] {
  const runs: { i0: number; i1: number; j0: number; j1: number; area: number }[] = [];
  for (const { i, j, area } of [...pairs].sort((a, b) => a.i - b.i || a.j - b.j)) {
    const run = runs.find((r) => i <= r.i1 + 1 && j >= r.j0 - 1 && j <= r.j1 + 1);
    if (run) Object.assign(run, { i1: Math.max(run.i1, i), j0: Math.min(run.j0, j), j1: Math.max(run.j1, j), area: run.area + area });
    else runs.push({ i0: i, i1: i, j0: j, j1: j, area });
  }
  return runs.map((r) => ({ first: [pieces[r.i0]!.stationFrom, pieces[r.i1]!.stationTo], second: [pieces[r.j0]!.stationFrom, pieces[r.j1]!.stationTo], area: r.area }));
}

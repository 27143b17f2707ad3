import * as polyclip from "polyclip-ts";
import { flatRingArea } from "./corridor-pieces";
import { piecesRing } from "./corridor-outline";
import { REMAINDER_CHORD_TOLERANCE, SLIVER_AREA, TAKE_MIN_AREA } from "./corridor-tolerances";
import type { CorridorPiece } from "./corridor-types";
import { countOutsideRuns } from "./take-runs";
import type { PreparedPolygon } from "./take-shapes";

/**
 * Areas of the connected pieces of (polygon − right-of-way), largest first, slivers (< 0.01
 * square units) dropped. `take` is the polygon's exact take. When the boundary leaves the corridor
 * at most once (see `countOutsideRuns`) the remainder is one piece of the exact remainder area.
 * Otherwise the polygon is differenced (polyclip-ts) with the local corridor — the pieces near it,
 * arcs chorded at 0.5 mm — and the piece areas are scaled so that they add up to the exact remainder.
 */
export function remainderPieceAreas(polygon: PreparedPolygon, take: number, near: CorridorPiece[], all: CorridorPiece[]): number[] {
  const remainder = polygon.area - take;
  if (remainder <= SLIVER_AREA) return [];
  if (take <= TAKE_MIN_AREA || near.length === 0) return [remainder];
  let runs = 0;
  for (const ring of polygon.rings) runs += countOutsideRuns(ring, near);
  if (runs === 1) return [remainder];
  const chorded = differencePieces(polygon, near, all);
  const sum = chorded.reduce((s, a) => s + a, 0);
  const scale = sum > 0 ? remainder / sum : 1;
  return chorded.map((a) => a * scale).filter((a) => a >= SLIVER_AREA).sort((a, b) => b - a);
}

/** Areas of polygon − (corridor pieces from the first to the last of `near`), in relative coordinates. */
function differencePieces(polygon: PreparedPolygon, near: CorridorPiece[], all: CorridorPiece[]): number[] {
  const ox = polygon.bounds[0];
  const oy = polygon.bounds[1];
  const from = Math.min(...near.map((p) => p.index));
  const to = Math.max(...near.map((p) => p.index));
  const ring = piecesRing(all, from, to, REMAINDER_CHORD_TOLERANCE).map(([x, y]) => [x - ox, y - oy] as [number, number]);
  const subject = polygon.rings.map((r) => closedPairs(r, ox, oy));
  const result = polyclip.difference(subject, [[...ring, ring[0]!]]);
  return result.map((poly) => poly.reduce((s, r, i) => s + (i === 0 ? 1 : -1) * Math.abs(flatRingArea(r.flat())), 0));
}

function closedPairs(flat: number[], ox: number, oy: number): [number, number][] {
  const pts: [number, number][] = [];
  for (let i = 0; i < flat.length; i += 2) pts.push([flat[i]! - ox, flat[i + 1]! - oy]);
  pts.push(pts[0]!);
  return pts;
}

import * as polyclip from "polyclip-ts";
import { piecesRing } from "./corridor-outline";
import { REMAINDER_CHORD_TOLERANCE, SLIVER_AREA, TAKE_MIN_AREA } from "./corridor-tolerances";
import type { CorridorPiece } from "./corridor-types";
import { splitRemainder } from "./take-remainder-split";
import { differenceOfUnion, polyclipArea, polygonGeom } from "./take-overlap";
import { walkRing } from "./take-ring-walk";
import type { PreparedPolygon } from "./take-shapes";

/**
 * Areas of the connected pieces of (polygon − right-of-way), largest first, slivers (< 0.01
 * square units) dropped. `take` is the polygon's exact take. When the boundary leaves the corridor
 * at most once the remainder is one piece of the exact remainder area; otherwise the pieces come
 * from `splitRemainder` (exact), checked to add up to the exact remainder. Only if that fails —
 * tangencies, a hole wholly outside — is the polygon differenced (polyclip-ts) with the local
 * corridor, arcs chorded at 0.5 mm, and the piece areas scaled to add up to the exact remainder.
 * Where the right-of-way covers ground twice near the polygon (`coveredTwice`), its boundary is
 * not one ring to walk (and a loop closes off an island): the polygon is differenced straight away
 * with the union of the pieces near it (arcs restored: `differenceOfUnion`), and the pieces scaled
 * to the exact remainder.
 */
export function remainderPieceAreas(polygon: PreparedPolygon, take: number, near: CorridorPiece[], all: CorridorPiece[], coveredTwice = false): number[] {
  const remainder = polygon.area - take;
  if (remainder <= SLIVER_AREA) return [];
  if (take <= TAKE_MIN_AREA || near.length === 0) return [remainder];
  if (coveredTwice) return sortedPieces(scaled(differenceOfUnion(polygon, near), remainder));
  const walks = polygon.rings.map((ring) => walkRing(ring, near));
  const runs = walks.reduce((s, w) => s + (w.state === "outside" ? 1 : w.runs.length), 0);
  if (runs === 1 || (runs > 1 && walks.every((w) => w.state !== "crossing"))) return [remainder];
  const exact = runs > 1 ? splitRemainder(polygon, walks, all, near) : null;
  const sum = exact?.reduce((s, a) => s + a, 0) ?? NaN;
  const pieces = exact && Math.abs(sum - remainder) <= 1e-6 * Math.max(1, polygon.area) && exact.every((a) => a > -SLIVER_AREA) ? exact : scaled(differencePieces(polygon, near, all), remainder);
  return sortedPieces(pieces);
}

function sortedPieces(areas: number[]): number[] {
  return areas.filter((a) => a >= SLIVER_AREA).sort((a, b) => b - a);
}

function scaled(areas: number[], total: number): number[] {
  const sum = areas.reduce((s, a) => s + a, 0);
  return sum > 0 ? areas.map((a) => (a * total) / sum) : areas;
}

/** Areas of polygon − (corridor pieces from the first to the last of `near`), in relative coordinates. */
function differencePieces(polygon: PreparedPolygon, near: CorridorPiece[], all: CorridorPiece[]): number[] {
  const ox = polygon.bounds[0];
  const oy = polygon.bounds[1];
  const from = Math.min(...near.map((p) => p.index));
  const to = Math.max(...near.map((p) => p.index));
  const ring = piecesRing(all, from, to, REMAINDER_CHORD_TOLERANCE).map(([x, y]) => [x - ox, y - oy] as [number, number]);
  const result = polyclip.difference(polygonGeom(polygon, ox, oy), [[...ring, ring[0]!]]);
  return result.map((poly) => polyclipArea([poly]));
}

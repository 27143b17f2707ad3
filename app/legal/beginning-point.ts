import { azimuthDegOfVector, formatAzimuthAsBearing } from "~/geometry/bearings";
import type { PolygonCoords } from "~/geometry/take-types";
import type { Vec2 } from "~/geometry/vec2";
import type { BoundarySegment } from "./legal-types";
import { liesOn } from "./segment-index";

/** Points closer than this (units) are one point: a POB at a parcel corner needs no commencement. */
const SAME_POINT = 0.001;

/** The tie from a parcel corner to the point of beginning. */
export interface Commencement {
  point: Vec2;
  azimuthDeg: number;
  bearing: string;
  distance: number;
  /** True when the tie runs along a line of the parcel. */
  alongParcelLine: boolean;
}

/**
 * Where a ring's description begins: the most northerly point (then the most westerly) at which
 * the new right-of-way line meets a line of the parcel — the usual point of beginning of a take,
 * on the property line (common practice) — or, when the ring has no such point, its most northerly
 * vertex. Returns the ring rotated to start there.
 */
export function startAtBeginning(segments: BoundarySegment[]): BoundarySegment[] {
  const source = (s: BoundarySegment) => (s.kind === "line" ? s.on : "right-of-way");
  const n = segments.length;
  const meets = segments.map((s, i) => source(s) !== source(segments[(i + n - 1) % n]!));
  const candidates = segments.map((_, i) => i).filter((i) => meets[i]);
  const pool = candidates.length > 0 ? candidates : segments.map((_, i) => i);
  const best = pool.reduce((a, b) => (isNorthWestOf(segments[b]!.from, segments[a]!.from) ? b : a));
  return [...segments.slice(best), ...segments.slice(0, best)];
}

function isNorthWestOf(p: Vec2, q: Vec2): boolean {
  if (Math.abs(p[1] - q[1]) > 1e-9) return p[1] > q[1];
  return p[0] < q[0];
}

/**
 * The point of commencement: a corner of the parcel tied to the point of beginning. When the POB
 * lies on a parcel line, the nearer end of that line (so the tie runs along the property line);
 * otherwise the nearest corner. Null when the POB is itself a corner.
 */
export function findCommencement(pob: Vec2, parcel: PolygonCoords[]): Commencement | null {
  const corners: Vec2[] = [];
  const edges: [Vec2, Vec2][] = [];
  for (const rings of parcel) {
    for (const ring of rings) {
      for (let i = 0; i + 1 < ring.length; i++) {
        const a: Vec2 = [ring[i]![0]!, ring[i]![1]!];
        corners.push(a);
        edges.push([a, [ring[i + 1]![0]!, ring[i + 1]![1]!]]);
      }
    }
  }
  const dist = (p: Vec2) => Math.hypot(p[0] - pob[0], p[1] - pob[1]);
  if (corners.some((c) => dist(c) <= SAME_POINT)) return null;
  const edge = edges.find((e) => liesOn(pob, e, 1e-6));
  const choices = edge ? edge : corners;
  const corner = choices.reduce((a, b) => (dist(b) < dist(a) ? b : a));
  const azimuthDeg = azimuthDegOfVector(pob[0] - corner[0], pob[1] - corner[1]);
  return { point: corner, azimuthDeg, bearing: formatAzimuthAsBearing(azimuthDeg), distance: dist(corner), alongParcelLine: edge !== undefined };
}

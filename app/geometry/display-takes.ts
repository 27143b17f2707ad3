import type { Corridor, CorridorPiece } from "./corridor-types";
import { rayToCircle } from "./corridor-slices";
import { DISPLAY_CHORD_TOLERANCE } from "./corridor-tolerances";
import type { PolygonCoords, TakeParcelInput } from "./take-types";
import type { Vec2 } from "./vec2";

/** A parcel's take as drawable pieces: one convex-clipped polygon per corridor slice it meets. */
export interface DisplayTake {
  parcelId: string;
  coordinates: PolygonCoords[];
}

/**
 * Take shapes for the map, fast enough to redraw while a PI is dragged: each parcel ring is clipped
 * (Sutherland–Hodgman, CACM 17(1), 1974) against convex pieces of the right-of-way — the tangent
 * quadrilaterals and, along arcs, quadrilaterals between rays a chord tolerance apart. The pieces
 * tile the take, so a fill shows it exactly to the chord tolerance; they are not dissolved, so draw
 * them without outlines. Areas never come from here (see computeTakes).
 */
export function computeDisplayTakes(corridor: Corridor, parcels: TakeParcelInput[], chordTolerance = DISPLAY_CHORD_TOLERANCE): DisplayTake[] {
  const convex = corridor.pieces.map((p) => ({ bounds: p.bounds, polygons: convexPolygonsOf(p, chordTolerance) }));
  return parcels.flatMap((parcel): DisplayTake[] => {
    const b = boundsOfPolygons(parcel.polygons);
    const out: PolygonCoords[] = [];
    for (const piece of convex) {
      if (piece.bounds[0] > b[2] || piece.bounds[2] < b[0] || piece.bounds[1] > b[3] || piece.bounds[3] < b[1]) continue;
      for (const clip of piece.polygons) for (const rings of parcel.polygons) pushClipped(out, rings, clip);
    }
    return out.length ? [{ parcelId: parcel.parcelId, coordinates: out }] : [];
  });
}

function pushClipped(out: PolygonCoords[], rings: PolygonCoords, clip: Vec2[]): void {
  const exterior = clipRing(rings[0]!, clip);
  if (exterior.length < 3) return;
  const holes = rings.slice(1).map((h) => clipRing(h, clip)).filter((h) => h.length >= 3);
  out.push([exterior, ...holes].map((r) => [...r, r[0]!]));
}

/** Convex pieces of a corridor piece, counter-clockwise. */
function convexPolygonsOf(piece: CorridorPiece, tol: number): Vec2[][] {
  if (piece.kind === "quad") return [piece.corners];
  const r = Math.max(piece.outer.radius, 1e-9);
  const step = 2 * Math.acos(Math.max(-1, 1 - tol / r));
  const n = Math.max(1, Math.ceil(piece.sweepRad / step));
  const a0 = Math.atan2(piece.rayFrom[1], piece.rayFrom[0]);
  const sign = cross(piece.rayFrom, piece.rayTo) >= 0 ? 1 : -1;
  const at = (k: number, side: "inner" | "outer"): Vec2 => {
    const a = a0 + (sign * piece.sweepRad * k) / n;
    const u: Vec2 = [Math.cos(a), Math.sin(a)];
    const d = rayToCircle(u, piece[side]);
    return [piece.center[0] + u[0] * d, piece.center[1] + u[1] * d];
  };
  const out: Vec2[][] = [];
  for (let k = 0; k < n; k++) {
    const quad: Vec2[] = [at(k, "inner"), at(k, "outer"), at(k + 1, "outer"), at(k + 1, "inner")];
    out.push(signedArea(quad) < 0 ? quad.reverse() : quad);
  }
  return out;
}

function clipRing(ring: number[][], clip: Vec2[]): Vec2[] {
  let points: Vec2[] = ring.slice(0, -1).map((p) => [p[0]!, p[1]!]);
  for (let i = 0; i < clip.length && points.length; i++) {
    const a = clip[i]!;
    const b = clip[(i + 1) % clip.length]!;
    const inside = (p: Vec2) => (b[0] - a[0]) * (p[1] - a[1]) - (b[1] - a[1]) * (p[0] - a[0]) >= 0;
    const next: Vec2[] = [];
    for (let j = 0; j < points.length; j++) {
      const p = points[j]!;
      const q = points[(j + 1) % points.length]!;
      const pin = inside(p);
      if (pin) next.push(p);
      if (pin !== inside(q)) next.push(intersect(p, q, a, b));
    }
    points = next;
  }
  return points;
}

function intersect(p: Vec2, q: Vec2, a: Vec2, b: Vec2): Vec2 {
  const d1: Vec2 = [q[0] - p[0], q[1] - p[1]];
  const d2: Vec2 = [b[0] - a[0], b[1] - a[1]];
  const t = cross([a[0] - p[0], a[1] - p[1]], d2) / cross(d1, d2);
  return [p[0] + d1[0] * t, p[1] + d1[1] * t];
}

const cross = (u: Vec2, v: Vec2) => u[0] * v[1] - u[1] * v[0];

function signedArea(r: Vec2[]): number {
  let s = 0;
  for (let i = 0; i < r.length; i++) s += cross(r[i]!, r[(i + 1) % r.length]!);
  return s / 2;
}

function boundsOfPolygons(polys: PolygonCoords[]): [number, number, number, number] {
  const b: [number, number, number, number] = [Infinity, Infinity, -Infinity, -Infinity];
  for (const rings of polys) for (const [x, y] of rings[0]!) {
    if (x! < b[0]) b[0] = x!;
    if (y! < b[1]) b[1] = y!;
    if (x! > b[2]) b[2] = x!;
    if (y! > b[3]) b[3] = y!;
  }
  return b;
}

import * as polyclip from "polyclip-ts";
import { boundsOverlap } from "~/geometry/corridor-pieces";
import type { Corridor } from "~/geometry/corridor-types";
import type { PolygonCoords } from "~/geometry/take-types";
import { prepareShape } from "~/geometry/take-shapes";
import type { Vec2 } from "~/geometry/vec2";
import type { ChordPlan } from "./arc-chords";
import { buildTaggedRing, STRAIGHT_EDGE, type RingCircle } from "./corridor-ring";
import { indexSegments } from "./segment-index";

/** What an edge of the take outline lies along: a chord of a right-of-way circle, a straight right-of-way line, or a parcel line. */
export type EdgeSource = { kind: "circle"; circle: number } | { kind: "right-of-way" } | { kind: "parcel"; line: [Vec2, Vec2] };

/** A ring of the chorded take outline (not closed), edge i from point i to i + 1, coordinates relative to `origin`. */
export interface OutlineRing {
  points: Vec2[];
  edges: EdgeSource[];
}

export interface TakeOutline {
  origin: Vec2;
  /** Circles of the right-of-way lines, relative to `origin`. */
  circles: RingCircle[];
  /** Polygons of (parcel ∩ right-of-way): exterior ring first, then holes. */
  polygons: OutlineRing[][];
}

/** How far (working units) an outline vertex may lie off the line it came from: polyclip-ts works in exact decimals. */
const ON_LINE_TOL = 1e-7;

/**
 * The take (parcel ∩ right-of-way) as polygons whose every edge knows what it lies along. The
 * right-of-way is chorded (finely near the parcel's lines: see `chordArc`) and intersected with
 * the parcel by polyclip-ts (exact decimal arithmetic); each output edge is then matched to the
 * corridor chord, right-of-way line or parcel line it is part of, so that the circles can be
 * restored exactly. `plan.near` is filled in here with the parcel's edges.
 */
export function traceTakeOutline(corridor: Corridor, polygons: PolygonCoords[], plan: Omit<ChordPlan, "near">): TakeOutline {
  const shape = prepareShape(polygons, "parcel.polygons");
  const origin: Vec2 = [shape.bounds[0], shape.bounds[1]];
  const hits = corridor.pieces.filter((p) => boundsOverlap(p.bounds, shape.bounds)).map((p) => p.index);
  if (hits.length === 0 || shape.polygons.length === 0) return { origin, circles: [], polygons: [] };
  const near = shape.polygons.flatMap((poly) => poly.rings.flatMap((flat) => unflatten(flat).map((p, i, all): [Vec2, Vec2] => [p, all[(i + 1) % all.length]!])));
  const ring = buildTaggedRing(corridor.pieces, Math.min(...hits), Math.max(...hits), { ...plan, near });
  const rel = (p: Vec2): Vec2 => [p[0] - origin[0], p[1] - origin[1]];
  const clipRing = ring.points.map(rel);
  const subject = shape.polygons.map((poly) => poly.rings.map((flat) => closeRing(unflatten(flat).map(rel))));
  const clipped = polyclip.intersection(subject as polyclip.Geom, [closeRing(clipRing)] as polyclip.Geom);
  const circles = ring.circles.map((c) => ({ centre: rel(c.centre), radius: c.radius }));
  const rowRuns = collinearRuns(clipRing, ring.tags);
  const rowIndex = indexSegments(rowRuns.map((r) => r.segment), ON_LINE_TOL);
  const parcelRuns = subject.flatMap((poly) => poly.flatMap((r) => collinearRuns(r.slice(0, -1), r.slice(0, -1).map(() => STRAIGHT_EDGE))));
  const parcelIndex = indexSegments(parcelRuns.map((r) => r.segment), ON_LINE_TOL);
  const sourceOf = (p: Vec2, q: Vec2): EdgeSource => {
    const k = rowIndex.find(p, q);
    const tag = k >= 0 ? rowRuns[k]!.tag : undefined;
    if (tag !== undefined && tag >= 0) return { kind: "circle", circle: tag };
    const j = parcelIndex.find(p, q);
    if (j >= 0) return { kind: "parcel", line: parcelRuns[j]!.segment };
    return tag !== undefined ? { kind: "right-of-way" } : { kind: "parcel", line: [p, q] };
  };
  const out = clipped.map((poly) =>
    poly.map((closed): OutlineRing => {
      const points = closed.slice(0, -1).map(([x, y]) => [x, y] as Vec2);
      return { points, edges: points.map((p, i) => sourceOf(p, points[(i + 1) % points.length]!)) };
    }),
  );
  return { origin, circles, polygons: out };
}

/** Consecutive edges with the same tag that run on one straight line are one segment (a chord stays alone). */
function collinearRuns(points: Vec2[], tags: number[]): { segment: [Vec2, Vec2]; tag: number }[] {
  const runs: { segment: [Vec2, Vec2]; tag: number }[] = [];
  const n = points.length;
  for (let i = 0; i < n; i++) {
    const a = points[i]!;
    const b = points[(i + 1) % n]!;
    const tag = tags[i]!;
    const last = runs[runs.length - 1];
    if (last && tag < 0 && last.tag === tag && continuesLine(last.segment[0], last.segment[1], b)) last.segment = [last.segment[0], b];
    else runs.push({ segment: [a, b], tag });
  }
  const [first, last] = [runs[0], runs[runs.length - 1]];
  if (first && last && runs.length > 1 && first.tag < 0 && last.tag === first.tag && continuesLine(last.segment[0], last.segment[1], first.segment[1])) {
    first.segment = [last.segment[0], first.segment[1]];
    runs.pop();
  }
  return runs;
}

/** True when `c` lies ahead of b on the line a→b (within 1e-9 of its length). */
function continuesLine(a: Vec2, b: Vec2, c: Vec2): boolean {
  const ux = b[0] - a[0];
  const uy = b[1] - a[1];
  const len = Math.hypot(ux, uy);
  const off = Math.abs(ux * (c[1] - a[1]) - uy * (c[0] - a[0])) / len;
  return len > 0 && off <= 1e-9 * (1 + len) && ux * (c[0] - b[0]) + uy * (c[1] - b[1]) > 0;
}

function unflatten(flat: number[]): Vec2[] {
  const out: Vec2[] = [];
  for (let i = 0; i < flat.length; i += 2) out.push([flat[i]!, flat[i + 1]!]);
  return out;
}

function closeRing(points: Vec2[]): Vec2[] {
  return [...points, points[0]!];
}

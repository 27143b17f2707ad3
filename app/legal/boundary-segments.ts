import type { Vec2 } from "~/geometry/vec2";
import { nearestLineCirclePoint } from "./circle-line";
import type { RingCircle } from "./corridor-ring";
import type { BoundarySegment } from "./legal-types";
import type { EdgeSource, OutlineRing } from "./take-outline";

/** A point is on a right-of-way circle when its distance from the centre is the radius within this (relative + absolute, units). */
const ON_CIRCLE_REL = 1e-9;
const ON_CIRCLE_ABS = 1e-8;
/** Two straight courses are one when their joint is within this of the line through their ends (units; 1 µm in metres). */
const COLLINEAR_TOL = 1e-6;

/**
 * The exact boundary of one outline ring: each maximal run of chords of one right-of-way circle
 * becomes one arc on that circle, its ends moved from the chord onto the circle where a parcel line
 * crosses it (the line–circle intersection); straight edges along one line become one course;
 * parcel corners stay where they are. Coordinates stay relative to the outline's origin.
 */
export function restoreBoundary(ring: OutlineRing, circles: RingCircle[], snapDistance: number): BoundarySegment[] {
  const runs = splitRuns(ring);
  const segments: BoundarySegment[] = [];
  for (const run of runs) {
    if (run.source.kind === "circle") segments.push(arcOf(run.points, circles[run.source.circle]!));
    else for (let i = 1; i < run.points.length; i++) segments.push({ kind: "line", from: run.points[i - 1]!, to: run.points[i]!, on: run.source.kind });
  }
  snapArcEnds(segments, runs, circles, snapDistance);
  return mergeLines(segments);
}

interface Run {
  source: EdgeSource;
  /** The run's vertices from its first point to its last (shared with the next run), and each edge's own source. */
  points: Vec2[];
  edges: EdgeSource[];
}

const sameSource = (a: EdgeSource, b: EdgeSource) => a.kind === b.kind && (a.kind !== "circle" || a.circle === (b as { circle: number }).circle);

/** Cuts the ring into runs of edges from one source, starting where the source changes. */
function splitRuns(ring: OutlineRing): Run[] {
  const n = ring.points.length;
  let start = ring.edges.findIndex((e, i) => !sameSource(e, ring.edges[(i + n - 1) % n]!));
  if (start < 0) start = 0;
  const runs: Run[] = [];
  for (let k = 0; k < n; k++) {
    const i = (start + k) % n;
    const edge = ring.edges[i]!;
    const last = runs[runs.length - 1];
    const next = ring.points[(i + 1) % n]!;
    if (last && sameSource(last.source, edge)) (last.points.push(next), last.edges.push(edge));
    else runs.push({ source: edge, points: [ring.points[i]!, next], edges: [edge] });
  }
  return runs;
}

/** The arc through a run of chord points: its sweep is the sum of the chords' signed angles about the centre. */
function arcOf(points: Vec2[], c: RingCircle): BoundarySegment {
  let sweep = 0;
  for (let i = 1; i < points.length; i++) sweep += angleAbout(c.centre, points[i - 1]!, points[i]!);
  return { kind: "arc", from: points[0]!, to: points[points.length - 1]!, centre: c.centre, radius: c.radius, sweepRad: sweep };
}

function angleAbout(o: Vec2, a: Vec2, b: Vec2): number {
  const ax = a[0] - o[0];
  const ay = a[1] - o[1];
  const bx = b[0] - o[0];
  const by = b[1] - o[1];
  return Math.atan2(ax * by - ay * bx, ax * bx + ay * by);
}

/**
 * Moves each arc end that is a chord's crossing with a parcel line onto the circle, along that
 * line (to the crossing nearest it, if within `maxMove`); the neighbouring course follows.
 */
function snapArcEnds(segments: BoundarySegment[], runs: Run[], circles: RingCircle[], maxMove: number): void {
  const lineOf = (run: Run, atEnd: boolean): [Vec2, Vec2] => {
    const edge = atEnd ? run.edges[run.edges.length - 1]! : run.edges[0]!;
    if (edge.kind === "parcel") return edge.line;
    const p = run.points;
    return atEnd ? [p[p.length - 2]!, p[p.length - 1]!] : [p[0]!, p[1]!];
  };
  const n = segments.length;
  let s = 0;
  runs.forEach((run, r) => {
    const count = run.source.kind === "circle" ? 1 : run.points.length - 1;
    if (run.source.kind === "circle") {
      const arc = segments[s] as Extract<BoundarySegment, { kind: "arc" }>;
      const c = circles[run.source.circle]!;
      const before = runs[(r + runs.length - 1) % runs.length]!;
      const after = runs[(r + 1) % runs.length]!;
      const start = onCircle(arc.from, c) || before.source.kind === "circle" ? arc.from : snapTo(lineOf(before, true), c, arc.from, maxMove);
      const end = onCircle(arc.to, c) || after.source.kind === "circle" ? arc.to : snapTo(lineOf(after, false), c, arc.to, maxMove);
      arc.sweepRad += angleAbout(c.centre, start, arc.from) + angleAbout(c.centre, arc.to, end);
      [arc.from, arc.to] = [start, end];
      segments[(s + n - 1) % n]!.to = start;
      segments[(s + 1) % n]!.from = end;
    }
    s += count;
  });
}

function onCircle(p: Vec2, c: RingCircle): boolean {
  return Math.abs(Math.hypot(p[0] - c.centre[0], p[1] - c.centre[1]) - c.radius) <= ON_CIRCLE_REL * c.radius + ON_CIRCLE_ABS;
}

/** The crossing of `line` with the circle nearest `p`; `p` pushed radially onto the circle if the line misses it (a tangent touch). */
function snapTo(line: [Vec2, Vec2], c: RingCircle, p: Vec2, maxMove: number): Vec2 {
  const q = nearestLineCirclePoint(line[0], line[1], c.centre, c.radius, p);
  if (q && Math.hypot(q[0] - p[0], q[1] - p[1]) <= maxMove) return q;
  const d = Math.hypot(p[0] - c.centre[0], p[1] - c.centre[1]);
  return [c.centre[0] + ((p[0] - c.centre[0]) * c.radius) / d, c.centre[1] + ((p[1] - c.centre[1]) * c.radius) / d];
}

/** Joins consecutive straight courses along one line and one source (also across the ring's start). */
function mergeLines(segments: BoundarySegment[]): BoundarySegment[] {
  const joinable = (a: BoundarySegment, b: BoundarySegment) => a.kind === "line" && b.kind === "line" && a.on === b.on && isStraightJoint(a.from, a.to, b.to);
  const out: BoundarySegment[] = [];
  for (const seg of segments) {
    const last = out[out.length - 1];
    if (last && joinable(last, seg)) last.to = seg.to;
    else out.push({ ...seg });
  }
  while (out.length > 1 && joinable(out[out.length - 1]!, out[0]!)) {
    const last = out.pop()!;
    out[0] = { ...out[0]!, from: last.from };
  }
  return out;
}

/** True when `b` lies on the segment a→c within COLLINEAR_TOL and between its ends. */
function isStraightJoint(a: Vec2, b: Vec2, c: Vec2): boolean {
  const ux = c[0] - a[0];
  const uy = c[1] - a[1];
  const len = Math.hypot(ux, uy);
  if (!(len > 0)) return false;
  const t = ((b[0] - a[0]) * ux + (b[1] - a[1]) * uy) / (len * len);
  return t > 0 && t < 1 && Math.abs(ux * (b[1] - a[1]) - uy * (b[0] - a[0])) / len <= COLLINEAR_TOL;
}

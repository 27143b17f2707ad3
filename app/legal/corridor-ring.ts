import { boundsOverlap } from "~/geometry/corridor-pieces";
import type { Bounds, CorridorPiece } from "~/geometry/corridor-types";
import { addVec, type Vec2 } from "~/geometry/vec2";
import { chordArc, type ChordPlan } from "./arc-chords";

/** A circle the right-of-way line runs on, absolute coordinates. */
export interface RingCircle {
  centre: Vec2;
  radius: number;
}

/** Tag of a ring edge along a straight right-of-way line (or a real end of the corridor). */
export const STRAIGHT_EDGE = -1;
/** Tag of a ring edge that is only a cut between the local pieces and the rest of the corridor. */
export const CUT_EDGE = -2;

/**
 * The right-of-way around pieces `from`..`to` as one counter-clockwise ring (not closed), arcs
 * chorded as `plan` says (finely near the parcel's lines), with a tag per edge (edge i runs from point i to point i + 1): the
 * index in `circles` of the circle whose chord it is, or STRAIGHT_EDGE, or CUT_EDGE.
 */
export interface TaggedRing {
  points: Vec2[];
  tags: number[];
  circles: RingCircle[];
}

/** Builds the tagged ring; the same walk as the engine's `piecesRing`, keeping where each edge came from. */
export function buildTaggedRing(pieces: CorridorPiece[], from: number, to: number, plan: ChordPlan): TaggedRing {
  const ring: TaggedRing = { points: [], tags: [], circles: [] };
  const circleIds = new Map<string, number>();
  const circleOf = (p: CorridorPiece, side: "left" | "right"): number => {
    if (p.kind !== "annular") return STRAIGHT_EDGE;
    const s = (side === "right") === p.turn > 0 ? p.outer : p.inner;
    const c: RingCircle = { centre: addVec(p.center, s.center), radius: s.radius };
    const key = `${c.centre[0]},${c.centre[1]},${c.radius}`;
    let id = circleIds.get(key);
    if (id === undefined) circleIds.set(key, (id = ring.circles.push(c) - 1));
    return id;
  };
  const push = (p: Vec2, tag: number) => {
    const n = ring.points.length;
    const q = ring.points[n - 1];
    if (q && Math.abs(q[0] - p[0]) + Math.abs(q[1] - p[1]) <= 1e-9 * (1 + Math.abs(p[0]) + Math.abs(p[1]))) ring.tags[n - 1] = tag;
    else (ring.points.push(p), ring.tags.push(tag));
  };
  for (let i = from; i <= to; i++) {
    const p = pieces[i]!;
    const tag = circleOf(p, "right");
    for (const q of sidePoints(p, "right", plan)) push(q, tag);
  }
  ring.tags[ring.tags.length - 1] = to === pieces.length - 1 ? STRAIGHT_EDGE : CUT_EDGE;
  for (let i = to; i >= from; i--) {
    const p = pieces[i]!;
    const tag = circleOf(p, "left");
    for (const q of sidePoints(p, "left", plan).reverse()) push(q, tag);
  }
  ring.tags[ring.tags.length - 1] = from === 0 ? STRAIGHT_EDGE : CUT_EDGE;
  return ring;
}

/** One side of a piece in station order: its two corners and, on an arc, the chord points between. */
function sidePoints(p: CorridorPiece, side: "left" | "right", plan: ChordPlan): Vec2[] {
  const [a, b] = side === "right" ? [p.corners[0], p.corners[1]] : [p.corners[3], p.corners[2]];
  if (p.kind !== "annular") return [a, b];
  const s = (side === "right") === p.turn > 0 ? p.outer : p.inner;
  const d = plan.nearDistance;
  const box: Bounds = [p.bounds[0] - d, p.bounds[1] - d, p.bounds[2] + d, p.bounds[3] + d];
  const near = plan.near.filter(([u, v]) => boundsOverlap(box, [Math.min(u[0], v[0]), Math.min(u[1], v[1]), Math.max(u[0], v[0]), Math.max(u[1], v[1])]));
  return chordArc(addVec(p.center, s.center), s.radius, a, b, { ...plan, near });
}

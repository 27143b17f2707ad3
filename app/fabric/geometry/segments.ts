import type { Position } from "geojson";

/** A ring edge with its place, for the crossing sweep. */
export interface Segment {
  ring: number;
  index: number;
  a: Position;
  b: Position;
  minX: number;
  maxX: number;
}

/** Sign of the cross product (b - a) × (c - a): >0 left turn, <0 right, 0 collinear. */
function orientation(a: Position, b: Position, c: Position): number {
  const v = (b[0]! - a[0]!) * (c[1]! - a[1]!) - (b[1]! - a[1]!) * (c[0]! - a[0]!);
  return Math.sign(v);
}

function onSegment(a: Position, b: Position, p: Position): boolean {
  return (
    Math.min(a[0]!, b[0]!) <= p[0]! && p[0]! <= Math.max(a[0]!, b[0]!) &&
    Math.min(a[1]!, b[1]!) <= p[1]! && p[1]! <= Math.max(a[1]!, b[1]!)
  );
}

/** How two segments meet: not at all, touching (an endpoint on the other), or crossing interiors. */
export function segmentContact(s: Segment, t: Segment): "none" | "touch" | "cross" {
  const o1 = orientation(s.a, s.b, t.a);
  const o2 = orientation(s.a, s.b, t.b);
  const o3 = orientation(t.a, t.b, s.a);
  const o4 = orientation(t.a, t.b, s.b);
  if (o1 * o2 < 0 && o3 * o4 < 0) return "cross";
  if (o1 === 0 && o2 === 0 && o3 === 0 && o4 === 0) {
    // Collinear: two edges that only share an end and run on in line are fine;
    // any overlap along a stretch (a spike, a doubled edge) counts as crossing.
    const overlaps = onSegment(s.a, s.b, t.a) || onSegment(s.a, s.b, t.b) || onSegment(t.a, t.b, s.a);
    if (!overlaps) return "none";
    const sharedEnd = samePoint(s.a, t.a) || samePoint(s.a, t.b) || samePoint(s.b, t.a) || samePoint(s.b, t.b);
    const lenS = Math.abs(s.b[0]! - s.a[0]!) + Math.abs(s.b[1]! - s.a[1]!);
    const lenT = Math.abs(t.b[0]! - t.a[0]!) + Math.abs(t.b[1]! - t.a[1]!);
    const pts = [s.a, s.b, t.a, t.b];
    const span = Math.max(...pts.flatMap((p) => pts.map((q) => Math.abs(p[0]! - q[0]!) + Math.abs(p[1]! - q[1]!))));
    return sharedEnd && span >= lenS + lenT ? "touch" : "cross";
  }
  const touches =
    (o1 === 0 && onSegment(s.a, s.b, t.a)) || (o2 === 0 && onSegment(s.a, s.b, t.b)) ||
    (o3 === 0 && onSegment(t.a, t.b, s.a)) || (o4 === 0 && onSegment(t.a, t.b, s.b));
  return touches ? "touch" : "none";
}

export function samePoint(p: Position, q: Position): boolean {
  return p[0] === q[0] && p[1] === q[1];
}

/** Edges of rings (consecutive duplicate vertices already removed), sorted by min x. */
export function ringSegments(rings: Position[][]): Segment[] {
  const segments: Segment[] = [];
  rings.forEach((ring, r) => {
    for (let i = 0; i < ring.length - 1; i++) {
      const a = ring[i]!;
      const b = ring[i + 1]!;
      segments.push({ ring: r, index: i, a, b, minX: Math.min(a[0]!, b[0]!), maxX: Math.max(a[0]!, b[0]!) });
    }
  });
  return segments.sort((s, t) => s.minX - t.minX);
}

/** Calls `visit` for every pair of segments whose x ranges overlap; stops when it returns true. */
export function sweepPairs(segments: Segment[], visit: (s: Segment, t: Segment) => boolean): boolean {
  for (let i = 0; i < segments.length; i++) {
    const s = segments[i]!;
    for (let j = i + 1; j < segments.length && segments[j]!.minX <= s.maxX; j++) {
      if (visit(s, segments[j]!)) return true;
    }
  }
  return false;
}

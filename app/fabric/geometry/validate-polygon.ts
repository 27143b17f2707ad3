import type { Position } from "geojson";
import type { AreaGeometry } from "../types";
import { ringSegments, samePoint, segmentContact, sweepPairs, type Segment } from "./segments";
import { signedDoubleArea } from "./ring-orientation";

/** Why a ring is structurally unusable, or null. Needs ≥ 4 positions, closed, finite. */
function ringProblem(ring: Position[]): string | null {
  if (!Array.isArray(ring) || ring.length === 0) return "empty ring";
  if (ring.some((p) => !Array.isArray(p) || p.length < 2 || !Number.isFinite(p[0]) || !Number.isFinite(p[1]))) {
    return "ring has a non-numeric coordinate";
  }
  if (!samePoint(ring[0]!, ring[ring.length - 1]!)) return "ring is not closed (first and last points differ)";
  if (dedupe(ring).length < 4) return "ring has too few points (a ring needs at least 3 distinct corners)";
  if (allOnOneLine(dedupe(ring))) return "ring has zero area (all points on one line)";
  return null;
}

function allOnOneLine(ring: Position[]): boolean {
  const [a, b] = ring as [Position, Position];
  return ring.every((p) => (b[0]! - a[0]!) * (p[1]! - a[1]!) === (b[1]! - a[1]!) * (p[0]! - a[0]!));
}

/** Drops consecutive repeated vertices (valid, but they make zero-length edges). */
function dedupe(ring: Position[]): Position[] {
  return ring.filter((p, i) => i === 0 || !samePoint(p, ring[i - 1]!));
}

function adjacent(s: Segment, t: Segment, ringLengths: number[]): boolean {
  if (s.ring !== t.ring) return false;
  const edges = ringLengths[s.ring]! - 1;
  const d = Math.abs(s.index - t.index);
  return d === 1 || d === edges - 1;
}

/** Finds self-intersections within a ring and crossings between rings. */
function crossingProblem(rings: Position[][]): string | null {
  const lengths = rings.map((r) => r.length);
  let problem: string | null = null;
  sweepPairs(ringSegments(rings), (s, t) => {
    const contact = segmentContact(s, t);
    if (contact === "none") return false;
    if (s.ring === t.ring) {
      if (adjacent(s, t, lengths) && contact === "touch") return false;
      problem = `ring self-intersects near (${s.a[0]}, ${s.a[1]})`;
      return true;
    }
    if (contact === "touch") return false;
    problem = `rings cross each other near (${s.a[0]}, ${s.a[1]})`;
    return true;
  });
  return problem;
}

/** Even-odd point-in-ring test; boundary points count as inside. */
function insideRing(p: Position, ring: Position[]): boolean {
  let inside = false;
  for (let i = 0, j = ring.length - 1; i < ring.length; j = i++) {
    const a = ring[i]!;
    const b = ring[j]!;
    if (a[1]! > p[1]! !== b[1]! > p[1]!) {
      const x = ((b[0]! - a[0]!) * (p[1]! - a[1]!)) / (b[1]! - a[1]!) + a[0]!;
      if (p[0]! < x) inside = !inside;
    }
  }
  return inside || ring.some((q) => samePoint(p, q));
}

function polygonProblem(rings: Position[][]): string | null {
  if (!Array.isArray(rings) || rings.length === 0) return "empty polygon";
  for (const ring of rings) {
    const p = ringProblem(ring);
    if (p) return p;
  }
  const clean = rings.map(dedupe);
  const crossing = crossingProblem(clean);
  if (crossing) return crossing;
  if (clean.some((r) => signedDoubleArea(r) === 0)) return "ring has zero area";
  const shell = clean[0]!;
  const holeOutside = clean.slice(1).findIndex((hole) => hole.some((p) => !insideRing(p, shell)));
  return holeOutside >= 0 ? `hole ${holeOutside + 1} lies outside the exterior ring` : null;
}

/**
 * Why a Polygon/MultiPolygon is not a valid OGC Simple Features area, or null
 * when it is. Coordinates are compared exactly (no snapping tolerance).
 */
export function findGeometryProblem(geometry: AreaGeometry): string | null {
  if (geometry.type === "Polygon") return polygonProblem(geometry.coordinates);
  if (!Array.isArray(geometry.coordinates) || geometry.coordinates.length === 0) return "empty multipolygon";
  for (const [i, part] of geometry.coordinates.entries()) {
    const p = polygonProblem(part);
    if (p) return `part ${i + 1}: ${p}`;
  }
  const allRings = geometry.coordinates.flatMap((part) => part.map(dedupe));
  const crossing = crossingProblem(allRings);
  if (crossing) return `parts overlap: ${crossing}`;
  return partsNested(geometry.coordinates) ? "parts overlap: one part lies inside another" : null;
}

function partsNested(parts: Position[][][]): boolean {
  return parts.some((part, i) =>
    parts.some((other, j) => {
      if (i === j) return false;
      const p = part[0]![0]!;
      return insideRing(p, other[0]!) && !other[0]!.some((q) => samePoint(p, q)) &&
        !other.slice(1).some((hole) => insideRing(p, hole));
    }),
  );
}

import type { Corridor } from "~/geometry/corridor-types";
import type { PolygonCoords } from "~/geometry/take-types";
import type { Vec2 } from "~/geometry/vec2";
import type { ChordPlan } from "./arc-chords";
import { restoreBoundary } from "./boundary-segments";
import type { BoundaryPart, BoundarySegment } from "./legal-types";
import { traceTakeOutline, type OutlineRing } from "./take-outline";

/**
 * How the right-of-way's curves are chorded to find the take's topology: 0.05 mm of sagitta within
 * 0.5 units of any parcel line, 5 cm elsewhere (where no parcel line can come between a chord and
 * its arc). The arcs themselves are restored exactly afterwards, so the fine sagitta only bounds
 * how close a parcel line may pass to a curve without crossing it and still be seen on the right
 * side of it. Working units (so a little stricter in feet).
 */
export const TOPOLOGY_CHORDS: Omit<ChordPlan, "near"> = { fine: 0.00005, coarse: 0.05, nearDistance: 0.5 };

/**
 * The exact boundary of a parcel's take (parcel ∩ right-of-way): one part per connected piece,
 * each an outline and any holes, every ring walked clockwise (common practice for descriptions),
 * with right-of-way curves as true arcs of the corridor's circles. Parts are ordered from north to
 * south by their most northerly point.
 */
export function computeTakeBoundary(corridor: Corridor, polygons: PolygonCoords[], chords: Omit<ChordPlan, "near"> = TOPOLOGY_CHORDS): BoundaryPart[] {
  const outline = traceTakeOutline(corridor, polygons, chords);
  const o = outline.origin;
  const parts = outline.polygons.map((rings) => ({
    rings: rings.map((ring, i) => ({ hole: i > 0, segments: restoreBoundary(orientClockwise(ring), outline.circles, chords.nearDistance).map((s) => translate(s, o)) })),
  }));
  return parts.filter((p) => p.rings[0] && p.rings[0].segments.length >= 2).sort((a, b) => northMost(b) - northMost(a));
}

/** Signed (shoelace) area of the ring's vertices, counter-clockwise positive. */
function signedArea(points: Vec2[]): number {
  let s = 0;
  for (let i = 0; i < points.length; i++) {
    const p = points[i]!;
    const q = points[(i + 1) % points.length]!;
    s += p[0] * q[1] - q[0] * p[1];
  }
  return s / 2;
}

/** The ring walked clockwise: reversed when it runs counter-clockwise, each edge keeping its source. */
function orientClockwise(ring: OutlineRing): OutlineRing {
  if (signedArea(ring.points) <= 0) return ring;
  const n = ring.points.length;
  const points = ring.points.slice().reverse();
  // Reversed edge k runs from old point n−1−k to old point n−2−k: the old edge n−2−k.
  const edges = points.map((_, k) => ring.edges[(2 * n - 2 - k) % n]!);
  return { points, edges };
}

function translate(s: BoundarySegment, o: Vec2): BoundarySegment {
  const t = (p: Vec2): Vec2 => [p[0] + o[0], p[1] + o[1]];
  return s.kind === "line" ? { ...s, from: t(s.from), to: t(s.to) } : { ...s, from: t(s.from), to: t(s.to), centre: t(s.centre) };
}

function northMost(part: BoundaryPart): number {
  return Math.max(...part.rings[0]!.segments.map((s) => s.from[1]));
}

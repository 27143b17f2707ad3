import Flatbush from "flatbush";
import type { Vec2 } from "~/geometry/vec2";

/** Straight segments indexed by their boxes, to find the one an output edge lies along. */
export interface SegmentIndex {
  /** The first segment that both `p` and `q` lie on (within `tol`), or −1. */
  find(p: Vec2, q: Vec2): number;
}

/** Indexes segments `[a, b]`; `tol` (working units) is how far off a segment a point may lie and still be on it. */
export function indexSegments(segments: [Vec2, Vec2][], tol: number): SegmentIndex {
  if (segments.length === 0) return { find: () => -1 };
  const index = new Flatbush(segments.length);
  for (const [a, b] of segments) index.add(Math.min(a[0], b[0]) - tol, Math.min(a[1], b[1]) - tol, Math.max(a[0], b[0]) + tol, Math.max(a[1], b[1]) + tol);
  index.finish();
  return {
    find(p, q) {
      const hits = index.search(Math.min(p[0], q[0]), Math.min(p[1], q[1]), Math.max(p[0], q[0]), Math.max(p[1], q[1]));
      let best = -1;
      for (const k of hits) if (liesOn(p, segments[k]!, tol) && liesOn(q, segments[k]!, tol) && (best < 0 || k < best)) best = k;
      return best;
    },
  };
}

/** True when `p` is within `tol` of the segment (its perpendicular foot inside it, or near an end). */
export function liesOn(p: Vec2, [a, b]: [Vec2, Vec2], tol: number): boolean {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 > 0 ? ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2 : 0;
  const c = Math.min(1, Math.max(0, t));
  return Math.hypot(p[0] - a[0] - c * dx, p[1] - a[1] - c * dy) <= tol;
}

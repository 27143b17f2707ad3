import type { AnnularPiece, CorridorPiece, SliceSide } from "./corridor-types";
import { SIDE_END, SIDE_LEFT, SIDE_RIGHT, SIDE_START } from "./take-intervals";
import type { Vec2 } from "./vec2";

/**
 * The corridor's boundary as one closed path, counter-clockwise: the right line ahead (segment g =
 * piece index), the end cut (g = n), the left line back (g = 2n − piece index), the start cut
 * (g = 2n + 1). A point on it has the position u = g + f, f ∈ [0, 1] along its segment, so that
 * points can be ordered along the boundary; `integrate` gives ½∮(x dy − y dx) along it (Green's
 * theorem) relative to an origin, with arcs exact: ½[o × (B − A) + r²·Δφ] for a circle about o.
 */
export interface BoundaryPath {
  /** Position along the boundary of a crossing with tag (piece × 4 + side), or NaN when the tag is not on it. */
  position(tag: number, x: number, y: number): number;
  /** ½∮(x dy − y dx) from position u1 at point a forward to u2 at point b; NaN if it passes pieces not in `near`. */
  integrate(u1: number, a: Vec2, u2: number, b: Vec2): number;
}

interface Segment {
  from: Vec2;
  to: Vec2;
  piece: CorridorPiece;
  /** The circle an arc segment runs on (absolute centre), or null for a straight one. */
  arc: { centre: Vec2; radius: number } | null;
  /** For arc segments: true when the segment runs from the slice's first ray to its last. */
  forward: boolean;
}

/** The boundary path of corridor `pieces`, usable near the pieces in `near` (indices), relative to (ox, oy). */
export function createBoundaryPath(pieces: CorridorPiece[], near: Set<number>, ox: number, oy: number): BoundaryPath {
  const n = pieces.length;
  const segment = (g: number): Segment | null => {
    if (g < n) return sideSegment(pieces[g]!, "right");
    if (g === n) return capSegment(pieces[n - 1]!, 1, 2);
    if (g <= 2 * n) return sideSegment(pieces[2 * n - g]!, "left");
    return capSegment(pieces[0]!, 3, 0);
  };
  const rel = (p: Vec2): Vec2 => [p[0] - ox, p[1] - oy];
  const part = (s: Segment, a: Vec2, b: Vec2): number => {
    const A = rel(a);
    const B = rel(b);
    if (!s.arc) return 0.5 * (A[0] * B[1] - A[1] * B[0]);
    const o = rel(s.arc.centre);
    const ax = A[0] - o[0];
    const ay = A[1] - o[1];
    const bx = B[0] - o[0];
    const by = B[1] - o[1];
    const dphi = Math.atan2(ax * by - ay * bx, ax * bx + ay * by);
    return 0.5 * (o[0] * (B[1] - A[1]) - o[1] * (B[0] - A[0]) + s.arc.radius * s.arc.radius * dphi);
  };
  return {
    position(tag, x, y) {
      const k = tag >> 2;
      const side = tag & 3;
      const g = side === SIDE_RIGHT ? k : side === SIDE_LEFT ? 2 * n - k : side === SIDE_END && k === n - 1 ? n : side === SIDE_START && k === 0 ? 2 * n + 1 : -1;
      const s = tag >= 0 && g >= 0 ? segment(g) : null;
      return s ? g + fractionOn(s, [x, y]) : NaN;
    },
    integrate(u1, a, u2, b) {
      const G = 2 * n + 2;
      const g1 = Math.min(Math.floor(u1), G - 1);
      const g2 = Math.min(Math.floor(u2), G - 1);
      const s1 = segment(g1)!;
      if (g1 === g2 && u2 >= u1) return part(s1, a, b);
      let sum = part(s1, a, s1.to);
      for (let g = (g1 + 1) % G; g !== g2; g = (g + 1) % G) {
        const s = segment(g)!;
        if (!near.has(s.piece.index)) return NaN;
        sum += part(s, s.from, s.to);
      }
      const s2 = segment(g2)!;
      return sum + part(s2, s2.from, b);
    },
  };
}

function sideSegment(p: CorridorPiece, side: "left" | "right"): Segment {
  const [from, to] = side === "right" ? [p.corners[0], p.corners[1]] : [p.corners[2], p.corners[3]];
  if (p.kind !== "annular") return { from, to, piece: p, arc: null, forward: true };
  const circle: SliceSide = (side === "right") === p.turn > 0 ? p.outer : p.inner;
  return { from, to, piece: p, arc: { centre: [p.center[0] + circle.center[0], p.center[1] + circle.center[1]], radius: circle.radius }, forward: side === "right" };
}

function capSegment(p: CorridorPiece, i: number, j: number): Segment {
  return { from: p.corners[i as 0], to: p.corners[j as 0], piece: p, arc: null, forward: true };
}

/** Fraction along a segment: by projection on a straight one, by angle about the slice centre on an arc. */
function fractionOn(s: Segment, x: Vec2): number {
  let f: number;
  if (s.arc && s.piece.kind === "annular") {
    const q = angleFraction(s.piece, x);
    f = s.forward ? q : 1 - q;
  } else {
    const dx = s.to[0] - s.from[0];
    const dy = s.to[1] - s.from[1];
    const d2 = dx * dx + dy * dy;
    f = d2 > 0 ? ((x[0] - s.from[0]) * dx + (x[1] - s.from[1]) * dy) / d2 : 0;
  }
  return Math.min(1, Math.max(0, f));
}

function angleFraction(p: AnnularPiece, x: Vec2): number {
  const vx = x[0] - p.center[0];
  const vy = x[1] - p.center[1];
  const [fx, fy] = p.rayFrom;
  return (p.turn * Math.atan2(fx * vy - fy * vx, fx * vx + fy * vy)) / p.sweepRad;
}

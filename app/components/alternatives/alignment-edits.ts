import type { AlignmentCurveInput, AlignmentInput, AlignmentPointInput } from "~/geometry/alignment-types";

export type Point2 = [number, number];
export type CurveKind = "none" | "simple" | "compound";

/**
 * Foot of the perpendicular from `p` on segment a→b: its parameter t (clamped to 0…1) and the
 * distance from `p` to it, in the coordinates' unit (closed-form projection onto a segment).
 */
export function footOnSegment(p: Point2, a: Point2, b: Point2): { t: number; distance: number } {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const raw = len2 === 0 ? 0 : ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2;
  const t = Math.min(1, Math.max(0, raw));
  return { t, distance: Math.hypot(p[0] - (a[0] + t * dx), p[1] - (a[1] + t * dy)) };
}

/** Index of the leg (points[i] → points[i+1]) nearest to `p`; the first such leg on a tie. */
export function findNearestLeg(points: readonly AlignmentPointInput[], p: Point2): number {
  let best = 0;
  let bestDistance = Infinity;
  for (let i = 0; i + 1 < points.length; i++) {
    const { distance } = footOnSegment(p, [points[i]!.x, points[i]!.y], [points[i + 1]!.x, points[i + 1]!.y]);
    if (distance < bestDistance) {
      best = i;
      bestDistance = distance;
    }
  }
  return best;
}

/** Adds an angle point (a PI with no curve yet) at `p`, inside the nearest leg. Returns its index. */
export function insertPoint(alignment: AlignmentInput, p: Point2): { alignment: AlignmentInput; index: number } {
  const index = findNearestLeg(alignment.points, p) + 1;
  const points = [...alignment.points.slice(0, index), { x: p[0], y: p[1] }, ...alignment.points.slice(index)];
  return { alignment: { ...alignment, points }, index };
}

/** Moves point `index` (a PI, or the first or last point) to `p`, keeping its curve. */
export function movePoint(alignment: AlignmentInput, index: number, p: Point2): AlignmentInput {
  return { ...alignment, points: alignment.points.map((q, i) => (i === index ? { ...q, x: p[0], y: p[1] } : q)) };
}

/**
 * Removes point `index`. An alignment keeps at least two points, so a two-point alignment comes
 * back unchanged; a new first or last point loses its curve (ends carry none).
 */
export function deletePoint(alignment: AlignmentInput, index: number): AlignmentInput {
  if (alignment.points.length <= 2 || index < 0 || index >= alignment.points.length) return alignment;
  const points = alignment.points.filter((_, i) => i !== index);
  return { ...alignment, points: points.map((q, i) => (i === 0 || i === points.length - 1 ? withoutCurve(q) : q)) };
}

/** Sets (or, with undefined, removes) the curve at PI `index`; the ends never take one. */
export function setCurve(alignment: AlignmentInput, index: number, curve: AlignmentCurveInput | undefined): AlignmentInput {
  if (index <= 0 || index >= alignment.points.length - 1) return alignment;
  return { ...alignment, points: alignment.points.map((q, i) => (i !== index ? q : curve ? { ...q, curve } : withoutCurve(q))) };
}

/**
 * Deflection angle at PI `index`, degrees, signed (left turns positive): the angle between the
 * back and forward tangents, which equals the central angle of a curve there (Schofield & Breach,
 * Engineering Surveying, 6th ed., §10.1).
 */
export function deflectionDeg(points: readonly AlignmentPointInput[], index: number): number {
  const a = points[index - 1];
  const b = points[index];
  const c = points[index + 1];
  if (!a || !b || !c) return 0;
  const back = Math.atan2(b.y - a.y, b.x - a.x);
  const ahead = Math.atan2(c.y - b.y, c.x - b.x);
  let d = ahead - back;
  while (d > Math.PI) d -= 2 * Math.PI;
  while (d < -Math.PI) d += 2 * Math.PI;
  return (d * 180) / Math.PI;
}

/**
 * The curve a PI gets when its kind is changed in the table: a simple curve keeps the radius it
 * had (or `defaultRadius`); a new compound curve starts with R1 = R, R2 = 1.5·R — the flatter-to-
 * sharper ratio limit on open roads (TxDOT Roadway Design Manual §4.7.1) — and Δ1 = Δ/2.
 */
export function curveOfKind(kind: CurveKind, current: AlignmentCurveInput | undefined, deltaDeg: number, defaultRadius: number): AlignmentCurveInput | undefined {
  if (kind === "none") return undefined;
  const radius = current?.type === "simple" ? current.radius : current?.type === "compound" ? current.radius1 : defaultRadius;
  if (kind === "simple") return { type: "simple", radius };
  if (current?.type === "compound") return current;
  return { type: "compound", radius1: radius, radius2: Math.round(radius * 1.5), delta1: Math.round((Math.abs(deltaDeg) / 2) * 1000) / 1000 };
}

export function curveKindOf(point: AlignmentPointInput): CurveKind {
  return point.curve ? point.curve.type : "none";
}

function withoutCurve(q: AlignmentPointInput): AlignmentPointInput {
  return { x: q.x, y: q.y };
}

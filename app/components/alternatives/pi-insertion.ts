import type { AlignmentInput, CurveSummary } from "~/geometry/alignment-types";
import type { Point2 } from "./alignment-edits";

/**
 * Where a PI inserted after point `index` goes. Inside the line it is the middle of the tangent
 * that follows, between the PT of the curve at `index` and the PC of the curve at `index + 1`:
 * at (L + T_ahead − T_back) / 2 from point `index` along the leg of length L, T being the curves'
 * PI→PT and PI→PC tangent lengths (T = R·tan(Δ/2) for a simple curve, Schofield & Breach,
 * Engineering Surveying, 6th ed., §10.1). A point on the tangent leaves both curves as they were.
 * When the curves already overrun the leg, it is the leg's midpoint. After the last point the
 * line goes on along its last leg by half that leg's length. Null for a line of under two points.
 */
export function findInsertionPoint(alignment: AlignmentInput, index: number, curves: readonly CurveSummary[]): Point2 | null {
  const pts = alignment.points;
  if (pts.length < 2 || index < 0 || index >= pts.length) return null;
  const last = index === pts.length - 1;
  const a = pts[last ? index - 1 : index]!;
  const b = pts[last ? index : index + 1]!;
  const length = Math.hypot(b.x - a.x, b.y - a.y);
  if (length === 0) return null;
  const ux = (b.x - a.x) / length;
  const uy = (b.y - a.y) / length;
  if (last) return [b.x + (ux * length) / 2, b.y + (uy * length) / 2];
  const ahead = curves.find((c) => c.piIndex === index)?.tangentPT ?? 0;
  const back = curves.find((c) => c.piIndex === index + 1)?.tangentPC ?? 0;
  const along = ahead + back <= length ? (length + ahead - back) / 2 : length / 2;
  return [a.x + ux * along, a.y + uy * along];
}

/** The alignment with an angle point (no curve) at `p` right after point `index`; an old last point becomes an angle point. */
export function insertPointAfter(alignment: AlignmentInput, index: number, p: Point2): { alignment: AlignmentInput; index: number } {
  const at = index + 1;
  const points = [...alignment.points.slice(0, at), { x: p[0], y: p[1] }, ...alignment.points.slice(at)];
  return { alignment: { ...alignment, points }, index: at };
}

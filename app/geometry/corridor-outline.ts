import { countChords } from "./densify";
import { DISPLAY_CHORD_TOLERANCE } from "./corridor-tolerances";
import type { Corridor, CorridorPiece, SliceSide } from "./corridor-types";
import type { PolygonCoords } from "./take-types";
import { requirePositive } from "./validate";
import { addVec, crossVec, dotVec, rotateVec, subVec, type Vec2 } from "./vec2";

/**
 * The whole right-of-way as GeoJSON Polygon coordinates (one counter-clockwise ring, closed), arcs
 * chorded so that no sagitta exceeds `chordTolerance` (middle-ordinate formula, Schofield & Breach
 * §10.1). For display and export only: areas always come from the exact pieces.
 */
export function corridorOutline(corridor: Corridor, chordTolerance = DISPLAY_CHORD_TOLERANCE): PolygonCoords {
  const tol = requirePositive(chordTolerance, "chordTolerance");
  return [closeRing(piecesRing(corridor.pieces, 0, corridor.pieces.length - 1, tol))];
}

/**
 * The easement strips (widened corridor minus the right-of-way) as GeoJSON MultiPolygon
 * coordinates: the left strip, then the right strip; empty when there is no easement.
 */
export function easementOutline(corridor: Corridor, chordTolerance = DISPLAY_CHORD_TOLERANCE): PolygonCoords[] {
  const tol = requirePositive(chordTolerance, "chordTolerance");
  const wide = corridor.easement;
  if (!wide) return [];
  const last = (c: Corridor) => c.pieces.length - 1;
  const left = [...sideLine(corridor.pieces, 0, last(corridor), "left", tol), ...sideLine(wide.pieces, 0, last(wide), "left", tol).reverse()];
  const right = [...sideLine(wide.pieces, 0, last(wide), "right", tol), ...sideLine(corridor.pieces, 0, last(corridor), "right", tol).reverse()];
  return [[closeRing(left)], [closeRing(right)]];
}

/** Ring (not closed) around pieces `from`..`to` inclusive: right line ahead, left line back. */
export function piecesRing(pieces: CorridorPiece[], from: number, to: number, tol: number): Vec2[] {
  return [...sideLine(pieces, from, to, "right", tol), ...sideLine(pieces, from, to, "left", tol).reverse()];
}

/** One right-of-way line along pieces `from`..`to`, in station order, arcs chorded. */
export function sideLine(pieces: CorridorPiece[], from: number, to: number, side: "left" | "right", tol: number): Vec2[] {
  const out: Vec2[] = [];
  const push = (p: Vec2) => {
    const q = out[out.length - 1];
    if (!q || Math.abs(q[0] - p[0]) + Math.abs(q[1] - p[1]) > 1e-9 * (1 + Math.abs(p[0]) + Math.abs(p[1]))) out.push(p);
  };
  for (let i = from; i <= to; i++) {
    const p = pieces[i]!;
    const [a, b] = side === "right" ? [p.corners[0], p.corners[1]] : [p.corners[3], p.corners[2]];
    push(a);
    if (p.kind === "annular") {
      const circle = (side === "right") === p.turn > 0 ? p.outer : p.inner;
      for (const q of chordPoints(p.center, circle, a, b, tol)) push(q);
    }
    push(b);
  }
  return out;
}

/** Interior points of the arc of `side` (relative to `c`) from `a` to `b`, the short way. */
function chordPoints(c: Vec2, side: SliceSide, a: Vec2, b: Vec2, tol: number): Vec2[] {
  const o = addVec(c, side.center);
  const va = subVec(a, o);
  const vb = subVec(b, o);
  const phi = Math.atan2(crossVec(va, vb), dotVec(va, vb));
  const n = countChords(side.radius, Math.abs(phi), tol);
  const pts: Vec2[] = [];
  for (let k = 1; k < n; k++) pts.push(addVec(o, rotateVec(va, (phi * k) / n)));
  return pts;
}

function closeRing(points: Vec2[]): Vec2[] {
  return points.length > 0 ? [...points, points[0]!] : points;
}

import type { TangentElement } from "./alignment-types";
import type { Joint } from "./corridor-joints";
import { rightNormal } from "./corridor-joints";
import { boundsOf, flatRingArea, quadKey } from "./corridor-pieces";
import type { QuadPiece } from "./corridor-types";
import type { WidthProfile } from "./corridor-widths";
import { GeometryInputError } from "./errors";
import { roundForMessage } from "./validate";
import { addVec, crossVec, dotVec, scaleVec, subVec, type Vec2 } from "./vec2";

/**
 * The quadrilaterals of one tangent, between its two joints. Cuts inside are perpendicular, at
 * width breakpoints and every `pieceLength` from the tangent's start; a linearly tapering width
 * gives a straight right-of-way line, so every piece is an exact trapezoid. Cuts are kept out of
 * the stretch an inside mitre reaches, so each piece stays convex; a width breakpoint there is not
 * honoured (the line runs straight from the last cut to the mitre corner). Throws `tangent_overrun`
 * when mitres at both ends cross, i.e. the tangent is too short for the width at its angle points.
 */
export function buildTangentPieces(e: TangentElement, elementIndex: number, start: Joint, end: Joint, profile: WidthProfile, pieceLength: number): QuadPiece[] {
  const u = scaleVec(subVec(e.end, e.start), 1 / e.length);
  const n = rightNormal(e.azimuthDeg);
  const along = (p: Vec2) => dotVec(subVec(p, e.start), u);
  const lo = Math.max(along(start.right), along(start.left), 0);
  const hi = Math.min(along(end.right), along(end.left), e.length);
  const cuts = cutPositions(e, lo, hi, profile.breakpoints, pieceLength);
  const pieces: QuadPiece[] = [];
  let from = { t: 0, right: start.right, left: start.left };
  for (const t of [...cuts, e.length]) {
    const s = e.startStation + t;
    const centre = addVec(e.start, scaleVec(u, t));
    const to = t === e.length ? { t, right: end.right, left: end.left } : { t, right: addVec(centre, scaleVec(n, profile.right(s))), left: addVec(centre, scaleVec(n, -profile.left(s))) };
    pieces.push(makeQuad(e, elementIndex, from, to, u, profile));
    from = to;
  }
  return pieces;
}

function cutPositions(e: TangentElement, lo: number, hi: number, breakpoints: number[], pieceLength: number): number[] {
  const margin = 1e-9 * Math.max(1, e.length);
  const cuts = breakpoints.map((b) => b - e.startStation).filter((t) => t > lo + margin && t < hi - margin);
  for (let k = 1; k * pieceLength < hi - pieceLength / 4; k++) if (k * pieceLength > lo + margin) cuts.push(k * pieceLength);
  cuts.sort((a, b) => a - b);
  return cuts.filter((t, i) => i === 0 || t - cuts[i - 1]! > margin);
}

type Cut = { t: number; right: Vec2; left: Vec2 };

function makeQuad(e: TangentElement, elementIndex: number, from: Cut, to: Cut, u: Vec2, profile: WidthProfile): QuadPiece {
  const corners: [Vec2, Vec2, Vec2, Vec2] = [from.right, to.right, to.left, from.left];
  const o = corners[0];
  const local = corners.flatMap((c) => [c[0] - o[0], c[1] - o[1]]);
  const stationFrom = e.startStation + from.t;
  const stationTo = e.startStation + to.t;
  requireConvex(local, stationTo);
  const piece: QuadPiece = {
    kind: "quad",
    index: 0,
    elementIndex,
    stationFrom,
    stationTo,
    length: to.t - from.t,
    corners,
    bounds: boundsOf(corners),
    area: flatRingArea(local),
    tapered: profile.left(stationFrom) !== profile.left(stationTo) || profile.right(stationFrom) !== profile.right(stationTo),
    key: "",
    along: alongAxis(u, subVec(o, addVec(e.start, scaleVec(u, from.t)))),
    local,
  };
  piece.key = quadKey(piece);
  return piece;
}

function alongAxis(u: Vec2, cornerFromAxis: Vec2): [number, number, number] {
  const ux = Math.round(u[0] * 1e12) / 1e12;
  const uy = Math.round(u[1] * 1e12) / 1e12;
  return [ux, uy, Math.round((cornerFromAxis[0] * ux + cornerFromAxis[1] * uy) * 1e9) / 1e9];
}

/** Every corner turns left (counter-clockwise) and the area is positive; else the lines crossed. */
function requireConvex(local: number[], station: number): void {
  let ok = flatRingArea(local) > 0;
  for (let i = 0; i < 4 && ok; i++) {
    const a: Vec2 = [local[2 * i]!, local[2 * i + 1]!];
    const b: Vec2 = [local[(2 * i + 2) % 8]!, local[(2 * i + 3) % 8]!];
    const c: Vec2 = [local[(2 * i + 4) % 8]!, local[(2 * i + 5) % 8]!];
    const scale = Math.max(1, Math.abs(a[0]) + Math.abs(a[1]) + Math.abs(c[0]) + Math.abs(c[1]));
    if (crossVec(subVec(b, a), subVec(c, b)) < -1e-12 * scale * scale) ok = false;
  }
  if (!ok) {
    throw new GeometryInputError("tangent_overrun", `the right-of-way lines cross before station ${roundForMessage(station)}: the tangent is too short for the width at its angle points`, { field: "corridor" });
  }
}

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
 * width breakpoints and every `pieceLength` — measured from the start over the first half and
 * from the end over the second, so that when a neighbouring curve moves one end along the line
 * the pieces anchored at the other end keep their exact coordinates (and their cached takes). A
 * linearly tapering width gives a straight right-of-way line, so every piece is an exact
 * trapezoid. Cuts are kept out of the stretch an inside mitre reaches, so each piece stays
 * convex; a width breakpoint there is not honoured (the line runs straight from the last cut to
 * the mitre corner). `azimuthDeg` is the line's direction; the caller passes the neighbouring
 * curve's tangent azimuth, which comes straight from the PIs, rather than the direction between
 * the tangent's computed ends, whose round-off changes whenever one end moves along the line.
 * Throws `tangent_overrun` when the mitres at both ends cross.
 */
export function buildTangentPieces(e: TangentElement, elementIndex: number, start: Joint, end: Joint, profile: WidthProfile, pieceLength: number, azimuthDeg = e.azimuthDeg): QuadPiece[] {
  const n = rightNormal(azimuthDeg);
  const u: Vec2 = [-n[1], n[0]];
  const along = (p: Vec2) => dotVec(subVec(p, e.start), u);
  const lo = Math.max(along(start.right), along(start.left), 0);
  const hi = Math.min(along(end.right), along(end.left), e.length);
  const pieces: QuadPiece[] = [];
  let from: Cut = { t: 0, fromEnd: null, centre: e.start, right: start.right, left: start.left };
  for (const c of cutPositions(e, lo, hi, profile.breakpoints, pieceLength)) {
    const s = e.startStation + c.t;
    const centre = c.fromEnd === null ? addVec(e.start, scaleVec(u, c.t)) : subVec(e.end, scaleVec(u, c.fromEnd));
    const to: Cut = { ...c, centre, right: addVec(centre, scaleVec(n, profile.right(s))), left: addVec(centre, scaleVec(n, -profile.left(s))) };
    pieces.push(makeQuad(e, elementIndex, from, to, u, profile));
    from = to;
  }
  pieces.push(makeQuad(e, elementIndex, from, { t: e.length, fromEnd: 0, centre: e.end, right: end.right, left: end.left }, u, profile));
  return pieces;
}

/** Interior cuts in order: `t` from the start, and `fromEnd` (distance back from the end) for cuts anchored there. */
function cutPositions(e: TangentElement, lo: number, hi: number, breakpoints: number[], pieceLength: number): { t: number; fromEnd: number | null }[] {
  const L = e.length;
  const margin = 1e-9 * Math.max(1, L);
  const cuts = breakpoints.map((b) => ({ t: b - e.startStation, fromEnd: b - e.startStation > L / 2 ? e.endStation - b : null }));
  for (let k = 1; k * pieceLength <= L / 2; k++) cuts.push({ t: k * pieceLength, fromEnd: null });
  for (let k = 1; L - k * pieceLength > L / 2 + pieceLength / 4; k++) cuts.push({ t: L - k * pieceLength, fromEnd: k * pieceLength });
  const inside = cuts.filter((c) => c.t > lo + margin && c.t < hi - margin).sort((a, b) => a.t - b.t);
  return inside.filter((c, i) => i === 0 || c.t - inside[i - 1]!.t > margin);
}

/** A cut across the tangent: position, anchoring, centreline point and the two corners. */
type Cut = { t: number; fromEnd: number | null; centre: Vec2; right: Vec2; left: Vec2 };

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
    // Between two cuts anchored at the end, the length comes from the end (exact under a moved start).
    length: from.fromEnd !== null && to.fromEnd !== null ? from.fromEnd - to.fromEnd : to.t - from.t,
    corners,
    bounds: boundsOf(corners),
    area: flatRingArea(local),
    tapered: profile.left(stationFrom) !== profile.left(stationTo) || profile.right(stationFrom) !== profile.right(stationTo),
    key: "",
    along: alongAxis(u, subVec(o, from.centre)),
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

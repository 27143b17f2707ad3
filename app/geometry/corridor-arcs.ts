import { degToRad } from "./angles";
import type { ArcElement } from "./alignment-types";
import { sideRadii } from "./corridor-joints";
import { annularKey } from "./corridor-pieces";
import { annularBounds, makeWedge } from "./corridor-wedge";
import { circleThrough, containsOrigin, rayToCircle, wedgeCircleArea } from "./corridor-slices";
import { MAX_SLICE_RAD } from "./corridor-tolerances";
import type { AnnularPiece, SliceSide } from "./corridor-types";
import type { WidthProfile } from "./corridor-widths";
import { GeometryInputError } from "./errors";
import { SAME_POINT_REL } from "./tolerances";
import { roundForMessage } from "./validate";
import { addVec, scaleVec, subVec, unitAtRad, type Vec2 } from "./vec2";

interface Ray {
  theta: number;
  u: Vec2;
}

/**
 * Annular slices of one arc: between radial lines at width breakpoints and at most every
 * min(90°, pieceLength / R), inner radius R − w_inside and outer R + w_outside (a left turn has its
 * inside on the left). Where a width tapers, a slice is halved until its fitted circle stays within
 * `spiralTolerance` of the spiral edge at the quarter rays. Throws `offset_exceeds_radius` when an
 * inside half-width reaches the centre of the curve.
 */
export function buildArcPieces(e: ArcElement, elementIndex: number, profile: WidthProfile, pieceLength: number, spiralTolerance: number): AnnularPiece[] {
  const sweep = degToRad(Math.abs(e.deltaDeg));
  const turn = e.direction === "left" ? 1 : -1;
  const a0 = Math.atan2(e.start[1] - e.center[1], e.start[0] - e.center[0]);
  const ray = (theta: number): Ray => ({ theta, u: unitAtRad(a0 + turn * theta) });
  const first: Ray = { theta: 0, u: scaleVec(subVec(e.start, e.center), 1 / e.radius) };
  const endVec = subVec(e.end, e.center);
  const last: Ray = { theta: sweep, u: scaleVec(endVec, 1 / Math.hypot(endVec[0], endVec[1])) };
  const step = Math.min(MAX_SLICE_RAD, pieceLength / e.radius);
  const cuts = profile.breakpoints.map((b) => (b - e.startStation) / e.radius).filter((t) => t > 1e-12 && t < sweep - 1e-12);
  for (let k = 1; k * step < sweep - step / 4; k++) cuts.push(k * step);
  cuts.sort((a, b) => a - b);
  const rays = [first, ...cuts.filter((t, i) => i === 0 || t - cuts[i - 1]! > 1e-12).map(ray), last];
  const pieces: AnnularPiece[] = [];
  const ctx = { e, elementIndex, profile, turn: turn as 1 | -1, ray, spiralTolerance };
  for (let i = 1; i < rays.length; i++) sliceBetween(ctx, rays[i - 1]!, rays[i]!, pieces, 0);
  return pieces;
}

type Ctx = { e: ArcElement; elementIndex: number; profile: WidthProfile; turn: 1 | -1; ray: (theta: number) => Ray; spiralTolerance: number };

function radiiAt(ctx: Ctx, theta: number): { right: number; left: number } {
  const s = ctx.e.startStation + ctx.e.radius * theta;
  const wR = ctx.profile.right(s);
  const wL = ctx.profile.left(s);
  const r = sideRadii(ctx.e, wR, wL);
  const inside = ctx.turn > 0 ? { side: "left", w: wL, r: r.left } : { side: "right", w: wR, r: r.right };
  if (!(inside.r > SAME_POINT_REL * ctx.e.radius)) {
    throw new GeometryInputError(
      "offset_exceeds_radius",
      `the ${inside.side} half-width of ${roundForMessage(inside.w)} reaches the centre of the ${roundForMessage(ctx.e.radius)} radius curve at PI ${ctx.e.piIndex}`,
      { field: `corridor.${inside.side}`, piIndex: ctx.e.piIndex, radius: ctx.e.radius },
    );
  }
  return r;
}

function sliceBetween(ctx: Ctx, a: Ray, b: Ray, out: AnnularPiece[], depth: number): void {
  const ra = radiiAt(ctx, a.theta);
  const rb = radiiAt(ctx, b.theta);
  const mid = ctx.ray((a.theta + b.theta) / 2);
  const right = fitSide(ctx, a, b, mid, ra.right, rb.right);
  const left = fitSide(ctx, a, b, mid, ra.left, rb.left);
  if ((!right || !left) && depth < 40) {
    sliceBetween(ctx, a, mid, out, depth + 1);
    sliceBetween(ctx, mid, b, out, depth + 1);
    return;
  }
  if (!right || !left) throw new GeometryInputError("out_of_range", `a width taper on the curve at PI ${ctx.e.piIndex} is too steep to follow`, { field: "corridor.ranges" });
  out.push(makeSlice(ctx, a, b, right, left, ra.right !== rb.right || ra.left !== rb.left));
}

/** The circle carrying one side, relative to the centre; undefined when the slice must be halved. */
function fitSide(ctx: Ctx, a: Ray, b: Ray, mid: Ray, r0: number, r1: number): SliceSide | undefined {
  if (r0 === r1) return { center: [0, 0], radius: r0 };
  const side = circleThrough(scaleVec(a.u, r0), scaleVec(mid.u, (r0 + r1) / 2), scaleVec(b.u, r1));
  if (!containsOrigin(side)) return undefined;
  for (const q of [0.25, 0.75]) {
    const u = ctx.ray(a.theta + q * (b.theta - a.theta)).u;
    if (Math.abs(rayToCircle(u, side) - (r0 + q * (r1 - r0))) > ctx.spiralTolerance) return undefined;
  }
  return side;
}

function makeSlice(ctx: Ctx, a: Ray, b: Ray, right: SliceSide, left: SliceSide, tapered: boolean): AnnularPiece {
  const { e, turn } = ctx;
  const c = e.center;
  const sweepRad = b.theta - a.theta;
  const [inner, outer] = turn > 0 ? [left, right] : [right, left];
  const at = (u: Vec2, side: SliceSide) => scaleVec(u, rayToCircle(u, side));
  const ccw = turn > 0 ? [a.u, b.u] : [b.u, a.u];
  const pa = at(ccw[0]!, outer);
  const pb = at(ccw[1]!, outer);
  const area = wedgeCircleArea(pa, pb, outer, sweepRad) - wedgeCircleArea(at(ccw[0]!, inner), at(ccw[1]!, inner), inner, sweepRad);
  const abs = (p: Vec2) => addVec(c, p);
  const corners: [Vec2, Vec2, Vec2, Vec2] = [abs(at(a.u, right)), abs(at(b.u, right)), abs(at(b.u, left)), abs(at(a.u, left))];
  const piece: AnnularPiece = {
    kind: "annular",
    index: 0,
    elementIndex: ctx.elementIndex,
    stationFrom: e.startStation + e.radius * a.theta,
    stationTo: b.theta === degToRad(Math.abs(e.deltaDeg)) ? e.endStation : e.startStation + e.radius * b.theta,
    length: e.radius * sweepRad,
    corners,
    bounds: annularBounds(c, outer, pa, pb, corners),
    area,
    tapered,
    key: "",
    center: c,
    centerlineRadius: e.radius,
    turn,
    rayFrom: a.u,
    rayTo: b.u,
    sweepRad,
    inner: { center: inner.center, radius: inner.radius },
    outer: { center: outer.center, radius: outer.radius },
    wedge: makeWedge(ccw[0]!, ccw[1]!, outer, sweepRad),
  };
  piece.key = annularKey(piece);
  return piece;
}

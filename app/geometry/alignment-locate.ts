import { azimuthDegFromMathRad, mathRadFromAzimuthDeg } from "./bearings";
import { degToRad } from "./angles";
import type { AlignmentElement, ArcElement } from "./alignment-types";
import { GeometryInputError } from "./errors";
import { requireFinite } from "./validate";
import { addVec, crossVec, dotVec, lengthVec, rotateVec, scaleVec, subVec, unitAtRad, type Vec2 } from "./vec2";

/** A point on the line with its forward direction. */
export interface LocatedPoint {
  point: Vec2;
  azimuthDeg: number;
  elementIndex: number;
}

/**
 * Point and forward azimuth at an internal station (start station + distance, no equations).
 * Throws `out_of_range` off the ends (a tolerance of round-off is allowed at the ends).
 */
export function locateAtInternalStation(elements: AlignmentElement[], station: number): LocatedPoint {
  const s = requireFinite(station, "station");
  const first = elements[0];
  const last = elements[elements.length - 1];
  if (!first || !last) throw new GeometryInputError("invalid_alignment", "the alignment has no elements", { field: "elements" });
  const slack = 1e-9 * Math.max(1, Math.abs(last.endStation - first.startStation));
  if (s < first.startStation - slack || s > last.endStation + slack) {
    throw new GeometryInputError("out_of_range", `station ${s} is off the alignment (${first.startStation} to ${last.endStation})`, { field: "station" });
  }
  let lo = 0;
  let hi = elements.length - 1;
  while (lo < hi) {
    const mid = (lo + hi) >> 1;
    if (elements[mid]!.endStation < s) lo = mid + 1;
    else hi = mid;
  }
  const e = elements[lo]!;
  const along = Math.min(Math.max(s - e.startStation, 0), e.length);
  return { ...pointOnElement(e, along), elementIndex: lo };
}

function pointOnElement(e: AlignmentElement, along: number): { point: Vec2; azimuthDeg: number } {
  if (e.type === "tangent") {
    const u = unitAtRad(mathRadFromAzimuthDeg(e.azimuthDeg));
    return { point: addVec(e.start, scaleVec(u, along)), azimuthDeg: e.azimuthDeg };
  }
  const sign = e.direction === "left" ? 1 : -1;
  const turn = (sign * along) / e.radius;
  const point = addVec(e.center, rotateVec(subVec(e.start, e.center), turn));
  return { point, azimuthDeg: azimuthDegFromMathRad(mathRadFromAzimuthDeg(e.startAzimuthDeg) + turn) };
}

/** Station and offset of a point: offset positive to the right looking ahead (up-station). */
export interface StationOffset {
  station: number;
  offset: number;
  elementIndex: number;
}

/**
 * Inverse: the nearest foot of perpendicular on any element (tangent or arc). When the point is
 * beyond every element's extent the nearer end of the line is used and the offset is signed
 * against that element.
 */
export function findStationOffset(elements: AlignmentElement[], point: Vec2): StationOffset {
  const p: Vec2 = [requireFinite(point[0], "point.x"), requireFinite(point[1], "point.y")];
  let best: (StationOffset & { distance: number }) | undefined;
  elements.forEach((e, i) => {
    const c = e.type === "tangent" ? projectOnTangent(e.start, e.end, p, e.length) : projectOnArc(e, p);
    const candidate = { station: e.startStation + c.along, offset: c.offset, elementIndex: i, distance: c.distance };
    if (!best || candidate.distance < best.distance) best = candidate;
  });
  if (!best) throw new GeometryInputError("invalid_alignment", "the alignment has no elements", { field: "elements" });
  return { station: best.station, offset: best.offset, elementIndex: best.elementIndex };
}

function projectOnTangent(a: Vec2, b: Vec2, p: Vec2, length: number): { along: number; offset: number; distance: number } {
  const u = scaleVec(subVec(b, a), 1 / length);
  const w = subVec(p, a);
  const t = dotVec(w, u);
  const along = Math.min(Math.max(t, 0), length);
  const offset = -crossVec(u, w);
  const outside = t < 0 ? -t : t > length ? t - length : 0;
  return { along, offset, distance: Math.hypot(outside, offset) };
}

function projectOnArc(e: ArcElement, p: Vec2): { along: number; offset: number; distance: number } {
  const sign = e.direction === "left" ? 1 : -1;
  const w = subVec(p, e.center);
  const r0 = subVec(e.start, e.center);
  const swept = sign * Math.atan2(crossVec(r0, w), dotVec(r0, w));
  const total = degToRad(Math.abs(e.deltaDeg));
  const mid = total / 2;
  // Angle measured from the start in the turning direction, wrapped around the arc's middle.
  const a = mid + Math.atan2(Math.sin(swept - mid), Math.cos(swept - mid));
  const radial = lengthVec(w);
  const offset = sign * (radial - e.radius);
  if (a >= 0 && a <= total) return { along: a * e.radius, offset, distance: Math.abs(offset) };
  const end = a < 0 ? e.start : e.end;
  return { along: a < 0 ? 0 : e.length, offset, distance: lengthVec(subVec(p, end)) };
}

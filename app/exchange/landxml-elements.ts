import type { Vec2 } from "../geometry";
import { ExchangeInputError } from "./exchange-errors";
import { childNamed, type XmlElement } from "./xml-tree";

/** A straight element of a LandXML `CoordGeom`, in Takeline's [x, y] and units. */
export interface ChainLine {
  kind: "line";
  start: Vec2;
  end: Vec2;
  /** Position in the CoordGeom (0-based), for messages. */
  index: number;
  staStart?: number;
}

/** A circular arc; `sign` +1 turns left (ccw), −1 right (cw); `deltaRad` is unsigned. */
export interface ChainArc {
  kind: "arc";
  start: Vec2;
  end: Vec2;
  center: Vec2;
  sign: 1 | -1;
  radius: number;
  deltaRad: number;
  index: number;
  staStart?: number;
  /** The arc's own PI as written in the file, if any (checked, not trusted). */
  pi?: Vec2;
  /** `radius` attribute as written (scaled), if any. */
  radiusAttr?: number;
}

export type ChainElement = ChainLine | ChainArc;

/** Named points of `CgPoints`, for `pntRef` (XSD PointType: the coordinate text wins if both are given). */
export type PointRefs = Map<string, string>;

/** Reads "north east [elev]" (XSD PointType) into [x, y] scaled to Takeline units. */
function readPoint(el: XmlElement | undefined, refs: PointRefs, scale: number): Vec2 | undefined {
  if (!el) return undefined;
  const text = el.text.trim() || refs.get(el.attrs.pntRef ?? "") || "";
  const [n, e] = text.split(/\s+/).map(Number);
  if (n === undefined || e === undefined || !Number.isFinite(n) || !Number.isFinite(e)) return undefined;
  return [e * scale, n * scale];
}

const sub = (a: Vec2, b: Vec2): Vec2 => [a[0] - b[0], a[1] - b[1]];
const cross = (a: Vec2, b: Vec2) => a[0] * b[1] - a[1] * b[0];

/** Centre of the arc tangent to PI→Start and PI→End at Start and End: where the two normals meet. */
function centerFromPi(start: Vec2, end: Vec2, pi: Vec2): Vec2 | undefined {
  const n1: Vec2 = [-(pi[1] - start[1]), pi[0] - start[0]];
  const n2: Vec2 = [-(end[1] - pi[1]), end[0] - pi[0]];
  const den = cross(n1, n2);
  if (Math.abs(den) < 1e-15 * Math.hypot(...n1) * Math.hypot(...n2)) return undefined;
  const t = cross(sub(end, start), n2) / den;
  return [start[0] + t * n1[0], start[1] + t * n1[1]];
}

/** Centre of the minor arc of radius r from Start to End turning `sign` (used only without Center and PI). */
function centerFromRadius(start: Vec2, end: Vec2, r: number, sign: 1 | -1): Vec2 | undefined {
  const chord = sub(end, start);
  const c = Math.hypot(...chord);
  if (!(r >= c / 2)) return undefined;
  const h = Math.sqrt(r * r - (c * c) / 4);
  const mid: Vec2 = [(start[0] + end[0]) / 2, (start[1] + end[1]) / 2];
  return [mid[0] - (sign * h * chord[1]) / c, mid[1] + (sign * h * chord[0]) / c];
}

function unsupported(message: string, index: number): never {
  throw new ExchangeInputError("unsupported_geometry", message, { element: index });
}

function readCurve(el: XmlElement, index: number, refs: PointRefs, scale: number): ChainArc {
  const rot = el.attrs.rot;
  if (rot !== "cw" && rot !== "ccw") unsupported(`Curve ${index + 1} has no rot="cw|ccw".`, index);
  const sign: 1 | -1 = rot === "ccw" ? 1 : -1;
  const start = readPoint(childNamed(el, "Start"), refs, scale);
  const end = readPoint(childNamed(el, "End"), refs, scale);
  const pi = readPoint(childNamed(el, "PI"), refs, scale);
  const radiusAttr = el.attrs.radius !== undefined ? Number(el.attrs.radius) * scale : undefined;
  if (!start || !end) unsupported(`Curve ${index + 1} lacks a Start or End point.`, index);
  const center =
    readPoint(childNamed(el, "Center"), refs, scale) ??
    (pi && centerFromPi(start, end, pi)) ??
    (radiusAttr !== undefined ? centerFromRadius(start, end, radiusAttr, sign) : undefined);
  if (!center) unsupported(`Curve ${index + 1} has neither a Center, a PI nor a usable radius.`, index);
  const a = sub(start, center);
  const b = sub(end, center);
  let delta = sign * Math.atan2(cross(a, b), a[0] * b[0] + a[1] * b[1]);
  if (delta <= 0) delta += 2 * Math.PI;
  const arc: ChainArc = { kind: "arc", start, end, center, sign, radius: Math.hypot(...a), deltaRad: delta, index };
  if (pi) arc.pi = pi;
  if (radiusAttr !== undefined && Number.isFinite(radiusAttr)) arc.radiusAttr = radiusAttr;
  const sta = Number(el.attrs.staStart);
  if (el.attrs.staStart !== undefined && Number.isFinite(sta)) arc.staStart = sta * scale;
  return arc;
}

function readLine(el: XmlElement, index: number, refs: PointRefs, scale: number): ChainLine {
  const start = readPoint(childNamed(el, "Start"), refs, scale);
  const end = readPoint(childNamed(el, "End"), refs, scale);
  if (!start || !end) unsupported(`Line ${index + 1} lacks a Start or End point.`, index);
  const line: ChainLine = { kind: "line", start, end, index };
  const sta = Number(el.attrs.staStart);
  if (el.attrs.staStart !== undefined && Number.isFinite(sta)) line.staStart = sta * scale;
  return line;
}

/**
 * The Line and Curve elements of a `CoordGeom`, in order. Spirals and irregular lines are
 * refused (`unsupported_geometry`): Takeline's alignments are tangents and circular arcs.
 * The coordinates are authoritative; a Curve's centre comes from Center, else from its PI,
 * else from its radius (the minor arc).
 */
export function readChainElements(coordGeom: XmlElement, refs: PointRefs, scale: number): ChainElement[] {
  return coordGeom.children.map((el, index) => {
    if (el.name === "Line") return readLine(el, index, refs, scale);
    if (el.name === "Curve") return readCurve(el, index, refs, scale);
    return unsupported(`Element ${index + 1} of the CoordGeom is a ${el.name}; Takeline reads only Line and Curve (no spirals).`, index);
  });
}

import { radToDeg } from "~/geometry/angles";
import { azimuthDegOfVector, formatAzimuthAsBearing } from "~/geometry/bearings";
import { formatDms } from "~/geometry/angles";
import type { Vec2 } from "~/geometry/vec2";
import { formatDistance } from "./legal-format";
import type { ArcCourse, BoundarySegment, Course, LineCourse } from "./legal-types";
import type { LengthUnit } from "~/geometry/units";

/** A curve starts on a tangent when its direction there is within half a second of the course before (what the bearings can show). */
const TANGENT_RAD = (0.5 / 3600) * (Math.PI / 180);

/**
 * Courses of one closed ring, walked in the ring's order: each straight segment a bearing and
 * distance; each arc its radius, central angle Δ, arc length L = R·Δ, chord bearing and chord
 * C = 2R·sin(Δ/2) (Schofield & Breach, *Engineering Surveying*, 6th ed., §10.1 "Circular curves"),
 * direction of turn, and whether it is tangent to the course before (else its radial bearing is
 * given, as non-tangent curves need; common practice). Bearings are quadrant bearings from grid north.
 */
export function buildCourses(segments: BoundarySegment[], part: number, ring: number, units: LengthUnit): Course[] {
  return segments.map((s, i) => {
    const before = segments[(i + segments.length - 1) % segments.length]!;
    return s.kind === "line" ? lineCourse(s, part, ring, units) : arcCourse(s, endDirection(before), part, ring, units);
  });
}

function lineCourse(s: Extract<BoundarySegment, { kind: "line" }>, part: number, ring: number, units: LengthUnit): LineCourse {
  const azimuthDeg = azimuthDegOfVector(s.to[0] - s.from[0], s.to[1] - s.from[1]);
  const distance = Math.hypot(s.to[0] - s.from[0], s.to[1] - s.from[1]);
  const bearing = formatAzimuthAsBearing(azimuthDeg);
  const along = s.on === "parcel" ? "along the line of said parcel" : "along the new right-of-way line";
  return { kind: "line", part, ring, from: s.from, to: s.to, on: s.on, azimuthDeg, distance, bearing, text: `${along}, ${bearing}, a distance of ${formatDistance(distance, units)}` };
}

function arcCourse(s: Extract<BoundarySegment, { kind: "arc" }>, directionBefore: number, part: number, ring: number, units: LengthUnit): ArcCourse {
  const delta = Math.abs(s.sweepRad);
  const direction = s.sweepRad > 0 ? "left" : "right";
  const chordDistance = 2 * s.radius * Math.sin(delta / 2);
  const chordAzimuthDeg = azimuthDegOfVector(s.to[0] - s.from[0], s.to[1] - s.from[1]);
  const radialAzimuthDeg = azimuthDegOfVector(s.centre[0] - s.from[0], s.centre[1] - s.from[1]);
  const tangent = Math.abs(angleBetween(directionBefore, startDirection(s))) <= TANGENT_RAD;
  const deltaDeg = radToDeg(delta);
  const bearing = formatAzimuthAsBearing(chordAzimuthDeg);
  const radialBearing = formatAzimuthAsBearing(radialAzimuthDeg);
  const d = (v: number) => formatDistance(v, units);
  const text =
    `along the new right-of-way line on a ${tangent ? "tangent" : "non-tangent"} curve to the ${direction} having a radius of ${d(s.radius)}, ` +
    `a central angle of ${formatDms(deltaDeg)} and an arc length of ${d(s.radius * delta)}, subtended by a chord bearing ${bearing}, ${d(chordDistance)}` +
    (tangent ? "" : ` (the radial line at the start of the curve bears ${radialBearing})`);
  return {
    kind: "arc",
    part,
    ring,
    from: s.from,
    to: s.to,
    on: "right-of-way",
    center: s.centre,
    radius: s.radius,
    arcLength: s.radius * delta,
    deltaDeg,
    delta: formatDms(deltaDeg),
    direction,
    chordAzimuthDeg,
    chordDistance,
    tangent,
    radialAzimuthDeg,
    radialBearing,
    bearing,
    text,
  };
}

/** Direction of travel (math radians, counter-clockwise from east) at the start of a segment. */
function startDirection(s: BoundarySegment): number {
  if (s.kind === "line") return Math.atan2(s.to[1] - s.from[1], s.to[0] - s.from[0]);
  return travelOnCircle(s.centre, s.from, s.sweepRad);
}

/** Direction of travel at the end of a segment. */
function endDirection(s: BoundarySegment): number {
  if (s.kind === "line") return Math.atan2(s.to[1] - s.from[1], s.to[0] - s.from[0]);
  return travelOnCircle(s.centre, s.to, s.sweepRad);
}

/** The tangent direction at `p` on a circle about `o`, turning the way `sweep` does. */
function travelOnCircle(o: Vec2, p: Vec2, sweep: number): number {
  return Math.atan2(p[1] - o[1], p[0] - o[0]) + (sweep > 0 ? Math.PI / 2 : -Math.PI / 2);
}

function angleBetween(a: number, b: number): number {
  return Math.atan2(Math.sin(b - a), Math.cos(b - a));
}

import type { Vec2 } from "~/geometry/vec2";

/**
 * Shapes of a take's boundary and of its legal description. Coordinates are [x = easting,
 * y = northing] in the project's working CRS; lengths in the project's unit; angles in degrees at
 * this edge (radians inside the builders); azimuths clockwise from grid north.
 */

/** Which existing or new line a straight piece of the boundary runs along. */
export type LineSource = "parcel" | "right-of-way";

/** One straight or circular piece of a take's boundary, as walked. */
export type BoundarySegment =
  | { kind: "line"; from: Vec2; to: Vec2; on: LineSource }
  | {
      kind: "arc";
      from: Vec2;
      to: Vec2;
      centre: Vec2;
      radius: number;
      /** Signed angle swept about the centre from `from` to `to`: counter-clockwise (a left turn) positive. */
      sweepRad: number;
    };

/** A closed ring of segments: the outline of a take part, or a hole excepted from it. */
export interface BoundaryRing {
  segments: BoundarySegment[];
  hole: boolean;
}

/** One connected piece of a take: its outline, then any holes. */
export interface BoundaryPart {
  rings: BoundaryRing[];
}

interface CourseBase {
  /** Part number (1-based) and ring within it (0 = the outline, 1… = excepted holes). */
  part: number;
  ring: number;
  from: Vec2;
  to: Vec2;
  /** The bearing and distance of the course (for an arc: of its chord) as written, rounded. */
  bearing: string;
  /** Plain-language clause of this course as it appears in the text. */
  text: string;
}

/** A straight course: bearing and distance. */
export interface LineCourse extends CourseBase {
  kind: "line";
  on: LineSource;
  azimuthDeg: number;
  distance: number;
}

/** A circular course: the five curve elements, direction, and whether it leaves the course before on a tangent. */
export interface ArcCourse extends CourseBase {
  kind: "arc";
  on: "right-of-way";
  center: Vec2;
  radius: number;
  arcLength: number;
  /** Central angle, degrees (positive), and as written. */
  deltaDeg: number;
  delta: string;
  direction: "left" | "right";
  chordAzimuthDeg: number;
  chordDistance: number;
  /** True when the curve starts along the direction the course before it ended in. */
  tangent: boolean;
  /** Azimuth and bearing from the start of the curve to its centre (the radial line). */
  radialAzimuthDeg: number;
  radialBearing: string;
}

export type Course = LineCourse | ArcCourse;

/** Misclosure of the courses of a ring walked from its point of beginning. */
export interface RingClosure {
  /** At full precision (azimuths and distances as computed). */
  closure: number;
  /** With bearings rounded to the second and distances to 0.001, as written. */
  roundedClosure: number;
  perimeter: number;
}

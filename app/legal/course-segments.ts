import type { BoundarySegment, Course } from "./legal-types";

/** The boundary segments a ring's courses describe (for drawing them): arcs from their centre, radius, turn and central angle. */
export function segmentsOfCourses(courses: Course[]): BoundarySegment[] {
  return courses.map((c) =>
    c.kind === "line"
      ? { kind: "line", from: c.from, to: c.to, on: c.on }
      : { kind: "arc", from: c.from, to: c.to, centre: c.center, radius: c.radius, sweepRad: (c.direction === "left" ? 1 : -1) * ((c.deltaDeg * Math.PI) / 180) },
  );
}

/** Public API of the legal descriptions of takes. Pure TypeScript; see README.md. */
export { describeTake, type DescribeTakeInput, type TakeDescription } from "./describe-take";
export { DRAFT_CAUTION, type PartDescription, type RingDescription, type RingStart } from "./description-text";
export { computeTakeBoundary, TOPOLOGY_CHORDS } from "./take-boundary";
export { computeRingArea } from "./ring-area";
export { describeArea, formatCoordinates, formatDistance } from "./legal-format";
export type { ArcCourse, BoundaryPart, BoundaryRing, BoundarySegment, Course, LineCourse, LineSource, RingClosure } from "./legal-types";
export type { Commencement } from "./beginning-point";
export { boundaryToPolygons, EXPORT_CHORD_TOLERANCE } from "./boundary-polygon";
export { segmentsOfCourses } from "./course-segments";

import { parseBearingToAzimuthDeg, unitVectorFromAzimuthDeg } from "~/geometry/bearings";
import { roundDistance } from "./legal-format";
import type { Course, RingClosure } from "./legal-types";

/**
 * Walks a ring's courses from its point of beginning and measures how far the walk ends from it:
 * the linear misclosure √(ΣΔE² + ΣΔN²) of a closed traverse (Ghilani & Wolf, *Elementary
 * Surveying*, traverse computations; from memory for the chapter). An arc is walked along its
 * chord (chord bearing and chord distance). `closure` uses the azimuths and distances at full
 * precision; `roundedClosure` the bearings and distances as written (to the second and to 0.001),
 * which is what someone plotting the description would get. `perimeter` sums the arc lengths.
 */
export function measureClosure(courses: Course[]): RingClosure {
  let [e, n, re, rn, perimeter] = [0, 0, 0, 0, 0];
  for (const c of courses) {
    const [azimuth, distance] = c.kind === "line" ? [c.azimuthDeg, c.distance] : [c.chordAzimuthDeg, c.chordDistance];
    const [ux, uy] = unitVectorFromAzimuthDeg(azimuth);
    e += distance * ux;
    n += distance * uy;
    const [rx, ry] = unitVectorFromAzimuthDeg(parseBearingToAzimuthDeg(c.bearing));
    const rounded = roundDistance(distance);
    re += rounded * rx;
    rn += rounded * ry;
    perimeter += c.kind === "line" ? c.distance : c.arcLength;
  }
  return { closure: Math.hypot(e, n), roundedClosure: Math.hypot(re, rn), perimeter };
}

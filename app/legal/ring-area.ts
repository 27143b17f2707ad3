import type { BoundarySegment } from "./legal-types";

/**
 * Signed area enclosed by a closed ring of straight and circular segments (counter-clockwise
 * positive): the coordinate (shoelace) area of the vertices (Gauss's area formula; Schofield &
 * Breach, *Engineering Surveying*, 6th ed., "Areas", area from coordinates) plus, for each arc,
 * the circular segment between its chord and the arc, A = R²/2·(θ − sin θ) for a central angle θ
 * (CRC Standard Mathematical Tables, "circular segment"), added when the arc turns left (it bulges
 * to the right of its chord) and subtracted when it turns right. Valid for θ up to 2π.
 * Computed relative to the first vertex, so that grid coordinates keep their digits.
 */
export function computeRingArea(segments: BoundarySegment[]): number {
  const first = segments[0];
  if (!first) return 0;
  const [ox, oy] = first.from;
  let twice = 0;
  let arcs = 0;
  for (const s of segments) {
    const ax = s.from[0] - ox;
    const ay = s.from[1] - oy;
    const bx = s.to[0] - ox;
    const by = s.to[1] - oy;
    twice += ax * by - bx * ay;
    if (s.kind === "arc") {
      const theta = Math.abs(s.sweepRad);
      arcs += Math.sign(s.sweepRad) * ((s.radius * s.radius) / 2) * (theta - Math.sin(theta));
    }
  }
  return twice / 2 + arcs;
}

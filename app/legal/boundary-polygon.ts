import { countChords } from "~/geometry/densify";
import type { PolygonCoords } from "~/geometry/take-types";
import type { Vec2 } from "~/geometry/vec2";
import type { BoundaryPart, BoundarySegment } from "./legal-types";

/** Default chord sagitta of exported take polygons: 1 mm (the outline stays within about 0.7 mm of the arc). */
export const EXPORT_CHORD_TOLERANCE = 0.001;

/**
 * A take boundary as GeoJSON MultiPolygon coordinates (rings closed, exterior first), each arc
 * replaced by chords whose polygon keeps the arc's area: the ends stay on the circle and the
 * interior vertices sit on a radius ρ chosen so that the fan from the centre has the sector's
 * area ½R²|Δ| (then the polygon's area is the area bounded by the true arc). With n chords of
 * angle α: (n − 2)·ρ²·sin α + 2R·ρ·sin α = R²·|Δ|. ρ exceeds R by about R·α²/12, so the outline
 * stays within about ⅔ of the chord sagitta R·α²/8 (middle ordinate, Schofield & Breach §10.1) of
 * the true arc (a little more, up to 0.7, as the end chords start on the circle). GIS tools then
 * measure the exact take area from the export.
 */
export function boundaryToPolygons(parts: BoundaryPart[], chordTolerance = EXPORT_CHORD_TOLERANCE): PolygonCoords[] {
  return parts.map((part) =>
    part.rings.map((ring) => {
      const points = ring.segments.flatMap((s) => segmentPoints(s, chordTolerance));
      return [...points, points[0]!].map(([x, y]) => [x, y]);
    }),
  );
}

/** The segment's start point and, for an arc, its interior vertices (the end is the next segment's start). */
function segmentPoints(s: BoundarySegment, tol: number): Vec2[] {
  if (s.kind === "line") return [s.from];
  const theta = Math.abs(s.sweepRad);
  const n = Math.max(2, countChords(s.radius, theta, tol));
  const alpha = theta / n;
  const rho = fanRadius(s.radius, theta, n, alpha);
  const a0 = Math.atan2(s.from[1] - s.centre[1], s.from[0] - s.centre[0]);
  const out: Vec2[] = [s.from];
  for (let k = 1; k < n; k++) {
    const a = a0 + (s.sweepRad * k) / n;
    out.push([s.centre[0] + rho * Math.cos(a), s.centre[1] + rho * Math.sin(a)]);
  }
  return out;
}

/** Positive root of (n − 2)·sin α·ρ² + 2R·sin α·ρ − R²·θ = 0 (for n = 2: ρ = R·α / sin α). */
function fanRadius(r: number, theta: number, n: number, alpha: number): number {
  const s = Math.sin(alpha);
  if (n === 2) return (r * alpha) / s;
  const a = (n - 2) * s;
  const b = 2 * r * s;
  const c = -r * r * theta;
  // c < 0 < a, so the positive root is (−b + √(b² − 4ac)) / 2a, written without cancellation.
  return (2 * -c) / (b + Math.sqrt(b * b - 4 * a * c));
}

import { degToRad } from "./angles";
import type { AlignmentElement } from "./alignment-types";
import { requirePositive } from "./validate";
import { addVec, rotateVec, subVec, type Vec2 } from "./vec2";

/** Options for {@link densifyElements}. */
export interface DensifyOptions {
  /** Largest allowed sagitta (arc-to-chord distance), working units. Required; see tolerances. */
  chordTolerance: number;
}

/**
 * Polyline through the elements: tangents by their ends, arcs by equal chords whose sagitta
 * R(1 − cos(θ/2)) stays within the tolerance (middle-ordinate formula, Schofield & Breach
 * §10.1). Shared joints appear once.
 */
export function densifyElements(elements: AlignmentElement[], options: DensifyOptions): Vec2[] {
  const tol = requirePositive(options.chordTolerance, "chordTolerance", "a positive length");
  const out: Vec2[] = [];
  const push = (p: Vec2) => {
    const last = out[out.length - 1];
    if (!last || last[0] !== p[0] || last[1] !== p[1]) out.push(p);
  };
  for (const e of elements) {
    push(e.start);
    if (e.type === "arc") {
      const total = degToRad(e.deltaDeg);
      const n = countChords(e.radius, Math.abs(total), tol);
      for (let k = 1; k < n; k++) push(addVec(e.center, rotateVec(subVec(e.start, e.center), (total * k) / n)));
    }
    push(e.end);
  }
  return out;
}

/** Chords needed so that each chord's sagitta is within `tol`. */
export function countChords(radius: number, deltaRad: number, tol: number): number {
  if (tol >= radius) return Math.max(1, Math.ceil(deltaRad / Math.PI) * 2);
  const maxAngle = 2 * Math.acos(1 - tol / radius);
  return Math.max(1, Math.ceil(deltaRad / maxAngle - 1e-12));
}

import type { CorridorPiece } from "./corridor-types";
import { walkRing } from "./take-ring-walk";

/**
 * Number of maximal stretches of a ring's boundary that lie outside the corridor, going once
 * around (0 when the whole ring is inside, 1 when it never enters). Every connected piece of
 * (polygon − corridor) touches the polygon's boundary outside the corridor — the corridor has no
 * holes — so this counts an upper bound on the remainder pieces; a total of 1 means exactly one.
 */
export function countOutsideRuns(ring: ArrayLike<number>, pieces: CorridorPiece[]): number {
  const walk = walkRing(ring, pieces);
  return walk.state === "outside" ? 1 : walk.runs.length;
}

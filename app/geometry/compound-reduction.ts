import type { Known } from "./compound-knowns";
import { solveRadii, solveRadiiWithChord } from "./compound-radii";
import type { CompoundState } from "./compound-state";

/** Parameters [R1, R2, Δ1 rad, Δ2 rad]. */
export type CompoundParams = [number, number, number, number];

/** The unknowns left after the closed forms: free angle coordinates mapped to full parameters. */
export interface Reduction {
  /** Range of each free angle coordinate (radians), for the starting-point scan. */
  bounds: [number, number][];
  /** Grid spacing exponent for the scan: 2 crowds points towards small angles. */
  gridPower: number;
  /** Parameters for a point of the free coordinates; undefined where no valid radii exist. */
  toParams(u: number[]): CompoundParams | undefined;
  /** Every solution when no angle is free (the long chord can give two). */
  solveFixedAngles(): CompoundParams[];
}

const PURE_ANGLE_KEYS = new Set(["delta", "delta1", "delta2"]);

/**
 * Variable projection. With Δ1, Δ2 fixed every length of the curve is linear in (R1, R2) and a
 * chord angle (or the parallel condition) is a homogeneous linear condition on them, so for each
 * trial of the free angles the radii come from a small linear least-squares solve; only the
 * angles (at most two) are searched. Angles known from the seed are not free.
 */
export function buildReduction(seed: CompoundState, knowns: Known[]): Reduction {
  const angle = angleMapping(seed);
  const others = knowns.filter((k) => !PURE_ANGLE_KEYS.has(k.key));
  return {
    bounds: angle.bounds,
    // With both angles free, flat curves (a few degrees) would fall inside one uniform cell.
    gridPower: angle.bounds.length === 2 ? 2 : 1,
    toParams(u) {
      const [d1, d2] = angle.map(u);
      if (!(d1 > 0 && d2 > 0 && d1 + d2 < Math.PI)) return undefined;
      const radii = seed.r1 !== undefined && seed.r2 !== undefined ? [seed.r1, seed.r2] : solveRadii(others, d1, d2);
      if (!radii) return undefined;
      const [r1, r2] = radii as [number, number];
      return r1 > 0 && r2 > 0 && Number.isFinite(r1) && Number.isFinite(r2) ? [r1, r2, d1, d2] : undefined;
    },
    solveFixedAngles() {
      const [d1, d2] = angle.map([]);
      const viaChord = solveRadiiWithChord(others, d1, d2);
      if (viaChord) return viaChord.map(([r1, r2]) => [r1, r2, d1, d2] as CompoundParams);
      const p = this.toParams([]);
      return p ? [p] : [];
    },
  };
}

interface AngleMapping {
  bounds: [number, number][];
  map(u: number[]): [number, number];
}

function angleMapping(seed: CompoundState): AngleMapping {
  const { d, d1, d2 } = seed;
  if (d1 !== undefined && d2 !== undefined) return { bounds: [], map: () => [d1, d2] };
  if (d1 !== undefined) return { bounds: [[0, Math.PI - d1]], map: (u) => [d1, u[0]!] };
  if (d2 !== undefined) return { bounds: [[0, Math.PI - d2]], map: (u) => [u[0]!, d2] };
  if (d !== undefined) return { bounds: [[0, d]], map: (u) => [u[0]!, d - u[0]!] };
  return { bounds: [[0, Math.PI], [0, Math.PI]], map: (u) => [u[0]!, u[1]!] };
}

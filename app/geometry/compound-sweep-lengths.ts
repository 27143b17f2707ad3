import { sampleAngles } from "./compound-angle-grid";
import { traceZeroContour } from "./compound-contour";
import { findChainZeros } from "./compound-contour-roots";
import type { Known } from "./compound-knowns";
import type { CompoundParams } from "./compound-reduction";

const OTHERS = new Set(["tangentPT", "tangentPC", "chordAnglePC", "chordAnglePT", "commonTangentParallelToLongChord", "longChord"]);
// 32 steps per angle (5.6°) plus refinement at the ends: the grid only has to catch the contour's
// shape, which is then followed exactly (8 steps gave the same roots as 96 on 6000 wide draws).
const GRID = sampleAngles(32, 8);
const COS = GRID.map(Math.cos);
const SIN = GRID.map(Math.sin);
const REACH = Math.PI / 32;
const TOUCH = 1e-12;
const MAX_ROOTS = 12;

/**
 * Both arcs known only by their lengths, plus two of T_PC, T_PT, LC, φ_PC, φ_PT or the parallel
 * condition. Here no angle can be eliminated in closed form (R = L/Δ puts each angle both inside
 * and outside the trigonometric functions), so the search stays in the plane x = Δ2, y = Δ1:
 * the zero contour of the first condition is traced by marching squares and the second is
 * driven to zero along it. With R1 = L1/Δ1, R2 = L2/Δ2 (L = RΔ, Schofield & Breach §10.1):
 *   PCC = L1 (sin Δ1, 1 − cos Δ1)/Δ1,  PT = PCC + rot(Δ1)·L2 (sin Δ2, 1 − cos Δ2)/Δ2,
 * and each condition is written as in compound-sweep-arcs.ts (PI on both tangents, chord
 * direction, |PT| = LC). Undefined when the set is not of this kind.
 */
export function sweepArcLengths(knowns: Known[]): CompoundParams[] | undefined {
  const l1 = knowns.find((k) => k.key === "length1")?.value;
  const l2 = knowns.find((k) => k.key === "length2")?.value;
  const others = knowns.filter((k) => OTHERS.has(k.key));
  if (l1 === undefined || l2 === undefined || others.length !== 2 || knowns.length !== 4) return undefined;
  const [first, second] = others as [Known, Known];
  const at = (k: Known) => (x: number, y: number) => {
    const [cx, sx, cy, sy] = [Math.cos(x), Math.sin(x), Math.cos(y), Math.sin(y)];
    return conditionAt(k, (l1 * sy) / y, (l1 * (1 - cy)) / y, (l2 * sx) / x, (l2 * (1 - cx)) / x, cx, sx, cy, sy, l1 + l2);
  };
  const [g, r] = [at(first), at(second)];
  // Tabulated on the grid: PCC depends on Δ1 only, arc 2's chord on Δ2 only. Past Δ1 + Δ2 = π
  // (plus a cell) there is no curve.
  const [pccX, pccY] = [GRID.map((y, j) => (l1 * SIN[j]!) / y), GRID.map((y, j) => (l1 * (1 - COS[j]!)) / y)];
  const [chordX, chordY] = [GRID.map((x, i) => (l2 * SIN[i]!) / x), GRID.map((x, i) => (l2 * (1 - COS[i]!)) / x)];
  const gridValue = (i: number, j: number) =>
    GRID[i]! + GRID[j]! > Math.PI + 2 * REACH ? NaN : conditionAt(first, pccX[j]!, pccY[j]!, chordX[i]!, chordY[i]!, COS[i]!, SIN[i]!, COS[j]!, SIN[j]!, l1 + l2);
  const roots: CompoundParams[] = [];
  for (const chain of traceZeroContour(g, GRID, GRID, gridValue)) {
    for (const [x, y] of findChainZeros(chain, g, r, REACH, TOUCH)) {
      if (x > 0 && y > 0 && x + y < Math.PI) roots.push([l1 / y, l2 / x, y, x]);
      if (roots.length > MAX_ROOTS) return roots;
    }
  }
  return roots;
}

/**
 * The known's condition at Δ2 = x, Δ1 = y, scaled to be relative (zero where the known holds),
 * from the PCC (qx, qy), arc 2's chord in the common-tangent frame (wx, wy) and the cosines and
 * sines of the two angles. Scalars only: this runs for every grid point.
 */
function conditionAt(k: Known, qx: number, qy: number, wx: number, wy: number, cx: number, sx: number, cy: number, sy: number, scale: number): number {
  const px = qx + wx * cy - wy * sy;
  const py = qy + wx * sy + wy * cy;
  const fx = cx * cy - sx * sy; // forward tangent, direction Δ
  const fy = sx * cy + cx * sy;
  switch (k.key) {
    case "tangentPT":
      return (py - k.value * fy) / k.value;
    case "tangentPC":
      return ((px - k.value) * fy - py * fx) / k.value;
    case "chordAnglePC":
      return (Math.cos(k.value) * py - Math.sin(k.value) * px) / scale;
    case "chordAnglePT": {
      // Chord direction Δ − φ_PT: the forward tangent turned back by φ_PT.
      const c = Math.cos(k.value);
      const s = Math.sin(k.value);
      return (px * (fy * c - fx * s) - py * (fx * c + fy * s)) / scale;
    }
    case "commonTangentParallelToLongChord":
      return (px * sy - py * cy) / scale;
    default:
      return (px * px + py * py - k.value * k.value) / (k.value * k.value);
  }
}

import { sampleAngles } from "./compound-angle-grid";
import { traceZeroContour } from "./compound-contour";
import { findChainZeros } from "./compound-contour-roots";
import type { Known } from "./compound-knowns";
import type { CompoundParams } from "./compound-reduction";

const OTHERS = new Set(["tangentPT", "tangentPC", "chordAnglePC", "chordAnglePT", "commonTangentParallelToLongChord", "longChord"]);
// 96 steps per angle (1.9°) plus refinement at the ends; the contour is then followed exactly.
const GRID = sampleAngles(96, 8);
const COS = GRID.map(Math.cos);
const SIN = GRID.map(Math.sin);
const REACH = Math.PI / 96;
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
  const g = (x: number, y: number) => conditionAt(first, l1, l2, x, y, Math.cos(x), Math.sin(x), Math.cos(y), Math.sin(y));
  const r = (x: number, y: number) => conditionAt(second, l1, l2, x, y, Math.cos(x), Math.sin(x), Math.cos(y), Math.sin(y));
  // Tabulated trigonometry on the grid; past Δ1 + Δ2 = π (plus a cell) there is no curve.
  const gridValue = (i: number, j: number) =>
    GRID[i]! + GRID[j]! > Math.PI + 2 * REACH ? NaN : conditionAt(first, l1, l2, GRID[i]!, GRID[j]!, COS[i]!, SIN[i]!, COS[j]!, SIN[j]!);
  const roots: CompoundParams[] = [];
  for (const chain of traceZeroContour(g, GRID, GRID, gridValue)) {
    for (const [x, y] of findChainZeros(chain, g, r, REACH, TOUCH)) {
      if (x > 0 && y > 0 && x + y < Math.PI) roots.push([l1 / y, l2 / x, y, x]);
      if (roots.length > MAX_ROOTS) return roots;
    }
  }
  return roots;
}

/** The known's condition at Δ2 = x, Δ1 = y, scaled to be relative (zero where the known holds). */
function conditionAt(k: Known, l1: number, l2: number, x: number, y: number, cx: number, sx: number, cy: number, sy: number): number {
  const [wx, wy] = [(l2 * sx) / x, (l2 * (1 - cx)) / x];
  const px = (l1 * sy) / y + wx * cy - wy * sy;
  const py = (l1 * (1 - cy)) / y + wx * sy + wy * cy;
  const [fx, fy] = [cx * cy - sx * sy, sx * cy + cx * sy]; // forward tangent, direction Δ
  const scale = l1 + l2;
  switch (k.key) {
    case "tangentPT":
      return (py - k.value * fy) / k.value;
    case "tangentPC":
      return ((px - k.value) * fy - py * fx) / k.value;
    case "chordAnglePC":
      return (Math.cos(k.value) * py - Math.sin(k.value) * px) / scale;
    case "chordAnglePT": {
      // Chord direction Δ − φ_PT: the forward tangent turned back by φ_PT.
      const [c, s] = [Math.cos(k.value), Math.sin(k.value)];
      return (px * (fy * c - fx * s) - py * (fx * c + fy * s)) / scale;
    }
    case "commonTangentParallelToLongChord":
      return (px * sy - py * cy) / scale;
    default:
      return (px * px + py * py - k.value * k.value) / (k.value * k.value);
  }
}

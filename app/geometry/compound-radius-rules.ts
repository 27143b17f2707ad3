import { evaluateCompoundCore } from "./compound-core";
import { crossVec, dotVec, lengthVec, scaleVec, subVec, unitAtRad, type Vec2 } from "./vec2";
import { learn, type CompoundState } from "./compound-state";

/**
 * Closed forms that fix the radii or the split of Δ once the PI triangle is known:
 * - PC, PI, PT fixed and one radius known: the other centre lies on the normal at its tangent
 *   point, |O1O2| = |R1 − R2| gives a linear equation for the unknown radius.
 * - R1, R2, Δ and one total tangent: the closed-form tangents are linear in cos Δ2 (or cos Δ1).
 * - Δ1, Δ2 known: every length is linear in (R1, R2) and a chord angle is a homogeneous linear
 *   condition, so two such knowns (or one homogeneous condition plus the long chord) fix both.
 */
export function applyRadiusRules(s: CompoundState): boolean {
  if (s.d1 !== undefined && s.d2 !== undefined) return applyLinearRadii(s, s.d1, s.d2);
  if (s.d === undefined) return false;
  if (s.r1 !== undefined && s.r2 !== undefined) return applySplitFromTangent(s, s.r1, s.r2, s.d);
  if (s.T1 !== undefined && s.T2 !== undefined) return applyRadiusFromTriangle(s, s.T1, s.T2, s.d);
  return false;
}

function applyRadiusFromTriangle(s: CompoundState, t1: number, t2: number, d: number): boolean {
  const pt: Vec2 = [t1 + t2 * Math.cos(d), t2 * Math.sin(d)];
  const nPt: Vec2 = [-Math.sin(d), Math.cos(d)];
  if (s.r1 !== undefined && s.r2 === undefined) {
    const w = subVec(pt, [0, s.r1]);
    return learn(s, "r2", (s.r1 * s.r1 - dotVec(w, w)) / (2 * (dotVec(w, nPt) + s.r1)));
  }
  if (s.r2 !== undefined && s.r1 === undefined) {
    const o2 = subVec(pt, scaleVec(nPt, -s.r2));
    return learn(s, "r1", (s.r2 * s.r2 - dotVec(o2, o2)) / (2 * (s.r2 - o2[1])));
  }
  if (s.r1 === undefined || s.r2 === undefined || s.r1 === s.r2) return false;
  // Direction O1 → O2 is (sin Δ1, −cos Δ1) scaled by R1 − R2.
  const v = scaleVec(subVec(subVec(pt, scaleVec(nPt, -s.r2)), [0, s.r1]), 1 / (s.r1 - s.r2));
  return learn(s, "d1", Math.atan2(v[0], -v[1]));
}

function applySplitFromTangent(s: CompoundState, r1: number, r2: number, d: number): boolean {
  if (r1 === r2) return false;
  const sinD = Math.sin(d);
  const cosD = Math.cos(d);
  if (s.T1 !== undefined) return learn(s, "d2", acosOrNaN((s.T1 * sinD - r2 + r1 * cosD) / (r1 - r2)));
  if (s.T2 !== undefined) return learn(s, "d1", acosOrNaN((r1 - r2 * cosD - s.T2 * sinD) / (r1 - r2)));
  return false;
}

function acosOrNaN(c: number): number {
  return c >= -1 && c <= 1 ? Math.acos(c) : NaN;
}

function applyLinearRadii(s: CompoundState, d1: number, d2: number): boolean {
  if (s.r1 !== undefined && s.r2 !== undefined) return false;
  const unit1 = evaluateCompoundCore(1, 0, d1, d2);
  const unit2 = evaluateCompoundCore(0, 1, d1, d2);
  const rows: [number, number, number][] = [];
  if (s.r1 !== undefined) rows.push([1, 0, s.r1]);
  if (s.r2 !== undefined) rows.push([0, 1, s.r2]);
  if (s.T1 !== undefined) rows.push([unit1.tangentPC, unit2.tangentPC, s.T1]);
  if (s.T2 !== undefined) rows.push([unit1.tangentPT, unit2.tangentPT, s.T2]);
  for (const angle of [s.p1, s.p2 === undefined ? undefined : d1 + d2 - s.p2]) {
    if (angle === undefined) continue;
    const u = unitAtRad(angle);
    rows.push([crossVec(unit1.pt, u), crossVec(unit2.pt, u), 0]);
  }
  const solved = solveTwoByTwo(rows) ?? scaleByChord(rows, unit1.pt, unit2.pt, s.lc);
  if (!solved) return false;
  const a = learn(s, "r1", solved[0]);
  const b = learn(s, "r2", solved[1]);
  return a || b;
}

function solveTwoByTwo(rows: [number, number, number][]): [number, number] | undefined {
  for (let i = 0; i < rows.length; i++) {
    for (let j = i + 1; j < rows.length; j++) {
      const [a, b, e] = rows[i]!;
      const [c, d, f] = rows[j]!;
      const det = a * d - b * c;
      const scale = Math.hypot(a, b) * Math.hypot(c, d);
      if (Math.abs(det) > 1e-9 * scale) return [(e * d - b * f) / det, (a * f - e * c) / det];
    }
  }
  return undefined;
}

function scaleByChord(rows: [number, number, number][], p1: Vec2, p2: Vec2, lc?: number): [number, number] | undefined {
  const homogeneous = rows.find((r) => r[2] === 0);
  if (!homogeneous || lc === undefined) return undefined;
  // Ratio from the homogeneous row, size from |R1·p1 + R2·p2| = lc.
  const [a, b] = homogeneous;
  const dir: [number, number] = [b, -a];
  const len = lengthVec([dir[0] * p1[0] + dir[1] * p2[0], dir[0] * p1[1] + dir[1] * p2[1]]);
  const k = (lc / len) * (dir[0] + dir[1] >= 0 ? 1 : -1);
  return [dir[0] * k, dir[1] * k];
}

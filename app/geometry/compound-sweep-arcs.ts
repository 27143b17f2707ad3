import type { Known } from "./compound-knowns";
import type { CompoundParams } from "./compound-reduction";
import type { SweepModel } from "./compound-sweep";
import { reverseKnowns, reverseParams } from "./compound-reverse";

type Coefficients = [number, number, number];

const INNER = { radius1: "radius", subTangent1: "subTangent" } as const;
const OUTER = { radius2: "radius", subTangent2: "subTangent", length2: "length" } as const;
const OTHERS = new Set(["tangentPT", "tangentPC", "chordAnglePC", "chordAnglePT", "commonTangentParallelToLongChord", "longChord"]);

/**
 * One-variable form of a two-dimensional set that knows one item of each arc (R, t or L) and two
 * of T_PC, T_PT, LC, φ_PC, φ_PT or the parallel condition, where arc 1's item is R1 or t1 (else
 * the curve is reversed, so that arc 2's R2 or t2 plays that part). The outer angle is x = Δ2,
 * which fixes arc 2's radius from its item. Local frame as compound-core (PC at the origin, back
 * tangent +x, left turn), Δ1 = y:
 *   PCC = P0 + rot(y)·P1, with R1 known: P0 = (0, R1), P1 = (0, −R1) (circle about (0, R1));
 *                          with t1 known: P0 = P1 = (t1, 0) (vertex V1 at t1, then t1 along
 *                          the common tangent; Schofield & Breach §10.3 vertex triangle);
 *   PT  = PCC + rot(y)·w,  w = R2 (sin Δ2, 1 − cos Δ2) (chord of arc 2 along the common tangent);
 *   forward tangent f = rot(y)·(cos Δ2, sin Δ2), Δ = Δ1 + Δ2.
 * So PT = P0 + rot(y)·Q with Q = P1 + w, and every remaining known is an equation
 * a cos y + b sin y + c = 0 (derived):
 *   T_PT: PI = PT − T_PT·f lies on the back tangent, PT_y = T_PT sin Δ, i.e. the vertex-triangle
 *         relation T_PT sin Δ = R1 − R2 cos Δ − (R1 − R2) cos Δ1 (REFERENCES §2 closed form);
 *   T_PC: (T_PC, 0) lies on the forward tangent, cross(PT − (T_PC, 0), f) = 0, i.e.
 *         T_PC sin Δ = R2 − R1 cos Δ + (R1 − R2) cos Δ2 (same source);
 *   φ_PC, φ_PT, parallel: the long chord PC→PT has direction φ_PC, Δ − φ_PT or Δ1 (alternate angles);
 *   LC: |PT|² = LC².
 * The first of the two is solved for y, the second is the residual.
 */
export function buildArcSweep(knowns: Known[]): SweepModel | undefined {
  return arcSweepFor(knowns, false) ?? arcSweepFor(reverseKnowns(knowns), true);
}

function arcSweepFor(knowns: Known[], reversed: boolean): SweepModel | undefined {
  const inner = knowns.find((k) => k.key in INNER);
  const outer = knowns.find((k) => k.key in OUTER);
  const others = knowns.filter((k) => OTHERS.has(k.key));
  if (!inner || !outer || others.length !== 2 || knowns.length !== 4) return undefined;
  const innerKind = INNER[inner.key as keyof typeof INNER];
  return new ArcSweep(innerKind, inner.value, OUTER[outer.key as keyof typeof OUTER], outer.value, others[0]!, others[1]!, reversed);
}

class ArcSweep implements SweepModel {
  a = 0;
  b = 0;
  c = 0;
  private x = 0;
  private readonly p0: [number, number];
  private readonly p1: [number, number];
  private readonly scale: number;
  private check: Coefficients = [0, 0, 0];

  constructor(
    private readonly innerKind: "radius" | "subTangent",
    private readonly innerValue: number,
    private readonly outerKind: "radius" | "subTangent" | "length",
    private readonly outerValue: number,
    private readonly solved: Known,
    private readonly checked: Known,
    /** True when built on the reversed curve: params are turned back. */
    private readonly reversed: boolean,
  ) {
    const v = innerValue;
    [this.p0, this.p1] = innerKind === "radius" ? [[0, v], [0, -v]] : [[v, 0], [v, 0]];
    this.scale = innerValue + outerValue;
  }

  setOuter(x: number): void {
    this.x = x;
    const [cx, sx, v] = [Math.cos(x), Math.sin(x), this.outerValue];
    // Chord of arc 2 in the common-tangent frame, written without poles: t2 cot(Δ2/2)·(sin, 1 − cos) = t2 (1 + cos, sin).
    const [wx, wy] = this.outerKind === "radius" ? [v * sx, v * (1 - cx)] : this.outerKind === "subTangent" ? [v * (1 + cx), v * sx] : [(v * sx) / x, (v * (1 - cx)) / x];
    const q: [number, number] = [this.p1[0] + wx, this.p1[1] + wy];
    [this.a, this.b, this.c] = coefficientsOf(this.solved, this.p0, q, cx, sx, x, this.scale);
    this.check = coefficientsOf(this.checked, this.p0, q, cx, sx, x, this.scale);
  }

  residual(y: number): number {
    return this.check[0] * Math.cos(y) + this.check[1] * Math.sin(y) + this.check[2];
  }

  params(y: number): CompoundParams | undefined {
    const x = this.x;
    if (!(y > 0 && x + y < Math.PI)) return undefined;
    const v = this.outerValue;
    const r2 = this.outerKind === "radius" ? v : this.outerKind === "subTangent" ? v / Math.tan(x / 2) : v / x;
    const r1 = this.innerKind === "radius" ? this.innerValue : this.innerValue / Math.tan(y / 2);
    if (!(r1 > 0 && r2 > 0 && Number.isFinite(r1) && Number.isFinite(r2))) return undefined;
    return this.reversed ? reverseParams([r1, r2, y, x]) : [r1, r2, y, x];
  }
}

/** (a, b, c) of a cos y + b sin y + c = 0 for one known, with PT = P0 + rot(y)·Q (see above). */
function coefficientsOf(k: Known, p0: [number, number], q: [number, number], cx: number, sx: number, x: number, scale: number): Coefficients {
  const [px, py] = p0;
  const [qx, qy] = q;
  switch (k.key) {
    case "tangentPT": {
      // PI = P0 + rot(y)(Q − T_PT·d), d = (cos Δ2, sin Δ2); its y is zero.
      const [vx, vy] = [qx - k.value * cx, qy - k.value * sx];
      return [vy / k.value, vx / k.value, py / k.value];
    }
    case "tangentPC": {
      // cross(U + rot(y)Q, rot(y)d) = cos y·cross(U, d) + sin y·(U·d) + cross(Q, d), U = P0 − (T_PC, 0).
      const ux = px - k.value;
      return [(ux * sx - py * cx) / k.value, (ux * cx + py * sx) / k.value, (qx * sx - qy * cx) / k.value];
    }
    case "chordAnglePC": {
      // cross(e, P0 + rot(y)Q) with e the fixed chord direction.
      const [ex, ey] = [Math.cos(k.value), Math.sin(k.value)];
      return [(ex * qy - ey * qx) / scale, (ex * qx + ey * qy) / scale, (ex * py - ey * px) / scale];
    }
    case "chordAnglePT":
      return chordAlong(px, py, qx, qy, Math.cos(x - k.value), Math.sin(x - k.value), scale);
    case "commonTangentParallelToLongChord":
      return chordAlong(px, py, qx, qy, 1, 0, scale);
    default: {
      // Long chord: |P0|² + |Q|² + 2 P0·rot(y)Q − LC².
      const lc2 = k.value * k.value;
      return [(2 * (px * qx + py * qy)) / lc2, (-2 * (px * qy - py * qx)) / lc2, (px * px + py * py + qx * qx + qy * qy - lc2) / lc2];
    }
  }
}

/** cross(P0 + rot(y)Q, rot(y)m): the chord runs along rot(y)·m (m fixed in the common-tangent frame). */
function chordAlong(px: number, py: number, qx: number, qy: number, mx: number, my: number, scale: number): Coefficients {
  return [(px * my - py * mx) / scale, (px * mx + py * my) / scale, (qx * my - qy * mx) / scale];
}

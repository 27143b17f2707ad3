import type { Known } from "./compound-knowns";

/**
 * Coefficients (of R1, of R2) of every length of a compound curve at fixed Δ1, Δ2, plus the PT
 * position per unit radius. Every length is linear in the radii: t = R tan(Δi/2), L = R Δi
 * (Schofield & Breach §10.1); T_PC sin Δ = R2 − R1 cos Δ + (R1 − R2) cos Δ2 and
 * T_PT sin Δ = R1 − R2 cos Δ − (R1 − R2) cos Δ1 (vertex triangle, Schofield & Breach §10.3);
 * PT = R1 (sin Δ1, 1 − cos Δ1) + R2 (sin Δ − sin Δ1, cos Δ1 − cos Δ) (derived: PC → PCC → PT
 * round the two arcs; checked against evaluateCompoundCore in compound-lean.test.ts).
 * Allocation-light on purpose: the numerical scan calls this hundreds of times per solve.
 */
export class UnitCoefficients {
  readonly p1x: number;
  readonly p1y: number;
  readonly p2x: number;
  readonly p2y: number;
  private readonly s1: number;
  private readonly c1: number;
  private readonly c2: number;
  private readonly sD: number;
  private readonly cD: number;

  constructor(
    readonly d1: number,
    readonly d2: number,
  ) {
    this.s1 = Math.sin(d1);
    this.c1 = Math.cos(d1);
    this.c2 = Math.cos(d2);
    this.sD = Math.sin(d1 + d2);
    this.cD = Math.cos(d1 + d2);
    [this.p1x, this.p1y, this.p2x, this.p2y] = [this.s1, 1 - this.c1, this.sD - this.s1, this.c1 - this.cD];
  }

  /** Coefficient of R1 (which = 0) or R2 (which = 1) in a length known other than the long chord. */
  coefficient(key: Known["key"], which: 0 | 1): number {
    switch (key) {
      case "radius1":
        return which === 0 ? 1 : 0;
      case "radius2":
        return which === 1 ? 1 : 0;
      case "subTangent1":
        return which === 0 ? Math.tan(this.d1 / 2) : 0;
      case "subTangent2":
        return which === 1 ? Math.tan(this.d2 / 2) : 0;
      case "length1":
        return which === 0 ? this.d1 : 0;
      case "length2":
        return which === 1 ? this.d2 : 0;
      case "tangentPC":
        return (which === 0 ? this.c2 - this.cD : 1 - this.c2) / this.sD;
      case "tangentPT":
        return (which === 0 ? 1 - this.c1 : this.c1 - this.cD) / this.sD;
      default:
        return NaN;
    }
  }
}

let last: UnitCoefficients | undefined;

/** The coefficients at Δ1, Δ2, reusing the last ones: the radii solve and the residuals ask in turn. */
export function unitCoefficientsAt(d1: number, d2: number): UnitCoefficients {
  if (last === undefined || last.d1 !== d1 || last.d2 !== d2) last = new UnitCoefficients(d1, d2);
  return last;
}

/**
 * Scaled residuals of the knowns (as residualOf: relative in lengths, radians in angles) at
 * R1, R2, Δ1, Δ2, from the unit coefficients instead of a full forward solution.
 */
export function computeLeanResiduals(knowns: Known[], r1: number, r2: number, u: UnitCoefficients): number[] {
  const x = r1 * u.p1x + r2 * u.p2x;
  const y = r1 * u.p1y + r2 * u.p2y;
  const phiPC = Math.atan2(y, x);
  const d = u.d1 + u.d2;
  const out = new Array<number>(knowns.length);
  for (let i = 0; i < knowns.length; i++) {
    const k = knowns[i]!;
    out[i] = leanResidual(k, r1, r2, u, d, phiPC, x, y);
  }
  return out;
}

function leanResidual(k: Known, r1: number, r2: number, u: UnitCoefficients, d: number, phiPC: number, x: number, y: number): number {
  switch (k.key) {
    case "delta":
      return d - k.value;
    case "delta1":
      return u.d1 - k.value;
    case "delta2":
      return u.d2 - k.value;
    case "chordAnglePC":
      return phiPC - k.value;
    case "chordAnglePT":
      return d - phiPC - k.value;
    case "commonTangentParallelToLongChord":
      return phiPC - u.d1;
    case "longChord":
      return (Math.hypot(x, y) - k.value) / k.value;
    default:
      return (r1 * u.coefficient(k.key, 0) + r2 * u.coefficient(k.key, 1) - k.value) / k.value;
  }
}

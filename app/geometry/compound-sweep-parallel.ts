import type { Known } from "./compound-knowns";
import type { CompoundParams } from "./compound-reduction";
import type { SweepModel } from "./compound-sweep";

type Side = "tangentPC" | "tangentPT" | "longChord";
type ArcItem = "radius1" | "radius2" | "subTangent1" | "subTangent2" | "length1" | "length2";

const SIDES = new Set<string>(["tangentPC", "tangentPT", "longChord"]);
const ARC_ITEMS = new Set<string>(["radius1", "radius2", "subTangent1", "subTangent2", "length1", "length2"]);

/**
 * One-variable form of {two of T_PC, T_PT, LC; one item of one arc; parallel condition}. With the
 * common tangent parallel to the long chord the PC–PI–PT triangle has the angles Δ1 at the PC,
 * Δ2 at the PT and π − Δ at the PI (alternate angles). The outer angle is x = Δ1; the sine law
 * T_PT / sin Δ1 = T_PC / sin Δ2 = LC / sin Δ (Schofield & Breach §10.1, triangle PC–PI–PT) on the
 * two known sides is an equation a cos y + b sin y + c = 0 in y = Δ2, and fixes the triangle's
 * size. With both angles and both tangents known the radii are linear (vertex-triangle closed
 * form, REFERENCES §2): T_PC sin Δ = (cos Δ2 − cos Δ) R1 + (1 − cos Δ2) R2 and
 * T_PT sin Δ = (1 − cos Δ1) R1 + (cos Δ1 − cos Δ) R2. The residual is the arc item's.
 */
export function buildParallelSweep(knowns: Known[]): SweepModel | undefined {
  if (knowns.length !== 4 || !knowns.some((k) => k.key === "commonTangentParallelToLongChord")) return undefined;
  const sides = knowns.filter((k) => SIDES.has(k.key));
  const items = knowns.filter((k) => ARC_ITEMS.has(k.key));
  if (sides.length !== 2 || items.length !== 1) return undefined;
  return new ParallelSweep(sides[0]!, sides[1]!, items[0]!);
}

class ParallelSweep implements SweepModel {
  a = 0;
  b = 0;
  c = 0;
  private x = 0;

  constructor(
    private readonly first: Known,
    private readonly second: Known,
    private readonly item: Known,
  ) {}

  setOuter(x: number): void {
    this.x = x;
    // second/opp(second) = first/opp(first), written opp(second)/second − opp(first)/first = 0.
    const [p, q] = [sineOpposite(this.second.key as Side, x), sineOpposite(this.first.key as Side, x)];
    [this.a, this.b, this.c] = [p[0] / this.second.value - q[0] / this.first.value, p[1] / this.second.value - q[1] / this.first.value, p[2] / this.second.value - q[2] / this.first.value];
  }

  residual(y: number): number {
    const { n1, n2, scale } = this.scaledRadii(y);
    const key = this.item.key as ArcItem;
    const [r, angle] = key.endsWith("1") ? [n1 / scale, this.x] : [n2 / scale, y];
    // Relative, like every residual. scale = sin(opposite angle)·det is zero only on the edges of
    // the valid region (det = 4(1 − cos Δ) sin(Δ1/2) sin(Δ2/2) cos(Δ/2), derived), so a pole
    // can only fall outside it, where any root it fakes is dropped as invalid.
    const value = key.startsWith("radius") ? r : key.startsWith("subTangent") ? r * Math.tan(angle / 2) : r * angle;
    return (value - this.item.value) / this.item.value;
  }

  params(y: number): CompoundParams | undefined {
    const x = this.x;
    if (!(y > 0 && x + y < Math.PI)) return undefined;
    const { n1, n2, scale } = this.scaledRadii(y);
    const [r1, r2] = [n1 / scale, n2 / scale];
    return r1 > 0 && r2 > 0 && Number.isFinite(r1) && Number.isFinite(r2) ? [r1, r2, x, y] : undefined;
  }

  /** scale·R1, scale·R2 and scale = sin(angle opposite the first side)·det, by Cramer's rule. */
  private scaledRadii(y: number): { n1: number; n2: number; scale: number } {
    const x = this.x;
    const [c1, c2, cD, sD] = [Math.cos(x), Math.cos(y), Math.cos(x + y), Math.sin(x + y)];
    const [oa, ob, oc] = sineOpposite(this.first.key as Side, x);
    const opp = oa * c2 + ob * Math.sin(y) + oc;
    // Sine law: T_PC = K sin Δ2, T_PT = K sin Δ1 with K = first / opp; times opp·sin Δ:
    const r1 = this.first.value * Math.sin(y) * sD;
    const r2 = this.first.value * Math.sin(x) * sD;
    const det = (c2 - cD) * (c1 - cD) - (1 - c2) * (1 - c1);
    return { n1: (c1 - cD) * r1 - (1 - c2) * r2, n2: (c2 - cD) * r2 - (1 - c1) * r1, scale: opp * det };
  }
}

/** Sine of the triangle angle opposite a side, as (a, b, c) of a cos y + b sin y + c, x = Δ1, y = Δ2. */
function sineOpposite(side: Side, x: number): [number, number, number] {
  if (side === "tangentPT") return [0, 0, Math.sin(x)];
  if (side === "tangentPC") return [0, 1, 0];
  return [Math.sin(x), Math.cos(x), 0];
}

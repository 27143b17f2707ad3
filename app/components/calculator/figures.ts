import type { CompoundSolution } from "~/calculations/compound-curve-report";
import type { SimpleCurveReport } from "~/calculations/simple-curve-report";
import { degToRad } from "~/geometry/angles";
import type { CurveFigure } from "./curve-drawing";

const mid = (a: readonly [number, number], b: readonly [number, number]) => [(a[0] + b[0]) / 2, (a[1] + b[1]) / 2] as const;

/** Simple curve in the local frame: PC at the origin, back tangent along +x, centre at (0, R). */
export function simpleCurveFigure(c: SimpleCurveReport): CurveFigure {
  const d = degToRad(c.delta);
  const center = [0, c.radius] as const;
  const pt = [c.radius * Math.sin(d), c.radius * (1 - Math.cos(d))] as const;
  const pi = [c.tangent, 0] as const;
  return {
    pc: [0, 0],
    pt,
    pi,
    arcs: [{ center, radius: c.radius, from: [0, 0], to: pt }],
    notes: [
      { at: mid(center, [0, 0]), text: "R" },
      { at: mid([0, 0], pi), text: "T" },
      { at: mid([0, 0], pt), text: "LC" },
      { at: [center[0] + 0, center[1] - c.radius * 0.25], text: "Δ" },
    ],
  };
}

export function compoundCurveFigure(s: CompoundSolution): CurveFigure {
  const { pc, pcc, pt, pi, center1, center2 } = s.local;
  return {
    pc,
    pt,
    pi,
    pcc,
    arcs: [
      { center: center1, radius: s.radius1, from: pc, to: pcc },
      { center: center2, radius: s.radius2, from: pcc, to: pt },
    ],
    notes: [
      { at: mid(center1, pc), text: "R1" },
      { at: mid(center2, pt), text: "R2" },
      { at: mid(pc, pt), text: "LC" },
    ],
  };
}

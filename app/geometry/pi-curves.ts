import { degToRad, radToDeg } from "./angles";
import type { AlignmentCurveInput } from "./alignment-types";
import { computeCompoundCurve } from "./compound-curve";
import { solveCompoundCurve } from "./compound-solver";
import { GeometryInputError } from "./errors";
import { requireFinite, requirePositive, roundForMessage } from "./validate";

/** The curve fitted at one PI, unsigned angles in radians; arcs in stationing order. */
export interface ResolvedPiCurve {
  type: "simple" | "compound";
  tangentPC: number;
  tangentPT: number;
  arcs: { radius: number; deltaRad: number }[];
}

/**
 * Fits the curve described at a PI to that PI's deflection |Δ| (radians). Simple: T = R tan(Δ/2)
 * (Schofield & Breach §10.1). Compound by Δ1: Δ2 = Δ − Δ1. Compound by the tangent PI→PC: the
 * closed form of solveCompoundCurve for {R1, R2, Δ, T_PC}. Errors name the field `points.i.curve…`.
 */
export function resolvePiCurve(curve: AlignmentCurveInput, deflectionRad: number, piIndex: number): ResolvedPiCurve {
  const field = `points.${piIndex}.curve`;
  if (curve.type === "simple") {
    const r = requirePositive(curve.radius, `${field}.radius`, "a positive number of length units");
    const t = r * Math.tan(deflectionRad / 2);
    return { type: "simple", tangentPC: t, tangentPT: t, arcs: [{ radius: r, deltaRad: deflectionRad }] };
  }
  if (curve.type !== "compound") {
    throw new GeometryInputError("invalid_alignment", `${field}.type must be "simple" or "compound"`, { field: `${field}.type`, piIndex });
  }
  const r1 = requirePositive(curve.radius1, `${field}.radius1`, "a positive number of length units");
  const r2 = requirePositive(curve.radius2, `${field}.radius2`, "a positive number of length units");
  const deltaDeg = radToDeg(deflectionRad);
  if ("delta1" in curve && curve.delta1 !== undefined) {
    const d1 = requireFinite(curve.delta1, `${field}.delta1`);
    if (!(d1 > 0 && d1 < deltaDeg)) {
      throw new GeometryInputError(
        "invalid_angle",
        `delta1 at PI ${piIndex} must be more than 0° and less than the deflection there (${roundForMessage(deltaDeg)}°), got ${d1}°`,
        { field: `${field}.delta1`, piIndex },
      );
    }
    return fromCompound(computeCompoundCurve({ radius1: r1, radius2: r2, delta1: d1, delta2: deltaDeg - d1 }));
  }
  const t = requirePositive((curve as { tangentPC?: number }).tangentPC, `${field}.tangentPC`);
  try {
    const { solutions } = solveCompoundCurve({ radius1: r1, radius2: r2, delta: deltaDeg, tangentPC: t });
    return fromCompound(solutions[0]!);
  } catch (e) {
    if (!(e instanceof GeometryInputError)) throw e;
    throw new GeometryInputError(e.code, `PI ${piIndex}: ${e.message}`, { ...e.details, field: `${field}.tangentPC`, piIndex });
  }
}

function fromCompound(c: { tangentPC: number; tangentPT: number; radius1: number; radius2: number; delta1: number; delta2: number }): ResolvedPiCurve {
  return {
    type: "compound",
    tangentPC: c.tangentPC,
    tangentPT: c.tangentPT,
    arcs: [
      { radius: c.radius1, deltaRad: degToRad(c.delta1) },
      { radius: c.radius2, deltaRad: degToRad(c.delta2) },
    ],
  };
}

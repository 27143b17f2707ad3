import { radToDeg } from "./angles";
import type { Known } from "./compound-knowns";
import { GeometryInputError } from "./errors";
import { roundForMessage } from "./validate";

/**
 * Explains why no compound curve fits the knowns, as specifically as the set allows. For
 * {R1, R2, Δ, one tangent} the tangent must lie between the two simple-curve tangents
 * R1 tan(Δ/2) and R2 tan(Δ/2), because the closed-form tangent is linear in cos Δ2 and runs
 * from one to the other as Δ2 goes from 0 to Δ.
 */
export function describeNoSolution(knowns: Known[]): GeometryInputError {
  const v = (key: Known["key"]) => knowns.find((k) => k.key === key)?.value;
  const [r1, r2, d] = [v("radius1"), v("radius2"), v("delta")];
  if (r1 !== undefined && r2 !== undefined && d !== undefined) {
    for (const [key, label] of [["tangentPC", "PI→PC"], ["tangentPT", "PI→PT"]] as const) {
      const t = v(key);
      if (t !== undefined) return tangentOutOfRange(key, label, t, r1, r2, d);
    }
  }
  const listed = knowns
    .map((k) => `${k.key} = ${k.kind === "angle" ? `${roundForMessage(radToDeg(k.value))}°` : k.kind === "condition" ? "true" : roundForMessage(k.value)}`)
    .join(", ");
  return new GeometryInputError("inconsistent_knowns", `no compound curve satisfies ${listed}`, {
    field: "given",
    given: knowns.map((k) => k.key),
  });
}

function tangentOutOfRange(key: string, label: string, t: number, r1: number, r2: number, d: number): GeometryInputError {
  const lo = Math.min(r1, r2) * Math.tan(d / 2);
  const hi = Math.max(r1, r2) * Math.tan(d / 2);
  const range = `it must lie strictly between ${roundForMessage(lo)} and ${roundForMessage(hi)}, got ${roundForMessage(t)}`;
  if (r1 === r2) {
    return new GeometryInputError("inconsistent_knowns", `R1 equals R2, so this is a simple curve and the split of Δ is not fixed by tangent ${label}`, {
      field: key,
    });
  }
  const which = `R1 = ${roundForMessage(r1)} and R2 = ${roundForMessage(r2)}`;
  const message = t <= lo ? `tangent ${label} is too short for ${which} at this Δ: ${range}` : t >= hi ? `tangent ${label} is too long for ${which} at this Δ: ${range}` : `no compound curve fits tangent ${label}: ${range}`;
  return new GeometryInputError("inconsistent_knowns", message, { field: key, min: lo, max: hi });
}

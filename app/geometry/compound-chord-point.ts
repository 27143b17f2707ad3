import { isComplete, type CompoundState } from "./compound-state";

/**
 * Closed forms once the long chord and its angle at the PC are known, which fix the PT in the
 * local frame (PC at the origin, back tangent along +x, turning left): PT = LC (cos φ_PC, sin φ_PC)
 * = R1 (sin Δ1, 1 − cos Δ1) + R2 (sin Δ − sin Δ1, cos Δ1 − cos Δ). Any two of R1, R2, Δ1, Δ2 then
 * fix the other two; eliminating the unknown radius leaves a·sin u + b·cos u = c in one angle
 * (derived here from that vector equation, and checked by the solver's round trips):
 * - R1, Δ2: (X) sin u + (R1 − Y) cos u = R1 cos(Δ2/2) with u = Δ1 + Δ2/2, then R2 is linear;
 * - R2, Δ1: R2 tan(Δ1/2) sin Δ + R2 cos Δ = R2 + X tan(Δ1/2) − Y, then R1 is linear;
 * - R2, Δ2: (Y + R2 (cos Δ2 − 1)) sin Δ1 + (X + R2 sin Δ2)(cos Δ1 − 1) = 0, then R1 is linear;
 * - R1, R2: |PT − R2 (sin Δ, −cos Δ) − (0, R1)| = |R1 − R2|, linear in sin Δ and cos Δ;
 * - R1, Δ1: the second arc runs from the PCC, on its tangent, to the PT: Δ2 is twice the angle
 *   the chord PCC→PT makes with that tangent and R2 = chord / (2 sin(Δ2/2)).
 * Each equation can have two roots; both are returned and the solver keeps what reproduces the
 * knowns. Returns undefined when this does not apply.
 */
export function completeFromChordPoint(s: CompoundState): CompoundState[] | undefined {
  if (s.lc === undefined || s.p1 === undefined || isComplete(s)) return undefined;
  const x = s.lc * Math.cos(s.p1);
  const y = s.lc * Math.sin(s.p1);
  const { r1, r2, d1, d2 } = s;
  let params: [number, number, number, number][];
  if (r1 !== undefined && d1 !== undefined) params = fromFirstArc(x, y, r1, d1);
  else if (r1 !== undefined && d2 !== undefined) params = angleRoots(x, r1 - y, r1 * Math.cos(d2 / 2)).map((u) => withSecondRadius(x, y, r1, u - d2 / 2, d2));
  else if (r2 !== undefined && d1 !== undefined) {
    const k = Math.tan(d1 / 2);
    params = angleRoots(k * r2, r2, r2 + k * x - y).map((d) => withFirstRadius(x, y, r2, d1, d - d1));
  } else if (r2 !== undefined && d2 !== undefined) {
    // Δ1 = 0 always satisfies the equation (no first arc); the other root is the curve.
    const b = x + r2 * Math.sin(d2);
    params = angleRoots(y + r2 * (Math.cos(d2) - 1), b, b).filter((a) => Math.abs(Math.sin(a / 2)) > 1e-9).map((a) => withFirstRadius(x, y, r2, a, d2));
  } else if (r1 !== undefined && r2 !== undefined && r1 !== r2) params = fromRadii(x, y, r1, r2);
  else return undefined;
  return params.map(([a, b, c, d]) => ({ ...s, r1: a, r2: b, d1: normalise(c), d2: normalise(d) }));
}

/** Both u in (−π, π] with a sin u + b cos u = c (none when |c| > √(a² + b²)). */
function angleRoots(a: number, b: number, c: number): number[] {
  const rho = Math.hypot(a, b);
  if (!(rho > 0) || Math.abs(c) > rho * (1 + 1e-12)) return [];
  const base = Math.asin(Math.max(-1, Math.min(1, c / rho)));
  const psi = Math.atan2(b, a); // a sin u + b cos u = ρ sin(u + ψ)
  return [base - psi, Math.PI - base - psi];
}

function fromFirstArc(x: number, y: number, r1: number, d1: number): [number, number, number, number][] {
  const vx = x - r1 * Math.sin(d1);
  const vy = y - r1 * (1 - Math.cos(d1));
  const alpha = Math.atan2(vy, vx) - d1;
  const d2 = 2 * normaliseSigned(alpha);
  return [[r1, Math.hypot(vx, vy) / (2 * Math.sin(d2 / 2)), d1, d2]];
}

function fromRadii(x: number, y: number, r1: number, r2: number): [number, number, number, number][] {
  const [wx, wy] = [x, y - r1];
  const c = (wx * wx + wy * wy + r2 * r2 - (r1 - r2) ** 2) / (2 * r2);
  return angleRoots(wx, -wy, c).map((d) => {
    // O1 → O2 = (R1 − R2)(sin Δ1, −cos Δ1).
    const ox = (x - r2 * Math.sin(d)) / (r1 - r2);
    const oy = (y + r2 * Math.cos(d) - r1) / (r1 - r2);
    const d1 = Math.atan2(ox, -oy);
    return [r1, r2, d1, d - d1];
  });
}

/** R2 by least squares from both components, given R1, Δ1, Δ2. */
function withSecondRadius(x: number, y: number, r1: number, d1: number, d2: number): [number, number, number, number] {
  const ex = Math.sin(d1 + d2) - Math.sin(d1);
  const ey = Math.cos(d1) - Math.cos(d1 + d2);
  return [r1, ((x - r1 * Math.sin(d1)) * ex + (y - r1 * (1 - Math.cos(d1))) * ey) / (ex * ex + ey * ey), d1, d2];
}

/** R1 by least squares from both components, given R2, Δ1, Δ2. */
function withFirstRadius(x: number, y: number, r2: number, d1: number, d2: number): [number, number, number, number] {
  const ex = Math.sin(d1);
  const ey = 1 - Math.cos(d1);
  const rx = x - r2 * (Math.sin(d1 + d2) - Math.sin(d1));
  const ry = y - r2 * (Math.cos(d1) - Math.cos(d1 + d2));
  return [(rx * ex + ry * ey) / (ex * ex + ey * ey), r2, d1, d2];
}

/** An angle in [0, 2π): a central angle the solver then checks lies in (0, π). */
function normalise(a: number): number {
  const t = a % (2 * Math.PI);
  return t < 0 ? t + 2 * Math.PI : t;
}

function normaliseSigned(a: number): number {
  const t = normalise(a);
  return t > Math.PI ? t - 2 * Math.PI : t;
}

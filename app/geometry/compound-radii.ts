import type { Known } from "./compound-knowns";
import { unitCoefficientsAt } from "./compound-lean";
import { crossVec, unitAtRad } from "./vec2";

// With Δ1 and Δ2 fixed, the radii follow from the knowns by linear algebra (variable projection).

/** Linear rows a·R1 + b·R2 = c from the knowns at fixed angles (the long chord is kept aside). */
function linearRows(knowns: Known[], d1: number, d2: number): { rows: [number, number, number][]; chord?: number } {
  const u = unitCoefficientsAt(d1, d2);
  const p1: [number, number] = [u.p1x, u.p1y];
  const p2: [number, number] = [u.p2x, u.p2y];
  const rows: [number, number, number][] = [];
  let chord: number | undefined;
  for (const k of knowns) {
    if (k.key === "longChord") chord = k.value;
    else if (k.kind === "length") rows.push([u.coefficient(k.key, 0) / k.value, u.coefficient(k.key, 1) / k.value, 1]);
    else {
      const phi = k.key === "chordAnglePC" ? k.value : k.key === "chordAnglePT" ? d1 + d2 - k.value : d1;
      const dir = unitAtRad(phi);
      const [a, b] = [crossVec(p1, dir), crossVec(p2, dir)];
      const n = Math.hypot(a, b) || 1;
      rows.push([a / n, b / n, 0]);
    }
  }
  const distinct = dropParallelRows(rows);
  if (chord !== undefined && distinct.length < 2) distinct.push(...chordRowsFor(distinct[0], p1, p2, chord));
  return chord === undefined ? { rows: distinct } : { rows: distinct, chord };
}

/** Rows that say the same thing (R1 and t1 both given, say) would make the solve singular. */
function dropParallelRows(rows: [number, number, number][]): [number, number, number][] {
  const out: [number, number, number][] = [];
  for (const r of rows) {
    const parallel = out.some((q) => Math.abs(r[0] * q[1] - r[1] * q[0]) <= 1e-12 * Math.hypot(r[0], r[1]) * Math.hypot(q[0], q[1]));
    if (!parallel) out.push(r);
  }
  return out;
}

/** With a single linear row left, the long chord fixes the scale along it (one homogeneous row). */
function chordRowsFor(row: [number, number, number] | undefined, p1: [number, number], p2: [number, number], lc: number): [number, number, number][] {
  if (!row || row[2] !== 0) return [];
  const [a, b] = row;
  const v: [number, number] = [b * p1[0] - a * p2[0], b * p1[1] - a * p2[1]];
  const k = lc / Math.hypot(v[0], v[1]);
  return [[1, 0, b * k * Math.sign(b || 1)], [0, 1, -a * k * Math.sign(b || 1)]];
}

/**
 * One inhomogeneous linear row plus the long chord: R = R0 + t·n along the row's null direction
 * and |PT(R)| = LC is a quadratic in t, so up to two radius pairs. Undefined if not that case.
 */
export function solveRadiiWithChord(knowns: Known[], d1: number, d2: number): [number, number][] | undefined {
  const { rows, chord } = linearRows(knowns, d1, d2);
  const row = rows[0];
  if (chord === undefined || rows.length !== 1 || !row || row[2] === 0) return undefined;
  const u = unitCoefficientsAt(d1, d2);
  const u1 = [u.p1x, u.p1y] as const;
  const u2 = [u.p2x, u.p2y] as const;
  const [a, b, c] = row;
  const r0: [number, number] = [(c * a) / (a * a + b * b), (c * b) / (a * a + b * b)];
  const n: [number, number] = [-b, a];
  const p0 = [r0[0] * u1[0] + r0[1] * u2[0], r0[0] * u1[1] + r0[1] * u2[1]] as const;
  const pn = [n[0] * u1[0] + n[1] * u2[0], n[0] * u1[1] + n[1] * u2[1]] as const;
  const qa = pn[0] * pn[0] + pn[1] * pn[1];
  const qb = 2 * (p0[0] * pn[0] + p0[1] * pn[1]);
  const qc = p0[0] * p0[0] + p0[1] * p0[1] - chord * chord;
  const disc = qb * qb - 4 * qa * qc;
  if (!(disc >= 0) || qa === 0) return [];
  const sq = Math.sqrt(disc);
  // Numerically stable pair of roots.
  const q = -0.5 * (qb + Math.sign(qb || 1) * sq);
  const ts = q === 0 ? [0] : [q / qa, qc / q];
  return ts.map((t) => [r0[0] + t * n[0], r0[1] + t * n[1]]);
}

/** Least squares for (R1, R2) by Gram–Schmidt QR on unit-scaled rows (normal equations lose digits). */
export function solveRadii(knowns: Known[], d1: number, d2: number): [number, number] | undefined {
  const { rows } = linearRows(knowns, d1, d2);
  // Loops, not map/reduce: this runs for every cell of the numerical scan.
  let r11sq = 0;
  for (const r of rows) r11sq += (r[0] * r[0]) / (r[0] * r[0] + r[1] * r[1] || 1);
  const r11 = Math.sqrt(r11sq);
  if (!(r11 > 0)) return undefined;
  let r12 = 0;
  for (const [a, b] of rows) r12 += (a * b) / (r11 * (a * a + b * b || 1));
  let r22sq = 0;
  let q1c = 0;
  for (const [a, b, c] of rows) {
    const h2 = a * a + b * b || 1;
    const v = (b - (r12 * a) / r11) / Math.sqrt(h2);
    r22sq += v * v;
    q1c += (a * c) / (r11 * h2);
  }
  const r22 = Math.sqrt(r22sq);
  if (!(r22 > 1e-12)) return undefined;
  let q2c = 0;
  for (const [a, b, c] of rows) q2c += ((b - (r12 * a) / r11) * c) / (r22 * (a * a + b * b || 1));
  const x2 = q2c / r22;
  return [(q1c - r12 * x2) / r11, x2];
}

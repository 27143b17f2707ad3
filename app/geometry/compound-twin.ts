/** Residual vector of the projected search; undefined outside its domain. */
export type ResidualFn = (u: number[]) => number[] | undefined;

const H = 1e-4;

/**
 * Where a root's close twin should be, or undefined when none is predicted nearby. Near a fold
 * (a double root split by a small change in the knowns) two roots lie along the direction v in
 * which the Jacobian is nearly singular, and along that line r(u* + s v) ≈ s a + ½ s² c with
 * a = J v and c the second difference of r; its second zero is s = −2 (a·c)/(c·c) (least squares
 * in s after dividing by s). Derived (second-order Taylor model), checked by the property tests:
 * the scan gives a pair of twins one basin, so without this the second twin can be missed.
 */
export function predictTwinStart(residuals: ResidualFn, root: number[], cell: number[], maxCells = 4): number[] | undefined {
  const r0 = residuals(root);
  const v = root.length === 1 ? [1] : softDirection(residuals, root, r0);
  if (!r0 || !v) return undefined;
  const step = (s: number) => residuals(root.map((x, i) => x + s * v[i]!));
  const up = step(H);
  const down = step(-H);
  if (!up || !down) return undefined;
  const a = up.map((x, i) => (x - down[i]!) / (2 * H));
  const c = up.map((x, i) => (x + down[i]! - 2 * r0[i]!) / (H * H));
  const cc = dot(c, c);
  if (!(cc > 0)) return undefined;
  const s = (-2 * dot(a, c)) / cc;
  const scale = Math.hypot(...v.map((x, i) => x / cell[i]!));
  if (!Number.isFinite(s) || Math.abs(s) * scale > maxCells || Math.abs(s) < 1e-9) return undefined;
  return root.map((x, i) => x + s * v[i]!);
}

/** Unit direction of the smaller singular value of the 2-column Jacobian (eigenvector of JᵀJ). */
function softDirection(residuals: ResidualFn, u: number[], r0: number[] | undefined): number[] | undefined {
  if (!r0 || u.length !== 2) return undefined;
  const cols: number[][] = [];
  for (let j = 0; j < 2; j++) {
    const up = [...u];
    const down = [...u];
    up[j]! += H;
    down[j]! -= H;
    const ru = residuals(up);
    const rd = residuals(down);
    if (!ru || !rd) return undefined;
    cols.push(ru.map((x, i) => (x - rd[i]!) / (2 * H)));
  }
  const [p, q, w] = [dot(cols[0]!, cols[0]!), dot(cols[0]!, cols[1]!), dot(cols[1]!, cols[1]!)];
  // Smaller eigenvalue of [[p, q], [q, w]] and its eigenvector.
  const lambda = (p + w) / 2 - Math.hypot((p - w) / 2, q);
  const e: [number, number] = Math.abs(q) > 1e-300 ? [q, lambda - p] : p <= w ? [1, 0] : [0, 1];
  const n = Math.hypot(...e);
  return n > 0 ? [e[0] / n, e[1] / n] : undefined;
}

function dot(a: number[], b: number[]): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i]! * b[i]!;
  return s;
}

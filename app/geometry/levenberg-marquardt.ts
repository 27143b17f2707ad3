const FD_STEP = 1e-7;

/**
 * Damped Gauss–Newton (Levenberg–Marquardt, Marquardt's diagonal scaling) with a forward-difference
 * Jacobian, for a residual function that returns undefined outside its domain. Returns the point
 * when the largest residual is at most `acceptResidual`, else undefined.
 */
export function runLevenbergMarquardt(
  residuals: (u: number[]) => number[] | undefined,
  u0: number[],
  options: { maxIterations: number; residualTol: number; acceptResidual: number },
): number[] | undefined {
  let u: number[] = u0;
  const r0 = residuals(u);
  if (!r0) return undefined;
  let r: number[] = r0;
  let cost = sumSquares(r);
  let lambda = 1e-3;
  for (let it = 0; it < options.maxIterations && maxAbs(r) > options.residualTol; it++) {
    const jac = jacobian(residuals, u, r);
    const step: number[] | undefined = jac && dampedStep(jac, r, lambda);
    const next: number[] | undefined = step && u.map((v, i) => v + step[i]!);
    const rNext: number[] | undefined = next && residuals(next);
    if (next && rNext && sumSquares(rNext) < cost) {
      [u, r, cost] = [next, rNext, sumSquares(rNext)];
      lambda = Math.max(lambda * 0.1, 1e-15);
    } else {
      lambda *= 10;
      if (lambda > 1e10) break;
    }
  }
  return maxAbs(r) <= options.acceptResidual ? u : undefined;
}

function jacobian(residuals: (u: number[]) => number[] | undefined, u: number[], r: number[]): number[][] | undefined {
  const cols: number[][] = [];
  for (let j = 0; j < u.length; j++) {
    let h = FD_STEP * Math.max(1, Math.abs(u[j]!));
    const up = [...u];
    up[j]! += h;
    let rp = residuals(up);
    if (!rp) {
      up[j]! -= 2 * h;
      h = -h;
      rp = residuals(up);
    }
    if (!rp) return undefined;
    cols.push(rp.map((v, i) => (v - r[i]!) / h));
  }
  return r.map((_, i) => cols.map((c) => c[i]!));
}

/** Solves (JᵀJ + λ·diag(JᵀJ)) δ = −Jᵀr by Gaussian elimination with partial pivoting. */
function dampedStep(jac: number[][], r: number[], lambda: number): number[] | undefined {
  const k = jac[0]!.length;
  const ids = [...Array(k).keys()];
  const a = ids.map((i) => ids.map((j) => jac.reduce((s, row) => s + row[i]! * row[j]!, 0)));
  const g = ids.map((i) => -jac.reduce((s, row, m) => s + row[i]! * r[m]!, 0));
  for (const i of ids) a[i]![i]! += lambda * Math.max(a[i]![i]!, 1e-12);
  for (let c = 0; c < k; c++) {
    let p = c;
    for (let i = c + 1; i < k; i++) if (Math.abs(a[i]![c]!) > Math.abs(a[p]![c]!)) p = i;
    if (a[p]![c] === 0) return undefined;
    [a[c], a[p], g[c], g[p]] = [a[p]!, a[c]!, g[p]!, g[c]!];
    for (let i = c + 1; i < k; i++) {
      const f = a[i]![c]! / a[c]![c]!;
      for (let m = c; m < k; m++) a[i]![m]! -= f * a[c]![m]!;
      g[i]! -= f * g[c]!;
    }
  }
  const out = new Array<number>(k).fill(0);
  for (let i = k - 1; i >= 0; i--) {
    let s = g[i]!;
    for (let m = i + 1; m < k; m++) s -= a[i]![m]! * out[m]!;
    out[i] = s / a[i]![i]!;
  }
  return out.every(Number.isFinite) ? out : undefined;
}

export function sumSquares(r: number[]): number {
  return r.reduce((s, v) => s + v * v, 0);
}

function maxAbs(r: number[]): number {
  return r.reduce((m, v) => Math.max(m, Math.abs(v)), 0);
}

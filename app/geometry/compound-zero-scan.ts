/** A continuous scalar function of one variable; NaN where it is undefined. */
export type ScalarFn = (x: number) => number;

const GOLDEN = (3 - Math.sqrt(5)) / 2;
const MAX_BRENT_STEPS = 100;
const MAX_DIP_STEPS = 60;

/**
 * Every zero of `f` seen from its samples `fs` at increasing `xs`: a sign change between
 * neighbours brackets one zero; a same-signed local minimum of |f| is searched for a dip across
 * zero (two zeros closer than the sample spacing), which then brackets both. Each bracket is
 * refined by Brent's method, so each zero is found to round-off. A dip that only touches zero
 * (its bottom within `touch`, the round-off size of f, of zero) is returned as one zero.
 */
export function findSampledZeros(f: ScalarFn, xs: readonly number[], fs: readonly number[], touch = 0): number[] {
  const zeros: number[] = [];
  for (let i = 0; i < xs.length; i++) {
    const fi = fs[i]!;
    if (fi === 0) zeros.push(xs[i]!);
    if (i + 1 < xs.length && fi * fs[i + 1]! < 0) zeros.push(refineZero(f, xs[i]!, xs[i + 1]!, fi, fs[i + 1]!));
    if (i > 0 && i + 1 < xs.length && isSameSignDip(fs[i - 1]!, fi, fs[i + 1]!)) {
      zeros.push(...searchDip(f, xs[i - 1]!, xs[i]!, xs[i + 1]!, fs[i - 1]!, fi, fs[i + 1]!, touch));
    }
  }
  return zeros;
}

/**
 * Every zero of a periodic `f` (period `period`) from samples at increasing `ts` in
 * [0, period). The loop is cut at the sample of largest |f|, which can be neither a zero nor
 * the bottom of a dip, so nothing is lost at the cut. Zeros are returned in [0, period).
 */
export function findCyclicZeros(f: ScalarFn, ts: readonly number[], fs: readonly number[], period: number, touch = 0): number[] {
  let best = 0;
  for (let k = 1; k < ts.length; k++) if (Math.abs(fs[k]!) > Math.abs(fs[best]!)) best = k;
  const shift = ts[best]!;
  const order = [...ts.slice(best), ...ts.slice(0, best)].map((t) => (t - shift + period) % period);
  const values = [...fs.slice(best), ...fs.slice(0, best)];
  const shifted: ScalarFn = (t) => f((t + shift) % period);
  return findSampledZeros(shifted, [...order, period], [...values, fs[best]!], touch).map((t) => (t + shift) % period);
}

function isSameSignDip(a: number, b: number, c: number): boolean {
  return a * b > 0 && b * c > 0 && Math.abs(b) < Math.abs(a) && Math.abs(b) <= Math.abs(c);
}

/** Minimises |f| (as s·f, s its sign) on [a, c] by golden section; splits at a crossing. */
function searchDip(f: ScalarFn, a: number, b: number, c: number, fa: number, fb: number, fc: number, touch: number): number[] {
  const s = Math.sign(fb);
  let [lo, hi, x, fx] = [a, c, b, s * fb];
  for (let it = 0; it < MAX_DIP_STEPS && hi - lo > 4 * Number.EPSILON * Math.max(1, Math.abs(x)); it++) {
    const u = x - lo > hi - x ? x - GOLDEN * (x - lo) : x + GOLDEN * (hi - x);
    const fu = s * f(u);
    if (!(fu === fu)) return [];
    // Deeper than round-off: a crossing by noise alone would send both brackets to one root.
    if (fu < -touch) return [refineZero(f, a, u, fa, s * fu), refineZero(f, u, c, s * fu, fc)];
    if (fu < fx) {
      if (u < x) hi = x;
      else lo = x;
      [x, fx] = [u, fu];
    } else if (u < x) lo = u;
    else hi = u;
  }
  return fx <= touch ? [x] : [];
}

/**
 * Brent's method (R. P. Brent, Algorithms for Minimization without Derivatives, 1973, ch. 4):
 * inverse quadratic or secant steps, falling back to bisection, on a sign-changing bracket.
 */
export function refineZero(f: ScalarFn, a: number, b: number, fa: number, fb: number): number {
  // Scalars, not destructuring: this runs for every bracket and contour node.
  let c = a;
  let fc = fa;
  let d = b - a;
  let e = d;
  for (let it = 0; it < MAX_BRENT_STEPS; it++) {
    if (fb * fc > 0) {
      c = a;
      fc = fa;
      d = e = b - a;
    }
    if (Math.abs(fc) < Math.abs(fb)) {
      a = b;
      b = c;
      c = a;
      fa = fb;
      fb = fc;
      fc = fa;
    }
    const tol = 2 * Number.EPSILON * Math.abs(b) + 1e-300;
    const m = (c - b) / 2;
    if (Math.abs(m) <= tol || fb === 0) return b;
    if (Math.abs(e) >= tol && Math.abs(fa) > Math.abs(fb)) {
      const step = interpolationStep(a, b, c, fa, fb, fc);
      if (2 * step.p < Math.min(3 * m * step.q - Math.abs(tol * step.q), Math.abs(e * step.q))) {
        e = d;
        d = step.p / step.q;
      } else d = e = m;
    } else d = e = m;
    a = b;
    fa = fb;
    b += Math.abs(d) > tol ? d : m > 0 ? tol : -tol;
    fb = f(b);
    if (!(fb === fb)) return a;
  }
  return b;
}

/** Brent's step as p/q with p ≥ 0: secant when a = c, inverse quadratic otherwise. */
function interpolationStep(a: number, b: number, c: number, fa: number, fb: number, fc: number): { p: number; q: number } {
  const m = (c - b) / 2;
  const s = fb / fa;
  let p: number;
  let q: number;
  if (a === c) {
    p = 2 * m * s;
    q = 1 - s;
  } else {
    const qa = fa / fc;
    const r = fb / fc;
    p = s * (2 * m * qa * (qa - r) - (b - a) * (r - 1));
    q = (qa - 1) * (r - 1) * (s - 1);
  }
  return p > 0 ? { p, q: -q } : { p: -p, q };
}

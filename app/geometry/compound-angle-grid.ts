// Not the golden fraction: the dip search probes at golden-section points, which would land back
// on round angles.
const OFFSET = Math.SQRT2 - 1;
const EDGE = 1e-9;

/**
 * Samples of an angle in (0, π): `count` uniform steps plus, in the end cells, `halvings` samples
 * halving towards 0 and π (near an end a root can sit at a tiny angle: an arc of a few tenths of
 * a degree and a huge radius is still a curve). The grid is offset by an irrational fraction of
 * a step so that no sample falls on a round angle such as 45°: a root exactly on a sample has a
 * residual of round-off size and unknown sign.
 */
export function sampleAngles(count: number, halvings: number): number[] {
  const step = Math.PI / count;
  const near = (fraction: number) => Array.from({ length: halvings }, (_, k) => fraction * step * 2 ** (k - halvings)); // ascending
  const uniform = Array.from({ length: count }, (_, k) => step * (k + OFFSET));
  return [EDGE, ...near(OFFSET), ...uniform, ...near(1 - OFFSET).map((e) => Math.PI - e).reverse(), Math.PI - EDGE];
}

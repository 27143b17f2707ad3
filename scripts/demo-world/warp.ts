/**
 * The town is laid out on a flat design plane (u east, v north, metres,
 * origin at the town centre) and then bent onto EPSG:32617 (WGS 84 / UTM 17N)
 * by one smooth map, so the street grid curves gently instead of being a
 * checkerboard while shared vertices stay shared.
 */
export type Uv = [number, number];
export type Xy = [number, number];

/** Centre of the invented town in EPSG:32617 metres (rural hill country; no real town is meant). */
export const CENTRE_E = 560000;
export const CENTRE_N = 4420000;
/** Radius of the bend: streets of constant v become arcs about a point this far south. */
const BEND_RADIUS = 9000;
/** Whole-plan rotation, radians (counter-clockwise). */
const ROTATION = 0.21;

/** Rounds to the centimetre, the precision written to every file. */
export const cm = (x: number): number => Math.round(x * 100) / 100;

/** Design plane → EPSG:32617, rounded to the centimetre. */
export function warp([u, v]: Uv): Xy {
  const a = u / BEND_RADIUS;
  const bx = (BEND_RADIUS + v) * Math.sin(a);
  const by = (BEND_RADIUS + v) * Math.cos(a) - BEND_RADIUS;
  const c = Math.cos(ROTATION);
  const s = Math.sin(ROTATION);
  return [cm(CENTRE_E + bx * c - by * s), cm(CENTRE_N + bx * s + by * c)];
}

/** Warps a closed design-plane ring (first point repeated at the end). */
export function warpRing(ring: Uv[]): Xy[] {
  const out = ring.map(warp);
  const first = out[0]!;
  const last = out[out.length - 1]!;
  if (first[0] !== last[0] || first[1] !== last[1]) out.push([first[0], first[1]]);
  return out;
}

/** Points every at most `step` metres along a straight design-plane segment, excluding its end. */
export function densify(a: Uv, b: Uv, step: number): Uv[] {
  const n = Math.max(1, Math.ceil(Math.hypot(b[0] - a[0], b[1] - a[1]) / step));
  const out: Uv[] = [];
  for (let i = 0; i < n; i++) out.push([a[0] + ((b[0] - a[0]) * i) / n, a[1] + ((b[1] - a[1]) * i) / n]);
  return out;
}

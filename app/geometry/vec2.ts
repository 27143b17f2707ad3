/** Plane point or vector [x, y] (x = easting, y = northing) in working length units. */
export type Vec2 = [number, number];

/** a + b */
export function addVec(a: Vec2, b: Vec2): Vec2 {
  return [a[0] + b[0], a[1] + b[1]];
}

/** a − b */
export function subVec(a: Vec2, b: Vec2): Vec2 {
  return [a[0] - b[0], a[1] - b[1]];
}

/** k·a */
export function scaleVec(a: Vec2, k: number): Vec2 {
  return [a[0] * k, a[1] * k];
}

/** Dot product. */
export function dotVec(a: Vec2, b: Vec2): number {
  return a[0] * b[0] + a[1] * b[1];
}

/** z-component of the cross product a × b (positive when b is counter-clockwise of a). */
export function crossVec(a: Vec2, b: Vec2): number {
  return a[0] * b[1] - a[1] * b[0];
}

/** Euclidean length. */
export function lengthVec(a: Vec2): number {
  return Math.hypot(a[0], a[1]);
}

/** Distance between two points. */
export function distanceBetween(a: Vec2, b: Vec2): number {
  return Math.hypot(a[0] - b[0], a[1] - b[1]);
}

/** Unit vector at math angle `rad` (counter-clockwise from +x). */
export function unitAtRad(rad: number): Vec2 {
  return [Math.cos(rad), Math.sin(rad)];
}

/** a rotated by `rad` counter-clockwise. */
export function rotateVec(a: Vec2, rad: number): Vec2 {
  const c = Math.cos(rad);
  const s = Math.sin(rad);
  return [a[0] * c - a[1] * s, a[0] * s + a[1] * c];
}

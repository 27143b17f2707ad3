import type { AnnularPiece, Bounds, QuadPiece } from "./corridor-types";
import type { Vec2 } from "./vec2";

/** Bounds of a set of points. */
export function boundsOf(points: Vec2[]): Bounds {
  const b: Bounds = [Infinity, Infinity, -Infinity, -Infinity];
  for (const p of points) extendBounds(b, p[0], p[1]);
  return b;
}

/** Grows `b` to include (x, y). */
export function extendBounds(b: Bounds, x: number, y: number): void {
  if (x < b[0]) b[0] = x;
  if (y < b[1]) b[1] = y;
  if (x > b[2]) b[2] = x;
  if (y > b[3]) b[3] = y;
}

/** True when two bounds overlap with positive area or touch. */
export function boundsOverlap(a: Bounds, b: Bounds): boolean {
  return a[0] <= b[2] && b[0] <= a[2] && a[1] <= b[3] && b[1] <= a[3];
}

/**
 * Signed shoelace area of a flat ring `[x0, y0, x1, y1, …]` (Gauss's area formula), counter-
 * clockwise positive. Coordinates are taken relative to the first vertex: with projected
 * coordinates in the millions, the absolute products would cancel away the area's last digits.
 */
export function flatRingArea(flat: ArrayLike<number>): number {
  const n = flat.length;
  if (n < 6) return 0;
  const ox = flat[0]!;
  const oy = flat[1]!;
  let s = 0;
  let px = flat[n - 2]! - ox;
  let py = flat[n - 1]! - oy;
  for (let i = 0; i < n; i += 2) {
    const x = flat[i]! - ox;
    const y = flat[i + 1]! - oy;
    s += px * y - x * py;
    px = x;
    py = y;
  }
  return s / 2;
}

/** Exact text of everything a take measurement reads from a quad (numbers round-trip), for caches. */
export function quadKey(p: Pick<QuadPiece, "corners" | "length" | "along">): string {
  return `q${p.corners.map((c) => `${c[0]},${c[1]}`).join(";")};${p.length};${p.along.join(",")}`;
}

/** Exact text of everything a take measurement reads from an annular slice, for caches. */
export function annularKey(p: Pick<AnnularPiece, "center" | "rayFrom" | "rayTo" | "inner" | "outer" | "turn" | "length" | "centerlineRadius" | "sweepRad">): string {
  const side = (s: AnnularPiece["inner"]) => `${s.center[0]},${s.center[1]},${s.radius}`;
  return `a${p.center[0]},${p.center[1]};${p.rayFrom[0]},${p.rayFrom[1]};${p.rayTo[0]},${p.rayTo[1]};${side(p.inner)};${side(p.outer)};${p.turn};${p.centerlineRadius};${p.length};${p.sweepRad}`;
}

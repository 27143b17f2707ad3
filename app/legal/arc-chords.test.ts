import { expect, test } from "vitest";
import type { Vec2 } from "~/geometry/vec2";
import { chordArc } from "./arc-chords";

const R = 300;
const at = (deg: number): Vec2 => [R * Math.cos((deg * Math.PI) / 180), R * Math.sin((deg * Math.PI) / 180)];
/** Middle ordinate of a chord c on radius R: M = R − √(R² − c²/4) (Schofield & Breach §10.1). */
const sagitta = (p: Vec2, q: Vec2) => R - Math.sqrt(R * R - Math.hypot(q[0] - p[0], q[1] - p[1]) ** 2 / 4);

test("chords are fine where a parcel line crosses the arc and coarse elsewhere; every point is on the circle", () => {
  // A 60° arc about the origin; a radial parcel line crosses it at 30°.
  const near: [Vec2, Vec2][] = [[[0, 0], at(30).map((v) => v * 1.5) as Vec2]];
  const pts = chordArc([0, 0], R, at(0), at(60), { fine: 0.0001, coarse: 0.05, near, nearDistance: 0.5 });
  expect(pts[0]).toEqual(at(0));
  expect(pts[pts.length - 1]).toEqual(at(60));
  for (const p of pts) expect(Math.abs(Math.hypot(p[0], p[1]) - R)).toBeLessThan(1e-9);
  let fineCount = 0;
  for (let i = 1; i < pts.length; i++) {
    const mid = Math.atan2(pts[i]![1] + pts[i - 1]![1], pts[i]![0] + pts[i - 1]![0]) * (180 / Math.PI);
    const s = sagitta(pts[i - 1]!, pts[i]!);
    // Within 0.5 m of the crossing (±0.5/300 rad ≈ ±0.1°) the sagitta is at most 0.1 mm.
    if (Math.abs(mid - 30) < 0.09) (expect(s).toBeLessThanOrEqual(0.0001 + 1e-12), fineCount++);
    else expect(s).toBeLessThanOrEqual(0.05 + 1e-12);
  }
  expect(fineCount).toBeGreaterThan(2);
  // Far fewer points than fine chords throughout: 60° at 0.1 mm would need about 740.
  expect(pts.length).toBeLessThan(80);
});

test("with no parcel line near, the arc is chorded coarsely only", () => {
  const pts = chordArc([0, 0], R, at(0), at(60), { fine: 0.0001, coarse: 0.05, near: [[[1000, 1000], [1100, 1000]]], nearDistance: 0.5 });
  // countChords: ceil(Δ / (2·acos(1 − s/R))) = ceil(1.0472 / 0.036515) = 29 chords.
  expect(pts.length).toBe(30);
});

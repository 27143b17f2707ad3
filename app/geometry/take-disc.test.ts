import { expect, test } from "vitest";
import { ringDiscArea } from "./take-disc";

const flat = (pts: number[][]) => pts.flat();
const discArea = (pts: number[][], r: number, dx = 0, dy = 0) => ringDiscArea(flat(pts), pts.length * 2, r, dx, dy);
const square = (a: number) => [[-a, -a], [a, -a], [a, a], [-a, a]];

/** Circular segment beyond a chord at distance d from the centre: r²/2·(θ − sin θ), θ = 2·acos(d/r) (CRC Standard Mathematical Tables, circular segment). */
const segment = (r: number, d: number) => {
  const theta = 2 * Math.acos(d / r);
  return ((r * r) / 2) * (theta - Math.sin(theta));
};

test("a square centred on the circle: πr² inside it, 4a² around it, and πr² − 4 segments in between", () => {
  // Square of half-side a centred on a disc of radius r; for a < r < a√2 the disc loses four
  // segments beyond the sides (closed form from the circular segment area).
  const a = 10;
  expect(discArea(square(a), 7)).toBeCloseTo(Math.PI * 49, 11);
  expect(discArea(square(a), 15)).toBeCloseTo(400, 11);
  for (const r of [10.5, 12, 13.9]) expect(discArea(square(a), r)).toBeCloseTo(Math.PI * r * r - 4 * segment(r, a), 10);
});

test("a half-plane cap is the circular segment r²/2·(θ − sin θ)", () => {
  const r = 250;
  for (const d of [-200, -30, 0, 41.7, 249]) {
    // Everything with y ≥ d inside a box much larger than the disc.
    const cap = [[-1000, d], [1000, d], [1000, 1000], [-1000, 1000]];
    const expected = d >= 0 ? segment(r, d) : Math.PI * r * r - segment(r, -d);
    expect(discArea(cap, r)).toBeCloseTo(expected, 8);
  }
});

test("orientation gives the sign, the centre may be offset, and a concave polygon adds up", () => {
  const r = 12;
  const cw = [...square(10)].reverse();
  expect(discArea(cw, r)).toBeCloseTo(-(Math.PI * r * r - 4 * segment(r, 10)), 10);
  // Shifting the polygon by (500, −300) and the coordinates back by (dx, dy) changes nothing.
  const shifted = square(10).map(([x, y]) => [x! + 500, y! - 300]);
  expect(discArea(shifted, r, -500, 300)).toBeCloseTo(Math.PI * r * r - 4 * segment(r, 10), 10);
  // A T shape (concave): the centred square plus everything right of x = 10 — square part plus one segment.
  const tee = [[-10, -10], [10, -10], [10, -100], [100, -100], [100, 100], [10, 100], [10, 10], [-10, 10]];
  expect(discArea(tee, 13)).toBeCloseTo(Math.PI * 169 - 4 * segment(13, 10) + segment(13, 10), 10);
  expect(discArea([[20, 20], [30, 20], [30, 30]], 13)).toBe(0);
});

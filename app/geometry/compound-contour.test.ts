import { expect, test } from "vitest";
import { traceZeroContour } from "./compound-contour";
import { findChainZeros } from "./compound-contour-roots";

// Closed-form curves: circles x² + y² = ρ² and the line y = x; their intersections with lines.

const grid = (lo: number, hi: number, n: number) => Array.from({ length: n + 1 }, (_, k) => lo + ((hi - lo) * (k + 0.37)) / (n + 1));
const circle = (rho: number) => (x: number, y: number) => x * x + y * y - rho * rho;

test("a circle comes out as one closed chain with every node on it", () => {
  const chains = traceZeroContour(circle(1), grid(-2, 2, 20), grid(-2, 2, 20));
  expect(chains).toHaveLength(1);
  expect(chains[0]!.closed).toBe(true);
  for (const [x, y] of chains[0]!.nodes) expect(Math.abs(Math.hypot(x, y) - 1)).toBeLessThan(1e-14);
  // Consecutive nodes go round the circle: their angular steps are small and of one sign.
  const turns = chains[0]!.nodes.map(([x, y], k, all) => {
    const [u, v] = all[(k + 1) % all.length]!;
    return Math.atan2(x * v - y * u, x * u + y * v);
  });
  expect(turns.every((t) => Math.sign(t) === Math.sign(turns[0]!) && Math.abs(t) < 0.5)).toBe(true);
});

test("two separate circles are two chains, and a line across the grid is an open chain", () => {
  const rings = traceZeroContour((x, y) => circle(1)(x, y) * circle(1.6)(x, y), grid(-2, 2, 24), grid(-2, 2, 24));
  expect(rings.map((c) => c.closed)).toEqual([true, true]);
  const line = traceZeroContour((x, y) => y - x, grid(0, 1, 10), grid(0, 1, 10));
  expect(line).toHaveLength(1);
  expect(line[0]!.closed).toBe(false);
});

test("a saddle cell keeps the two branches of a hyperbola apart", () => {
  // xy = 1e-5 has one branch in each of quadrants I and III; the cell round the origin has its
  // four corners alternating in sign, and joining the wrong pair would link the two branches.
  const chains = traceZeroContour((x, y) => x * y - 1e-5, grid(-1, 1, 10), grid(-1, 1, 10));
  expect(chains).toHaveLength(2);
  for (const { nodes, closed } of chains) {
    expect(closed).toBe(false);
    expect(new Set(nodes.map(([x]) => Math.sign(x))).size).toBe(1);
    for (const [x, y] of nodes) expect(Math.abs(x * y - 1e-5)).toBeLessThan(1e-17);
  }
});

test("zeros of a second function along a chain are exact, twins within one cell included", () => {
  const [xs, ys] = [grid(-2, 2, 20), grid(-2, 2, 20)];
  const [chain] = traceZeroContour(circle(1), xs, ys);
  // y = 0.5 cuts the unit circle at x = ±√0.75.
  const half = findChainZeros(chain!, circle(1), (_x, y) => y - 0.5, 0.2, 1e-12).sort((p, q) => p[0] - q[0]);
  expect(half).toHaveLength(2);
  expect(Math.abs(half[0]![0] + Math.sqrt(0.75))).toBeLessThan(1e-12);
  expect(Math.abs(half[1]![0] - Math.sqrt(0.75))).toBeLessThan(1e-12);
  // y = 0.9995 cuts it at x = ±0.0316, both inside one 0.2-wide cell near the top.
  const top = findChainZeros(chain!, circle(1), (_x, y) => y - 0.9995, 0.2, 1e-12).sort((p, q) => p[0] - q[0]);
  const x = Math.sqrt(1 - 0.9995 ** 2);
  expect(top).toHaveLength(2);
  expect(Math.abs(top[0]![0] + x)).toBeLessThan(1e-9);
  expect(Math.abs(top[1]![0] - x)).toBeLessThan(1e-9);
});

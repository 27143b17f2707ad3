import { expect, test } from "vitest";
import { countChords } from "./densify";

test("chord count keeps the middle ordinate within tolerance", () => {
  // Middle ordinate M = R(1 − cos(θ/2)) (Schofield & Breach §10.1).
  for (const [r, d, tol] of [[500, 1, 0.01], [50, 3, 0.001], [10_000, 0.2, 0.01]] as const) {
    const n = countChords(r, d, tol);
    expect(r * (1 - Math.cos(d / n / 2))).toBeLessThanOrEqual(tol * (1 + 1e-12));
    if (n > 1) expect(r * (1 - Math.cos(d / (n - 1) / 2))).toBeGreaterThan(tol);
  }
});

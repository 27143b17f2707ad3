import { expect, test } from "vitest";
import { boundaryToPolygons } from "./boundary-polygon";
import type { BoundaryPart } from "./legal-types";

/** Shoelace area of a closed ring (Gauss's area formula). */
function shoelace(ring: number[][]): number {
  let s = 0;
  for (let i = 0; i + 1 < ring.length; i++) s += ring[i]![0]! * ring[i + 1]![1]! - ring[i + 1]![0]! * ring[i]![1]!;
  return s / 2;
}

// An annular sector about (500000, 4400000): radii 280 and 320, θ = 45° (grid-sized coordinates).
const [cx, cy] = [500000, 4400000];
const at = (deg: number, r: number): [number, number] => [cx + r * Math.cos((deg * Math.PI) / 180), cy + r * Math.sin((deg * Math.PI) / 180)];
const sector: BoundaryPart = {
  rings: [
    {
      hole: false,
      segments: [
        { kind: "line", from: at(0, 280), to: at(0, 320), on: "parcel" },
        { kind: "arc", from: at(0, 320), to: at(45, 320), centre: [cx, cy], radius: 320, sweepRad: Math.PI / 4 },
        { kind: "line", from: at(45, 320), to: at(45, 280), on: "parcel" },
        { kind: "arc", from: at(45, 280), to: at(0, 280), centre: [cx, cy], radius: 280, sweepRad: -Math.PI / 4 },
      ],
    },
  ],
};

test("the chorded polygon keeps the sector's exact area ½θ(R₂² − R₁²) and stays within 0.7 of the sagitta of the arcs", () => {
  for (const tol of [0.001, 0.05, 2]) {
    const [poly] = boundaryToPolygons([sector], tol);
    const ring = poly![0]!;
    // CRC Standard Mathematical Tables, "circular sector": ½θR².
    expect(Math.abs(shoelace(ring.map(([x, y]) => [x! - cx, y! - cy])) - 0.5 * (Math.PI / 4) * (320 ** 2 - 280 ** 2))).toBeLessThan(1e-6);
    for (const [x, y] of ring) {
      const r = Math.hypot(x! - cx, y! - cy);
      const off = Math.min(Math.abs(r - 320), Math.abs(r - 280));
      // ρ − R ≈ Rα²/12 = ⅔ of the sagitta, a little more because the two end chords start on the circle.
      expect(off).toBeLessThanOrEqual(0.7 * tol);
    }
    expect(ring[0]).toEqual(ring[ring.length - 1]);
  }
});

test("a 1 mm sagitta on R = 320 m gives chords of about √(8Rs) = 1.6 m", () => {
  const [poly] = boundaryToPolygons([sector], 0.001);
  // Arc lengths 251.3 m and 219.9 m → about 157 + 137 chords, plus the two radial ends.
  expect(poly![0]!.length).toBeGreaterThan(280);
  expect(poly![0]!.length).toBeLessThan(320);
});

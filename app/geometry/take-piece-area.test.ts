import { expect, test } from "vitest";
import type { AnnularPiece, QuadPiece } from "./corridor-types";
import { buildCorridor } from "./corridor-build";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import { polygonPieceArea } from "./take-piece-area";
import { prepareShape } from "./take-shapes";

// A right-angle left turn of radius 300 in a UTM-like frame, half-widths 20 left, 35 right.
const X0 = 500_000;
const Y0 = 4_400_000;
const els = computeAlignmentGeometry({ units: "m", startStation: 0, points: [{ x: X0, y: Y0 }, { x: X0 + 800, y: Y0, curve: { type: "simple", radius: 300 } }, { x: X0 + 800, y: Y0 + 800 }] }).elements;
const corridor = buildCorridor(els, { left: 20, right: 35 }, { pieceLength: 1e6 });
const slice = corridor.pieces.find((p): p is AnnularPiece => p.kind === "annular")!;
const quad = corridor.pieces.find((p): p is QuadPiece => p.kind === "quad")!;
const Ri = 280;
const Ro = 335;
const polygon = (rings: number[][][]) => prepareShape([rings], "p").polygons[0]!;
const at = (angle: number, r: number) => [slice.center[0] + r * Math.cos(angle), slice.center[1] + r * Math.sin(angle)];

test("one 90° slice with inner radius R − wL and outer R + wR (left turn)", () => {
  expect(slice.sweepRad).toBeCloseTo(Math.PI / 2, 12);
  expect(slice.inner.radius).toBe(Ri);
  expect(slice.outer.radius).toBe(Ro);
});

test("a polygon holding the whole slice takes ½Δ(Ro² − Ri²) (annular sector, closed form)", () => {
  const big = [[X0 - 5000, Y0 - 5000], [X0 + 5000, Y0 - 5000], [X0 + 5000, Y0 + 5000], [X0 - 5000, Y0 + 5000], [X0 - 5000, Y0 - 5000]];
  expect(polygonPieceArea(polygon([big]), slice)).toBeCloseTo(0.5 * (Math.PI / 2) * (Ro * Ro - Ri * Ri), 6);
});

test("a wedge over half the slice's angle takes half, and as a hole it leaves the other half", () => {
  const a0 = Math.atan2(slice.rayFrom[1], slice.rayFrom[0]);
  const half = [slice.center, at(a0, 2000), at(a0 + Math.PI / 4, 2000), slice.center];
  const halfArea = 0.5 * (Math.PI / 4) * (Ro * Ro - Ri * Ri);
  expect(polygonPieceArea(polygon([half]), slice)).toBeCloseTo(halfArea, 6);
  const big = [[X0 - 5000, Y0 - 5000], [X0 + 5000, Y0 - 5000], [X0 + 5000, Y0 + 5000], [X0 - 5000, Y0 + 5000], [X0 - 5000, Y0 - 5000]];
  expect(polygonPieceArea(polygon([big, half]), slice)).toBeCloseTo(halfArea, 6);
});

test("a cut square to the bisector takes the outer circle's segment r²/2·(θ − sin θ)", () => {
  // The chord at distance d from the centre, across the bisector, meets the outer circle within the
  // slice when acos(d/Ro) < 45° and stays clear of the inner circle when d > Ri (closed form).
  const mid = Math.atan2(slice.rayFrom[1] + slice.rayTo[1], slice.rayFrom[0] + slice.rayTo[0]);
  const d = 320;
  const u = [Math.cos(mid), Math.sin(mid)];
  const v = [-u[1]!, u[0]!];
  const p = (s: number, t: number) => [slice.center[0] + u[0]! * s + v[0]! * t, slice.center[1] + u[1]! * s + v[1]! * t];
  const cap = [p(d, -400), p(1000, -400), p(1000, 400), p(d, 400), p(d, -400)];
  const theta = 2 * Math.acos(d / Ro);
  expect(polygonPieceArea(polygon([cap]), slice)).toBeCloseTo(((Ro * Ro) / 2) * (theta - Math.sin(theta)), 6);
});

test("a concave parcel clipped by a tangent quad: the overlap by hand", () => {
  // The first tangent runs east along y = Y0 from x = X0 to the PC at X0 + 500: the quad is 500 × (20 + 35).
  expect(quad.area).toBeCloseTo(500 * 55, 8);
  // A U-shaped parcel straddling the right line (y = Y0 − 35): prongs 10 wide, 30 deep, joined below.
  const x = X0 + 100;
  const y = Y0 - 35;
  const u = [[x, y - 20], [x + 50, y - 20], [x + 50, y + 30], [x + 40, y + 30], [x + 40, y - 10], [x + 10, y - 10], [x + 10, y + 30], [x, y + 30], [x, y - 20]];
  expect(polygonPieceArea(polygon([u]), quad)).toBeCloseTo(2 * 10 * 30, 8);
});

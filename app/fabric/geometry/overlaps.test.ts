import { expect, test } from "vitest";
import type { MultiPolygon, Polygon, Position } from "geojson";
import { convexOverlapArea, isConvexRing } from "./convex-clip";
import { indexForOverlaps, overlapArea, overlapsOf } from "./overlaps";
import { shapely } from "../test-support/reference-tools.server";
import type { AreaGeometry } from "../types";

const poly = (...rings: Position[][]): Polygon => ({ type: "Polygon", coordinates: rings });
const rect = (x: number, y: number, w: number, h: number): Position[] => [[x, y], [x + w, y], [x + w, y + h], [x, y + h], [x, y]];

/** GEOS intersection areas (shapely) of geometry pairs. */
const geosOverlaps = (pairs: [AreaGeometry, AreaGeometry][]) => shapely<number[]>("print(json.dumps([shape(a).intersection(shape(b)).area for a, b in data]))", pairs);

/** A deterministic convex quadrilateral around (cx, cy): corners at four angles, radius r. */
function quad(cx: number, cy: number, r: number, seed: number): Position[] {
  const rand = (k: number) => ((Math.sin((seed * 4 + k) * 12.9898) * 43758.5453) % 1 + 1) % 1;
  const angles = [0, 1, 2, 3].map((k) => (k + rand(k) * 0.8) * (Math.PI / 2));
  const ring = angles.map((a) => [cx + r * Math.cos(a), cy + r * Math.sin(a)]);
  return [...ring, ring[0]!];
}

test("convex overlap areas agree with GEOS within 1e-6 m², also at UTM-sized coordinates and either winding", () => {
  const pairs: [Polygon, Polygon][] = [];
  for (let k = 0; k < 40; k++) {
    const x = k % 2 === 0 ? 0 : 540_000, y = k % 2 === 0 ? 0 : 4_400_000;
    const a = quad(x, y, 20, k), b = quad(x + 10 * Math.cos(k), y + 10 * Math.sin(k), 15, k + 100);
    pairs.push([poly(a), poly(k % 3 === 0 ? [...b].reverse() : b)]);
  }
  expect(pairs.every(([a, b]) => isConvexRing(a.coordinates[0]!) && isConvexRing(b.coordinates[0]!))).toBe(true);
  const ref = geosOverlaps(pairs);
  expect(ref.filter((x) => x > 0).length).toBeGreaterThan(30);
  pairs.forEach(([a, b], i) => expect(Math.abs(convexOverlapArea(a.coordinates[0]!, b.coordinates[0]!) - ref[i]!)).toBeLessThan(1e-6));
});

test("non-convex parcels, holes and multipolygons go through polyclip-ts and agree with GEOS", () => {
  const ell = poly([[0, 0], [30, 0], [30, 10], [10, 10], [10, 30], [0, 30], [0, 0]]);
  const withHole = poly(rect(0, 0, 40, 40), rect(10, 10, 20, 20));
  const parts: MultiPolygon = { type: "MultiPolygon", coordinates: [[rect(5, 5, 10, 10)], [rect(25, 25, 10, 10)]] };
  const pairs: [AreaGeometry, AreaGeometry][] = [[ell, poly(rect(5, 5, 20, 20))], [withHole, poly(rect(15, 15, 5, 5))], [withHole, poly(rect(5, 5, 10, 10))], [parts, withHole], [parts, ell]];
  const ref = geosOverlaps(pairs);
  // Closed forms: L-shape ∩ square = 5·20 + 15·5 = 175; a square inside the hole overlaps nothing.
  expect(ref.slice(0, 2)).toEqual([175, 0]);
  pairs.forEach(([a, b], i) => expect(overlapArea(a, b)).toBeCloseTo(ref[i]!, 6));
});

test("a fabric's overlapping pairs above 0.5 m² are exactly those GEOS finds; neighbours that only touch are not", () => {
  const fabric: AreaGeometry[] = [
    poly(rect(0, 0, 20, 30)), // 0
    poly(rect(20, 0, 20, 30)), // 1: shares a side with 0
    poly(rect(39.99, 0, 20, 30)), // 2: overlaps 1 by 0.01 × 30 = 0.3 m², under the threshold
    poly(rect(59.9, 0, 20, 30)), // 3: overlaps 2 by 0.09 × 30 = 2.7 m²
    poly(rect(0, 0, 20, 30)), // 4: a duplicate of 0
    poly(rect(100, 0, 40, 40), rect(110, 10, 20, 20)), // 5: a parcel with a courtyard
    poly(rect(112, 12, 10, 10)), // 6: inside 5's courtyard
    poly([[5, 30], [15, 30], [10, 35], [5, 30]]), // 7: sits on 0's north side
  ];
  const index = indexForOverlaps(fabric);
  const ours = fabric.flatMap((_, i) => overlapsOf(index, i, 0.5)).map((p) => [p.a, p.b, p.area]);
  const all = fabric.flatMap((a, i) => fabric.slice(i + 1).map((b, k) => [i, i + 1 + k, a, b] as const));
  const ref = geosOverlaps(all.map(([, , a, b]) => [a, b]));
  const expected = all.map(([i, j], k) => [i, j, ref[k]!]).filter(([, , area]) => area! > 0.5);
  expect(expected.map(([i, j]) => [i, j])).toEqual([[0, 4], [2, 3]]);
  expect(ours.map(([i, j]) => [i, j])).toEqual(expected.map(([i, j]) => [i, j]));
  ours.forEach(([, , area], k) => expect(area).toBeCloseTo(expected[k]![2]!, 6));
});

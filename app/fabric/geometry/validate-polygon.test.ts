import { expect, test } from "vitest";
import type { MultiPolygon, Polygon, Position } from "geojson";
import { findGeometryProblem } from "./validate-polygon";
import { normalizeOrientation, signedDoubleArea } from "./ring-orientation";
import { geosValid } from "../test-support/reference-tools.server";

const poly = (...rings: Position[][]): Polygon => ({ type: "Polygon", coordinates: rings });
const sq = (x: number, y: number, s: number): Position[] => [[x, y], [x + s, y], [x + s, y + s], [x, y + s], [x, y]];

/** Shapes GEOS can judge (closed rings of ≥ 4 points), each valid or not. */
const cases: { name: string; g: Polygon | MultiPolygon }[] = [
  { name: "square", g: poly(sq(0, 0, 10)) },
  { name: "square with hole", g: poly(sq(0, 0, 10), sq(2, 2, 3)) },
  { name: "hole touching shell at a point", g: poly(sq(0, 0, 10), [[0, 0], [3, 2], [2, 3], [0, 0]]) },
  { name: "bow tie", g: poly([[0, 0], [10, 10], [10, 0], [0, 10], [0, 0]]) },
  { name: "hole outside", g: poly(sq(0, 0, 10), sq(20, 20, 2)) },
  { name: "hole crossing shell", g: poly(sq(0, 0, 10), sq(8, 8, 4)) },
  { name: "spike", g: poly([[0, 0], [10, 0], [10, 10], [10, 15], [10, 10], [0, 10], [0, 0]]) },
  { name: "ring touching itself", g: poly([[0, 0], [10, 0], [5, 5], [10, 10], [0, 10], [5, 5], [0, 0]]) },
  { name: "collinear middle vertex", g: poly([[0, 0], [5, 0], [10, 0], [10, 10], [0, 10], [0, 0]]) },
  { name: "repeated vertex", g: poly([[0, 0], [10, 0], [10, 0], [10, 10], [0, 10], [0, 0]]) },
  { name: "disjoint parts", g: { type: "MultiPolygon", coordinates: [[sq(0, 0, 5)], [sq(10, 10, 5)]] } },
  { name: "overlapping parts", g: { type: "MultiPolygon", coordinates: [[sq(0, 0, 5)], [sq(3, 3, 5)]] } },
  { name: "nested parts", g: { type: "MultiPolygon", coordinates: [[sq(0, 0, 10)], [sq(2, 2, 2)]] } },
  { name: "part in a hole", g: { type: "MultiPolygon", coordinates: [[sq(0, 0, 10), sq(2, 2, 6)], [sq(3, 3, 2)]] } },
];

test("validity agrees with GEOS is_valid on every test shape", () => {
  const ref = geosValid(cases.map((c) => c.g)); // Reference: GEOS via shapely is_valid
  const ours = cases.map((c) => findGeometryProblem(c.g) === null);
  expect(Object.fromEntries(cases.map((c, i) => [c.name, ours[i]]))).toEqual(
    Object.fromEntries(cases.map((c, i) => [c.name, ref[i]])),
  );
});

test("structural problems get plain reasons", () => {
  expect(findGeometryProblem(poly([[0, 0], [1, 0], [1, 1], [0, 1]]))).toMatch(/not closed/);
  expect(findGeometryProblem(poly([[0, 0], [1, 0], [0, 0]]))).toMatch(/too few points/);
  expect(findGeometryProblem(poly([[0, 0], [1, 1], [2, 2], [0, 0]]))).toMatch(/zero area/);
  expect(findGeometryProblem(poly())).toMatch(/empty/);
  expect(findGeometryProblem(poly([[0, 0], [1, Number.NaN], [1, 1], [0, 0]]))).toMatch(/non-numeric/);
  expect(findGeometryProblem(poly([[0, 0], [10, 10], [10, 0], [0, 10], [0, 0]]))).toMatch(/self-intersects/);
});

test("normalizeOrientation makes exteriors counter-clockwise and holes clockwise", () => {
  const cwShell = [...sq(0, 0, 10)].reverse();
  const ccwHole = sq(2, 2, 3);
  const out = normalizeOrientation(poly(cwShell, ccwHole));
  expect(signedDoubleArea(out.coordinates[0]!)).toBeGreaterThan(0);
  expect(signedDoubleArea(out.coordinates[1]!)).toBeLessThan(0);
  expect(new Set(out.coordinates[0]!.map(String))).toEqual(new Set(cwShell.map(String)));
});

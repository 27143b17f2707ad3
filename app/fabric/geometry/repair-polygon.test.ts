import { expect, test } from "vitest";
import type { MultiPolygon, Polygon, Position } from "geojson";
import { repairGeometry } from "./repair-polygon";
import { findGeometryProblem } from "./validate-polygon";
import { polygonArea } from "./area";
import { shapely } from "../test-support/reference-tools.server";

const poly = (...rings: Position[][]): Polygon => ({ type: "Polygon", coordinates: rings });

/**
 * GEOS via shapely: is the repaired shape valid, and is it the same point set as the polygonal
 * part of make_valid(original)? (shapely's Polygon closes an unclosed ring itself; make_valid
 * splits spikes off as lines.)
 */
function geosVerdict(original: Polygon | MultiPolygon, repaired: Polygon | MultiPolygon): { valid: boolean; same: boolean; area: number } {
  const script = [
    "from shapely.geometry import Polygon, MultiPolygon",
    "from shapely.validation import make_valid",
    "from shapely.ops import unary_union",
    "def build(g):",
    "    if g['type'] == 'Polygon':",
    "        return Polygon(g['coordinates'][0], g['coordinates'][1:])",
    "    return MultiPolygon([Polygon(p[0], p[1:]) for p in g['coordinates']])",
    "o = make_valid(build(data['o']))",
    "parts = [o] if o.geom_type in ('Polygon', 'MultiPolygon') else [g for g in o.geoms if g.geom_type in ('Polygon', 'MultiPolygon')]",
    "r = shape(data['r'])",
    "print(json.dumps({'valid': r.is_valid, 'same': r.equals(unary_union(parts)), 'area': r.area}))",
  ].join("\n");
  return shapely(script, { o: original, r: repaired });
}

test("an unclosed ring is closed; GEOS finds the same valid polygon and area (10 × 20 = 200)", () => {
  const original = poly([[0, 0], [10, 0], [10, 20], [0, 20]]);
  const { geometry, repairs } = repairGeometry(original);
  expect(repairs).toEqual(["closed 1 unclosed ring (first point repeated at the end)"]);
  expect(geometry.coordinates[0]).toEqual([[0, 0], [10, 0], [10, 20], [0, 20], [0, 0]]);
  expect(findGeometryProblem(geometry)).toBeNull();
  expect(polygonArea(geometry)).toBe(200);
  expect(geosVerdict(original, geometry)).toEqual({ valid: true, same: true, area: 200 });
});

test("repeated vertices are removed, also across the ring's seam, leaving the same point set", () => {
  const original = poly([[0, 0], [10, 0], [10, 0], [10, 10], [0, 10], [0, 10], [0, 0], [0, 0]]);
  const { geometry, repairs } = repairGeometry(original);
  expect(repairs).toEqual(["removed 3 repeated vertices"]);
  expect(geometry.coordinates[0]).toEqual([[0, 0], [10, 0], [10, 10], [0, 10], [0, 0]]);
  expect(geosVerdict(original, geometry)).toMatchObject({ valid: true, same: true });
});

test("zero-area spikes are removed, out-and-back and overshooting, and what is left is GEOS make_valid's polygon", () => {
  const cases = [
    // Out to (10, 15) and straight back along the east edge.
    poly([[0, 0], [10, 0], [10, 10], [10, 15], [10, 10], [0, 10], [0, 0]]),
    // Along the north edge past the corner and back: (0, 10) → (-5, 10) → (2, 10) is collinear backtracking.
    poly([[0, 0], [10, 0], [10, 10], [0, 10], [-5, 10], [2, 10], [0, 10], [0, 0]]),
    // A spike at the seam (the ring starts on the spike's tip).
    poly([[5, -4], [5, 0], [10, 0], [10, 10], [0, 10], [0, 0], [5, 0], [5, -4]]),
  ];
  for (const original of cases) {
    expect(findGeometryProblem(original)).not.toBeNull();
    const { geometry, repairs } = repairGeometry(original);
    expect(repairs.some((r) => /zero-area spike/.test(r))).toBe(true);
    expect(findGeometryProblem(geometry)).toBeNull();
    expect(geosVerdict(original, geometry)).toEqual({ valid: true, same: true, area: 100 });
  }
});

test("self-intersections are not repaired: a bow tie stays, and is refused with its reason", () => {
  const bowTie = poly([[0, 0], [10, 10], [10, 0], [0, 10], [0, 0]]);
  const { geometry, repairs } = repairGeometry(bowTie);
  expect(repairs).toEqual([]);
  expect(geometry).toBe(bowTie);
  expect(findGeometryProblem(geometry)).toMatch(/self-intersects/);
});

test("with checkWinding, rings against RFC 7946 winding are counted; without it, not", () => {
  const cw = poly([[0, 0], [0, 10], [10, 10], [10, 0], [0, 0]], [[2, 2], [4, 2], [4, 4], [2, 4], [2, 2]]);
  expect(repairGeometry(cw, { checkWinding: true }).repairs).toEqual(["turned 2 rings to RFC 7946 winding (exterior counter-clockwise, holes clockwise)"]);
  expect(repairGeometry(cw).repairs).toEqual([]);
  const parts: MultiPolygon = { type: "MultiPolygon", coordinates: [[[[0, 0], [5, 0], [5, 5], [0, 5]]], [[[9, 9], [9, 9], [12, 9], [12, 12], [9, 12], [9, 9]]]] };
  expect(repairGeometry(parts).repairs).toEqual(["closed 1 unclosed ring (first point repeated at the end)", "removed 1 repeated vertex"]);
});

import { expect, test } from "vitest";
import { shapely } from "../fabric/test-support/reference-tools.server";
import { makeTestFabric } from "../../tests/reference/take-fabric";
import { computeAlignmentGeometry } from "./compute-alignment-geometry";
import { computeTakePolygons } from "./take-polygons";
import { computeTakes } from "./take-compute";
import type { TakeRules } from "./take-types";

const RULES: TakeRules = { remnantMinArea: 50, remnantMinFraction: 0.05, landValuePerArea: 40, buildingValue: 1e5, severancePercent: 10, easementRatePerArea: 4, adminCostPerParcel: 2000, contingencyPercent: 20, proximityDistance: 3 };

test("take polygons for display lie inside their parcels and hold the exact take to within the 1 cm chords", () => {
  const elements = computeAlignmentGeometry({ units: "m", startStation: 0, points: [{ x: 10, y: 180 }, { x: 360, y: 200, curve: { type: "simple", radius: 220 } }, { x: 600, y: 480, curve: { type: "simple", radius: 300 } }, { x: 1090, y: 470 }] }).elements;
  const corridor = { left: 25, right: 35 };
  const parcels = makeTestFabric(-20, 0, 57, 26);
  const exact = new Map(computeTakes({ elements, corridor, parcels, rules: RULES }).parcels.map((p) => [p.parcelId, p.takeArea]));
  const polygons = computeTakePolygons({ elements, corridor, parcels });
  expect(polygons.map((p) => p.parcelId).sort()).toEqual([...exact.keys()].sort());
  // GEOS (python3-shapely): each take polygon is valid, and intersecting it with its parcel keeps all of it.
  const byId = new Map(parcels.map((p) => [p.parcelId, p]));
  const checks = shapely<{ valid: boolean; area: number; inside: number }[]>(
    "from shapely.geometry import MultiPolygon, Polygon\n" +
      "def geom(ps):\n    return MultiPolygon([Polygon(p[0], p[1:]) for p in ps])\n" +
      "print(json.dumps([{'valid': geom(t).is_valid, 'area': geom(t).area, 'inside': geom(t).intersection(geom(p).buffer(0)).area} for t, p in data]))",
    polygons.map((t) => [t.coordinates, byId.get(t.parcelId)!.polygons]),
  );
  checks.forEach((c, i) => {
    const t = polygons[i]!;
    expect(c.valid, t.parcelId).toBe(true);
    expect(Math.abs(c.inside - c.area), t.parcelId).toBeLessThan(1e-6);
    // A chord of sagitta 1 cm over the ≤ 100 m of right-of-way line inside a lot leaves under 1 m².
    expect(Math.abs(c.area - exact.get(t.parcelId)!), t.parcelId).toBeLessThan(0.01 * 100);
  });
});

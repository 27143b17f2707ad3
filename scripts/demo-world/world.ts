/**
 * The whole invented demo world in one value: the town grid, the rural plan,
 * every parcel and building footprint as GeoJSON features in EPSG:32617
 * metres (centimetre vertices). Pure and seeded: the same on every run.
 */
import type { Feature, MultiPolygon, Polygon } from "geojson";
import { createRng } from "./prng";
import { buildTownGrid, type TownGrid } from "./town-grid";
import { planTown } from "./town-blocks";
import { planRural, type RuralPlan } from "./rural-tracts";
import { orient, pointInRing, type PlanParcel } from "./plan-types";
import { attributesFor, apnOf, type ParcelAttributes } from "./parcel-attributes";
import { lotFootprints, siteFootprints, type Footprint } from "./footprints";
import { warpRing, type Uv, type Xy } from "./warp";

export interface BuildingAttributes {
  APN: string;
  BLDG_VAL: number;
}

export interface World {
  grid: TownGrid;
  rural: RuralPlan;
  parcels: Feature<Polygon | MultiPolygon, ParcelAttributes>[];
  buildings: Feature<Polygon, BuildingAttributes>[];
}

const ringArea = (r: Xy[]): number => {
  let s = 0;
  for (let i = 0; i + 1 < r.length; i++) s += r[i]![0] * r[i + 1]![1] - r[i + 1]![0] * r[i]![1];
  return Math.abs(s) / 2;
};
const polygonArea = (rings: Xy[][]): number => rings.reduce((sum, r, i) => sum + (i === 0 ? 1 : -1) * ringArea(r), 0);

function geometryOf(p: PlanParcel): Polygon | MultiPolygon {
  const polys = p.polygons.map((rings) => rings.map((r, i) => warpRing(orient(r, i > 0))));
  return polys.length === 1 ? { type: "Polygon", coordinates: polys[0]! } : { type: "MultiPolygon", coordinates: polys };
}

/** Dollars per m² of floor, by building kind (invented, plausible order of magnitude). */
const FLOOR_RATE: Record<Footprint["kind"], number> = { house: 1150, shop: 1350, works: 620, garage: 380, barn: 240, school: 1900 };

function footprintsOf(rng: ReturnType<typeof createRng>, p: PlanParcel): Footprint[] {
  if (p.plot && p.use !== "AGR" && p.use !== "VAC" && !(p.use === "PUB" && p.owner === "town")) {
    const kind = p.use === "COM" ? "shop" : p.use === "IND" ? "works" : p.use === "PUB" ? "school" : "house";
    return lotFootprints(rng, p.plot, kind);
  }
  if (p.site && (p.use === "RES" || (p.use === "AGR" && rng.chance(0.55)))) {
    const outer = p.polygons[0]!;
    return siteFootprints(rng, p.site, p.use === "AGR").filter((f) => f.ring.every((pt: Uv) => pointInRing(pt, outer[0]!) && outer.slice(1).every((hole) => !pointInRing(pt, hole))));
  }
  return [];
}

export function buildWorld(): World {
  const grid = buildTownGrid();
  const rural = planRural(grid);
  const plans = [...planTown(grid), ...rural.parcels];
  const geometries = plans.map(geometryOf);
  const areas = geometries.map((g) => (g.type === "Polygon" ? polygonArea(g.coordinates as Xy[][]) : g.coordinates.reduce((s, poly) => s + polygonArea(poly as Xy[][]), 0)));
  const attrs = attributesFor(createRng(5150), plans, areas);
  const parcels = plans.map((_, i) => ({ type: "Feature" as const, properties: attrs[i]!, geometry: geometries[i]! }));
  const rng = createRng(2718);
  const buildings: World["buildings"] = [];
  for (const p of plans) {
    for (const f of footprintsOf(rng, p)) {
      const value = Math.round((f.area * FLOOR_RATE[f.kind] * rng.range(0.75, 1.25)) / 100) * 100;
      buildings.push({ type: "Feature", properties: { APN: apnOf(p), BLDG_VAL: value }, geometry: { type: "Polygon", coordinates: [warpRing(orient(f.ring))] } });
    }
  }
  return { grid, rural, parcels, buildings };
}

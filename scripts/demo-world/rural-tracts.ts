/**
 * The rural edge of Quillmere: large irregular tracts cut from the lattice,
 * running to the centre line of the roads and of Marrow Brook (as rural deeds
 * commonly do), a county forest on the hill, and a few small enclave parcels
 * (an old homestead) that leave a hole in the tract around them.
 */
import { createRng } from "./prng";
import { buildLattice, type Lattice, type RayKind } from "./rural-lattice";
import { orient, pointInRing, type LandUse, type OwnerKind, type PlanParcel } from "./plan-types";
import type { TownGrid } from "./town-grid";
import { creekV } from "./creek";
import type { Uv } from "./warp";

export interface RuralPlan {
  lattice: Lattice;
  parcels: PlanParcel[];
  /** Rings of wooded tracts, for the basemap's land cover. */
  woods: Uv[][];
  fields: Uv[][];
  /** Roads along fixed rays, town edge outwards. */
  roads: { name: string; cls: "main" | "track"; path: Uv[] }[];
  /** The creek outside town: west reach (outer end first) and east reach (town end first). */
  creekWest: Uv[];
  creekEast: Uv[];
  /** Centres of named tracts, for labels: the forest hill and the pond's tract. */
  hill: Uv;
  pondTract: Uv;
}

/** Fixed rays: where the main streets, two tracks and the creek leave the town. */
function fixedRays(grid: TownGrid): { t: number; ray: RayKind }[] {
  const [u0, v0, u1, v1] = grid.rect;
  const [w, h] = [u1 - u0, v1 - v0];
  const vMid = (grid.rows[grid.creekRow]!.at + grid.rows[grid.creekRow + 1]!.at) / 2;
  const mainCol = grid.columns.find((c) => c.cls === "main")!;
  const mainRow = grid.rows.find((r) => r.cls === "main")!;
  const road = (name: string, cls: "main" | "track"): RayKind => ({ kind: "road", name, cls });
  return [
    { t: mainCol.at - u0, ray: road("Harrowmoor Road", "main") },
    { t: grid.columns[3]!.at - u0, ray: road("Sedgecombe Track", "track") },
    { t: w + (creekV(u1, vMid) - v0), ray: { kind: "creek" } },
    { t: w + (mainRow.at - v0), ray: road("Ostrand Pike", "main") },
    { t: w + h + (u1 - mainCol.at), ray: road("Vennick Hollow Road", "main") },
    { t: w + h + (u1 - grid.columns[12]!.at), ray: road("Copperleigh Track", "track") },
    { t: 2 * w + h + (v1 - mainRow.at), ray: road("Ostrand Pike", "main") },
    { t: 2 * w + h + (v1 - creekV(u0, vMid)), ray: { kind: "creek" } },
  ];
}

export function planRural(grid: TownGrid): RuralPlan {
  const rng = createRng(90417);
  const lat = buildLattice(grid.rect, fixedRays(grid));
  const K = lat.rays.length;
  const parcels: PlanParcel[] = [];
  const woods: Uv[][] = [];
  const fields: Uv[][] = [];
  const roadKs = lat.rays.flatMap((r, k) => (r.ray.kind === "road" ? [{ k, name: r.ray.name }] : []));
  const hillK = Math.round(K * 0.62);
  const enclaves = new Set([Math.round(K * 0.2), Math.round(K * 0.47), Math.round(K * 0.85)].map((k) => `${k},1`));
  const creekKs = lat.rays.flatMap((r, k) => (r.ray.kind === "creek" ? [k] : []));
  const pondKey = `${creekKs[0]},1`;
  for (let k = 0; k < K; k++) for (let b = 0; b < lat.bands; b++) {
    const ring = [...lat.edge(k, b, k + 1, b).slice(0, -1), ...lat.edge(k + 1, b, k + 1, b + 1).slice(0, -1), ...lat.edge(k + 1, b + 1, k, b + 1).slice(0, -1), ...lat.edge(k, b + 1, k, b).slice(0, -1)];
    const inner = lat.point(k, b), inner2 = lat.point(k + 1, b), outer = lat.point(k, b + 1), outer2 = lat.point(k + 1, b + 1);
    const mid = (p: Uv, q: Uv, f: number): Uv => [p[0] + (q[0] - p[0]) * f, p[1] + (q[1] - p[1]) * f];
    const centre = mid(mid(inner, inner2, 0.5), mid(outer, outer2, 0.5), 0.5);
    const site = { centre: mid(mid(inner, inner2, 0.5), mid(outer, outer2, 0.5), 0.3), angle: Math.atan2(inner2[1] - inner[1], inner2[0] - inner[0]) };
    const road = roadKs.reduce((best, r) => (Math.min(Math.abs(r.k - k), K - Math.abs(r.k - k)) < Math.min(Math.abs(best.k - k), K - Math.abs(best.k - k)) ? r : best));
    const situs = `${(b + 1) * 1000 + 20 * k} ${road.name}`;
    const hill = k === hillK && b === 3;
    const [use, owner]: [LandUse, OwnerKind] = hill ? ["PUB", "county"] : rng.chance(b === 0 ? 0.22 : 0.08) ? ["RES", "person"] : rng.chance(0.15) ? ["VAC", "person"] : ["AGR", "farm"];
    const polygon = [orient(ring)];
    const book = 900 + k;
    if (enclaves.has(`${k},${b}`)) {
      const [cu, cv] = centre;
      const square: Uv[] = [[cu - 30, cv - 25], [cu + 30, cv - 25], [cu + 30, cv + 25], [cu - 30, cv + 25]];
      if (square.every((p) => pointInRing([p[0] * 1.0, p[1]], polygon[0]!))) {
        polygon.push(orient(square, true));
        parcels.push({ book, lot: 100 + b, polygons: [[orient(square)]], use: "RES", owner: "person", situs: `${(b + 1) * 1000 + 20 * k + 2} ${road.name}`, zone: "rural", site: { centre, angle: site.angle } });
      }
    }
    parcels.push({ book, lot: b + 1, polygons: [polygon], use, owner, situs, zone: "rural", site });
    (hill || (use !== "AGR" && rng.chance(0.5)) || rng.chance(0.2) ? woods : fields).push(ring);
  }
  const rayPath = (k: number) => Array.from({ length: lat.bands }, (_, b) => lat.edge(k, b, k, b + 1).slice(b === 0 ? 0 : 1)).flat();
  const roads = roadKs.map((r) => ({ name: r.name, cls: (lat.rays[r.k]!.ray as { cls: "main" | "track" }).cls, path: rayPath(r.k) }));
  const [east, west] = creekKs.map(rayPath) as [Uv[], Uv[]];
  const hillParcel = parcels.find((p) => p.use === "PUB")!;
  const pond = parcels.find((p) => `${p.book - 900},${p.lot - 1}` === pondKey)!;
  return { lattice: lat, parcels, woods, fields, roads, creekWest: [...west].reverse(), creekEast: east, hill: hillParcel.site!.centre, pondTract: pond.site!.centre };
}

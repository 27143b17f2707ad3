/**
 * The invented basemap's content by layer, in WGS 84: named streets (town
 * grid and rural roads), water, land cover (fields, woods, town, park) and
 * place labels (the town, two hamlets, a hill). Everything derives from the
 * same plan as the parcels, so roads run in the parcels' right-of-way gaps.
 */
import type { Feature, FeatureCollection, Geometry } from "geojson";
import type { World } from "./world";
import { densify, warp, warpRing, type Uv } from "./warp";
import { lonLat, lonLatPath } from "./to-wgs84";
import { waterFeatures } from "./basemap-water";

export type BasemapLayers = Record<"landcover" | "water" | "waterway" | "streets" | "places", FeatureCollection>;

export const TOWN_NAME = "Quillmere";
export const HAMLETS = ["Orrin's Cross", "Vennick Hollow"] as const;
export const HILL_NAME = "Tamsel Knob";

const line = (path: Uv[], props: Record<string, string>): Feature => {
  const pts: Uv[] = [];
  for (let i = 0; i + 1 < path.length; i++) pts.push(...densify(path[i]!, path[i + 1]!, 40));
  pts.push(path[path.length - 1]!);
  return { type: "Feature", properties: props, geometry: { type: "LineString", coordinates: lonLatPath(pts.map(warp)) } };
};
const area = (ring: Uv[], props: Record<string, string>): Feature => ({ type: "Feature", properties: props, geometry: { type: "Polygon", coordinates: [lonLatPath(warpRing(ring))] } });
const point = (p: Uv, props: Record<string, string>): Feature => ({ type: "Feature", properties: props, geometry: { type: "Point", coordinates: lonLat(warp(p)) } });
const collection = (features: Feature<Geometry>[]): FeatureCollection => ({ type: "FeatureCollection", features });

function streets(world: World): Feature[] {
  const { columns, rows } = world.grid;
  const [vLo, vHi] = [rows[0]!.at, rows[rows.length - 1]!.at];
  const [uLo, uHi] = [columns[0]!.at, columns[columns.length - 1]!.at];
  const ns = columns.map((c) => line([[c.at, vLo], [c.at, vHi]], { name: c.name, class: c.cls }));
  const ew = rows.map((r) => line([[uLo, r.at], [uHi, r.at]], { name: r.name, class: r.cls }));
  // Rural roads start on the town's edge; join them to the centre line of the street they continue.
  const rural = world.rural.roads.map((r) => {
    const [u, v] = r.path[0]!;
    const inward: Uv = Math.abs(u - world.grid.rect[0]) < 1 ? [uLo, v] : Math.abs(u - world.grid.rect[2]) < 1 ? [uHi, v] : Math.abs(v - world.grid.rect[1]) < 1 ? [u, vLo] : [u, vHi];
    return line([inward, ...r.path], { name: r.name, class: r.cls });
  });
  return [...ns, ...ew, ...rural];
}

function places(world: World): Feature[] {
  const lat = world.rural.lattice;
  const rayOf = (name: string) => lat.rays.findIndex((r) => r.ray.kind === "road" && r.ray.name === name);
  const westPike = lat.rays.findLastIndex((r) => r.ray.kind === "road" && r.ray.name === "Ostrand Pike");
  return [
    point([0, 40], { name: TOWN_NAME, class: "town" }),
    point(lat.point(westPike, 3), { name: HAMLETS[0], class: "hamlet" }),
    point(lat.point(rayOf("Vennick Hollow Road"), 3), { name: HAMLETS[1], class: "hamlet" }),
    point(world.rural.hill, { name: HILL_NAME, class: "hill" }),
  ];
}

export function basemapLayers(world: World): BasemapLayers {
  const [u0, v0, u1, v1] = world.grid.rect;
  const townRing: Uv[] = [[u0, v0], ...densify([u0, v0], [u1, v0], 40).slice(1), [u1, v0], ...densify([u1, v0], [u1, v1], 40).slice(1), [u1, v1], ...densify([u1, v1], [u0, v1], 40).slice(1), [u0, v1], ...densify([u0, v1], [u0, v0], 40).slice(1), [u0, v0]];
  const park = world.parcels.find((p) => p.properties.OWNER_NM === "Town of Quillmere");
  const landcover = [
    ...world.rural.fields.map((r) => area(r, { class: "field" })),
    ...world.rural.woods.map((r) => area(r, { class: "wood" })),
    area(townRing, { class: "town" }),
    ...(park ? [{ type: "Feature" as const, properties: { class: "park", name: "Brookside Green" }, geometry: { type: "MultiPolygon" as const, coordinates: (park.geometry.type === "MultiPolygon" ? park.geometry.coordinates : [park.geometry.coordinates]).map((poly) => poly.map((ring) => lonLatPath(ring as [number, number][]))) } }] : []),
  ];
  const { water, waterway } = waterFeatures(world);
  return { landcover: collection(landcover), water: collection(water), waterway: collection(waterway), streets: collection(streets(world)), places: collection(places(world)) };
}

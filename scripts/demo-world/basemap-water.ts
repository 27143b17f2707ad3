/**
 * Water for the basemap: Marrow Brook as a polygon (its town reach exactly as
 * the parcels leave it; its rural reaches widened from the centre line) and
 * as a named centre line, and Quill Mere, the pond that gave the town its name.
 */
import type { Feature, LineString, Polygon } from "geojson";
import type { World } from "./world";
import { CREEK_HALF_WIDTH, creekV, creekWaterRing, samplesBetween } from "./creek";
import { warp, warpRing, type Uv } from "./warp";
import { lonLatPath } from "./to-wgs84";

export const CREEK_NAME = "Marrow Brook";
export const POND_NAME = "Quill Mere";

/** A thin polygon either side of a design-plane polyline (per-vertex normals; the meander is gentle). */
function ribbon(path: Uv[], half: number): Uv[] {
  const side = (sign: number) =>
    path.map((p, i): Uv => {
      const a = path[Math.max(0, i - 1)]!;
      const b = path[Math.min(path.length - 1, i + 1)]!;
      const len = Math.hypot(b[0] - a[0], b[1] - a[1]);
      return [p[0] - (sign * half * (b[1] - a[1])) / len, p[1] + (sign * half * (b[0] - a[0])) / len];
    });
  return [...side(1), ...side(-1).reverse(), side(1)[0]!];
}

/** The whole creek centre line, west to east, design plane. */
export function creekLine(world: World): Uv[] {
  const { grid, rural } = world;
  const vMid = (grid.rows[grid.creekRow]!.at + grid.rows[grid.creekRow + 1]!.at) / 2;
  const [u0, , u1] = grid.rect;
  const town = [u0, ...samplesBetween(u0, u1), u1].map((u): Uv => [u, creekV(u, vMid)]);
  return [...rural.creekWest.slice(0, -1), ...town, ...rural.creekEast.slice(1)];
}

function pondRing([cu, cv]: Uv): Uv[] {
  return Array.from({ length: 33 }, (_, i): Uv => {
    const a = ((i % 32) / 32) * 2 * Math.PI;
    const r = 1 + 0.12 * Math.sin(3 * a);
    return [cu + 85 + 70 * r * Math.cos(a), cv + 44 * r * Math.sin(a)];
  });
}

const poly = (ring: Uv[], name: string, kind: string): Feature<Polygon> => ({ type: "Feature", properties: { name, kind }, geometry: { type: "Polygon", coordinates: [lonLatPath(warpRing(ring))] } });

export function waterFeatures(world: World): { water: Feature<Polygon>[]; waterway: Feature<LineString>[] } {
  const { grid, rural } = world;
  const vMid = (grid.rows[grid.creekRow]!.at + grid.rows[grid.creekRow + 1]!.at) / 2;
  const water = [
    poly(creekWaterRing(grid.rect[0], grid.rect[2], vMid), CREEK_NAME, "stream"),
    poly(ribbon(rural.creekWest, CREEK_HALF_WIDTH * 0.8), CREEK_NAME, "stream"),
    poly(ribbon(rural.creekEast, CREEK_HALF_WIDTH * 0.8), CREEK_NAME, "stream"),
    poly(pondRing(rural.pondTract), POND_NAME, "pond"),
  ];
  const line = creekLine(world).map(warp);
  const waterway: Feature<LineString>[] = [{ type: "Feature", properties: { name: CREEK_NAME, kind: "stream" }, geometry: { type: "LineString", coordinates: lonLatPath(line) } }];
  return { water, waterway };
}

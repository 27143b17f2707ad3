import { expect, test } from "vitest";
import { cs2cs } from "../test-support/reference-tools.server";
import { indexOverview, overviewTile, worldXY, type OverviewItem } from "./overview";

/** Spherical Web Mercator half-circumference in metres (EPSG:3857 uses R = 6378137 m). */
const HALF = Math.PI * 6378137;

test("world coordinates are EPSG:3857 normalised to 0..1, as PROJ's cs2cs projects them", () => {
  const points: [number, number][] = [[-80.47, 39.8], [14.512, 47.8215], [-118.2437, 34.0522], [0, 0]];
  // cs2cs takes EPSG:4326 in its authority order, latitude first.
  const ref = cs2cs(4326, 3857, points.map(([lon, lat]) => [lat, lon]));
  points.forEach(([lon, lat], i) => {
    const [x, y] = worldXY(lon, lat);
    expect((x - 0.5) * 2 * HALF).toBeCloseTo(ref[i]![0], 3);
    expect((0.5 - y) * 2 * HALF).toBeCloseTo(ref[i]![1], 3);
  });
});

/** An item of `size` tile units at zoom z with its lower-left corner at tile-local (u, v) of tile (tx, ty). */
function item(id: number, z: number, tx: number, ty: number, u: number, v: number, size: number, properties: OverviewItem["properties"]): OverviewItem {
  const scale = 2 ** z * 4096;
  const x0 = (tx * 4096 + u) / scale;
  const y0 = (ty * 4096 + v) / scale;
  return { id, x0, y0, x1: x0 + size / scale, y1: y0 + size / scale, properties };
}

test("small parcels in one cell become one square with their count, summed area and value, and the land use covering most", () => {
  const z = 12;
  const items = [
    item(1, z, 100, 200, 33, 40, 8, { area: 500, landUse: "RES", landValue: 1000 }),
    item(2, z, 100, 200, 45, 50, 8, { area: 300, landUse: "COM", landValue: 2500 }),
    item(3, z, 100, 200, 50, 36, 8, { area: 400, landUse: "COM" }),
  ];
  const tile = overviewTile(indexOverview(items), z, 100, 200);
  expect(tile.wholeIds).toEqual([]);
  expect(tile.cells).toHaveLength(1);
  // Centres at u = 37, 49, 54 and v = 44, 54, 40 all fall in cell (1, 1) of 32 units: x 32..64, y 32..64.
  expect(tile.cells[0]).toEqual({ type: 3, tags: { area: 1200, count: 3, landUse: "COM", landValue: 3500 }, geometry: [[[32, 32], [64, 32], [64, 64], [32, 64], [32, 32]]] });
  // MVT 2.1 §4.3.4.4: an exterior ring has positive area by the shoelace sum in tile coordinates.
  const ring = tile.cells[0]!.geometry[0] as [number, number][];
  const sum = ring.slice(0, -1).reduce((s, p, i) => s + p[0] * ring[i + 1]![1] - ring[i + 1]![0] * p[1], 0);
  expect(sum).toBe(2 * 32 * 32);
});

test("parcels spanning 64 tile units or more are drawn whole, wherever their centre lies", () => {
  const z = 12;
  const items = [item(7, z, 100, 200, 4000, 10, 64, { area: 9000 }), item(8, z, 100, 200, 10, 10, 63, { area: 10 })];
  expect(overviewTile(indexOverview(items), z, 100, 200).wholeIds).toEqual([7]);
  // Parcel 7 reaches into the next tile east, so that tile draws it too (it is clipped there).
  const east = overviewTile(indexOverview(items), z, 101, 200);
  expect(east.wholeIds).toEqual([7]);
  expect(east.cells).toEqual([]);
});

test("every small parcel is counted in exactly one tile, and the four child tiles add up to their parent", () => {
  const z = 11;
  // 400 parcels of 2-6 units scattered over one z11 tile (deterministic).
  const rand = (i: number) => ((Math.sin(i * 12.9898) * 43758.5453) % 1 + 1) % 1;
  const items = Array.from({ length: 400 }, (_, i) => item(i, z, 50, 60, rand(i) * 4090, rand(i + 1000) * 4090, 2 + 4 * rand(i + 2000), { area: 1 + i, landValue: 10 }));
  const index = indexOverview(items);
  const totals = (cells: { tags: Record<string, unknown> | null }[]) => cells.reduce((t, c) => [t[0]! + Number(c.tags!.count), t[1]! + Number(c.tags!.area)], [0, 0]);
  const expected = [400, items.reduce((s, it) => s + it.properties.area!, 0)];
  expect(totals(overviewTile(index, z, 50, 60).cells)).toEqual(expected);
  const children = [[100, 120], [101, 120], [100, 121], [101, 121]].flatMap(([x, y]) => overviewTile(index, z + 1, x!, y!).cells);
  expect(totals(children)).toEqual(expected);
});

test("an empty layer gives an empty tile; a cell size that does not divide the extent is refused", () => {
  expect(overviewTile(indexOverview([]), 5, 1, 1)).toEqual({ cells: [], wholeIds: [] });
  expect(() => overviewTile(indexOverview([item(1, 5, 1, 1, 0, 0, 1, {})]), 5, 1, 1, { cellUnits: 30 })).toThrow(/cellUnits/);
});

import { VectorTile } from "@mapbox/vector-tile";
import { PbfReader as Pbf } from "pbf";
import { beforeAll, expect, test } from "vitest";
import { get, sessionCookie } from "./support/http";
import { bearer, newProject, postLayer, shapefileZip } from "./support/layer-uploads";

// Invented Quillmere parcels (Ostrand County) in WGS84 lon/lat; owners are made-up names.
const LON = 14.512;
const LAT = 47.8215;
const sq = (x: number, y: number, w: number, h: number) => `POLYGON ((${x} ${y}, ${x + w} ${y}, ${x + w} ${y + h}, ${x} ${y + h}, ${x} ${y}))`;
const ROWS = [
  { wkt: sq(LON, LAT, 0.0010, 0.0007), APN: "QM-501", OWNER_NM: "Wenna Coldharrow", LU: "RES", LAND_VAL: 41000 },
  { wkt: sq(LON + 0.0015, LAT, 0.0006, 0.0006), APN: "QM-502", OWNER_NM: "Idris Penmallow", LU: "COM", LAND_VAL: 97000 },
];
const Z = 14;

/** The XYZ tile holding a point (OpenStreetMap wiki, "Slippy map tilenames"). */
function tileOf(lon: number, lat: number, z: number): [number, number] {
  const n = 2 ** z;
  const r = (lat * Math.PI) / 180;
  return [Math.floor(((lon + 180) / 360) * n), Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * n)];
}

let cookie: string;
let layerId: number;
let apiFeatures: { id: number; properties: Record<string, unknown> }[];
beforeAll(async () => {
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere tiles", units: "m" });
  layerId = ((await (await postLayer(projectId, planner, shapefileZip(ROWS, "EPSG:4326"), "tiles.zip")).json()) as { id: number }).id;
  apiFeatures = ((await (await get(`/api/v1/layers/${layerId}/features`, planner)).json()) as { features: typeof apiFeatures }).features;
  cookie = await sessionCookie("planner@demo.test");
});

test("a tile decodes with @mapbox/vector-tile (MVT 2.1) into the layer's parcels, ids and properties", async () => {
  const [x, y] = tileOf(LON, LAT, Z);
  // Both parcels sit in the same z14 tile: check that precondition with the same formula.
  expect(tileOf(LON + 0.0021, LAT + 0.0007, Z)).toEqual([x, y]);
  const res = await get(`/tiles/layers/${layerId}/${Z}/${x}/${y}.pbf`, { cookie });
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toBe("application/vnd.mapbox-vector-tile");
  const tile = new VectorTile(new Pbf(new Uint8Array(await res.arrayBuffer())));
  const layer = tile.layers.parcels!;
  expect(layer.length).toBe(2);
  const decoded = Array.from({ length: layer.length }, (_, i) => layer.feature(i));
  expect(decoded.map((f) => f.id).sort()).toEqual(apiFeatures.map((f) => f.id).sort());
  for (const f of decoded) {
    const api = apiFeatures.find((a) => a.id === f.id)!;
    const { parcelId, owner, landUse, landValue, area } = api.properties;
    expect(f.properties).toEqual({ parcelId, owner, landUse, landValue, area });
    expect(f.type).toBe(3); // 3 = POLYGON (MVT 2.1 §4.3.4)
    // Back in lon/lat, the first corner lands on the invented corner within one tile unit (360° / 2^14 / 4096).
    const ring = (f.toGeoJSON(x, y, Z).geometry as { coordinates: number[][][] }).coordinates[0]!;
    const row = ROWS.find((r) => r.APN === parcelId)!;
    const [cx, cy] = row.wkt.match(/\(\(([\d.]+) ([\d.]+)/)!.slice(1).map(Number);
    expect(ring.some(([lon, lat]) => Math.abs(lon! - cx!) < 360 / 2 ** Z / 4096 && Math.abs(lat! - cy!) < 360 / 2 ** Z / 4096)).toBe(true);
  }
});

test("ETag and If-None-Match give 304; an empty tile is 204", async () => {
  const [x, y] = tileOf(LON, LAT, Z);
  const first = await get(`/tiles/layers/${layerId}/${Z}/${x}/${y}.pbf`, { cookie });
  const etag = first.headers.get("etag")!;
  expect(etag).toMatch(/^"[\w-]+"$/);
  const again = await get(`/tiles/layers/${layerId}/${Z}/${x}/${y}.pbf`, { cookie, "if-none-match": etag });
  expect(again.status).toBe(304);
  expect(again.headers.get("etag")).toBe(etag);
  const empty = await get(`/tiles/layers/${layerId}/${Z}/${x + 3}/${y}.pbf`, { cookie });
  expect(empty.status).toBe(204);
});

test("tiles follow the project's permissions: non-member 404, signed out 401, agent 403", async () => {
  const [x, y] = tileOf(LON, LAT, Z);
  const path = `/tiles/layers/${layerId}/${Z}/${x}/${y}.pbf`;
  expect((await get(path, { cookie: await sessionCookie("manager@demo.test") })).status).toBe(404);
  expect((await get(path)).status).toBe(401);
  expect((await get(path, { cookie: await sessionCookie("agent@demo.test") })).status).toBe(403);
  expect((await get(`/tiles/layers/${layerId}/${Z}/${2 ** Z}/${y}.pbf`, { cookie })).status).toBe(204);
});

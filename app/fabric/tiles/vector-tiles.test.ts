import { expect, test } from "vitest";
import { VectorTile } from "@mapbox/vector-tile";
import { PbfReader as Pbf } from "pbf";
import type { FeatureCollection, Polygon } from "geojson";
import { encodeTileFeatures, isTileInPyramid, sliceTile, tileBoundsWgs84 } from "./vector-tiles";

const encodeTile = (collection: FeatureCollection, z: number, x: number, y: number, name: string) =>
  isTileInPyramid(z, x, y) ? encodeTileFeatures(sliceTile(collection, z, x, y), name) : null;

const lonLatToTile = (lon: number, lat: number, z: number) => {
  const n = 2 ** z;
  const r = (lat * Math.PI) / 180;
  return { x: Math.floor(((lon + 180) / 360) * n), y: Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * n) };
};

const lot = (lon: number, lat: number, d: number): Polygon => ({
  type: "Polygon",
  coordinates: [[[lon, lat], [lon + d, lat], [lon + d, lat + d], [lon, lat + d], [lon, lat]]],
});

// Two invented Quillmere parcels, a few hundred metres apart.
const fc: FeatureCollection = {
  type: "FeatureCollection",
  features: [
    { type: "Feature", geometry: lot(-118.2437, 34.0522, 0.0005), properties: { parcelId: "QM-001", owner: "Maradel Quonsey", landValue: 125000 } },
    { type: "Feature", geometry: lot(-118.2427, 34.0522, 0.0004), properties: { parcelId: "QM-002", owner: "Tobiah Vennerick", landValue: 88000.5 } },
  ],
};

test("encoded tiles decode as MVT 2.1 with the layer name, extent 4096 and feature properties", () => {
  const { x, y } = lonLatToTile(-118.2435, 34.0524, 14);
  const bytes = encodeTile(fc, 14, x, y, "parcels");
  expect(bytes).toBeInstanceOf(Uint8Array);
  // Reference: the @mapbox/vector-tile decoder (Mapbox Vector Tile spec 2.1).
  const tile = new VectorTile(new Pbf(bytes!));
  expect(Object.keys(tile.layers)).toEqual(["parcels"]);
  const layer = tile.layers.parcels!;
  expect(layer.version).toBe(2);
  expect(layer.extent).toBe(4096);
  expect(layer.length).toBe(2);
  const props = [0, 1].map((i) => layer.feature(i).properties);
  expect(props).toEqual(expect.arrayContaining([
    { parcelId: "QM-001", owner: "Maradel Quonsey", landValue: 125000 },
    { parcelId: "QM-002", owner: "Tobiah Vennerick", landValue: 88000.5 },
  ]));
  expect(layer.feature(0).type).toBe(3); // POLYGON
});

test("decoded geometry lands where the parcel is, to the tile's resolution", () => {
  const z = 18;
  const { x, y } = lonLatToTile(-118.2435, 34.0524, z);
  const tile = new VectorTile(new Pbf(encodeTile(fc, z, x, y, "parcels")!));
  const f = tile.layers.parcels!.feature(0).toGeoJSON(x, y, z);
  const ring = (f.geometry as Polygon).coordinates[0]!;
  const corner = ring.reduce((a, b) => (a[0]! + a[1]! < b[0]! + b[1]! ? a : b));
  // One tile unit at z18 is about 0.6 mm of longitude here; allow 2e-7°.
  expect(Math.abs(corner[0]! - -118.2437)).toBeLessThan(2e-7);
  expect(Math.abs(corner[1]! - 34.0522)).toBeLessThan(2e-7);
});

test("empty tiles and tiles outside the pyramid give null", () => {
  const { x, y } = lonLatToTile(2.35, 48.85, 14);
  expect(encodeTile(fc, 14, x, y, "parcels")).toBeNull();
  expect(encodeTile(fc, 3, 8, 0, "parcels")).toBeNull();
  expect(encodeTile(fc, 3, -1, 0, "parcels")).toBeNull();
});

test("tile bounds follow the slippy-map formulas, grown by the buffer", () => {
  // OpenStreetMap wiki "Slippy map tilenames": z1 tile 0/0 spans lon -180..0 and lat 0..85.0511°.
  const [w, s, e, n] = tileBoundsWgs84(1, 0, 0, 0);
  expect([w, s, e]).toEqual([-180, 0, 0]);
  expect(n).toBeCloseTo(85.0511287798, 9);
  // A buffer of 64 units of 4096 widens a z1 tile by 64/4096 of its 180° width on each side.
  const [bw, , be] = tileBoundsWgs84(1, 0, 0, 64);
  expect(bw).toBeCloseTo(-180 - (180 * 64) / 4096, 12);
  expect(be).toBeCloseTo((180 * 64) / 4096, 12);
});

test("a parcel crossing a tile edge is clipped to the tile plus its buffer", () => {
  const z = 14;
  const { x, y } = lonLatToTile(-118.2435, 34.0524, z);
  const [, , east] = tileBoundsWgs84(z, x, y, 0);
  // 0.1° wide, more than the 0.022° of a z14 tile, so it runs off both sides.
  const wide: FeatureCollection = { type: "FeatureCollection", features: [{ type: "Feature", geometry: lot(east - 0.05, 34.0522, 0.1), properties: { parcelId: "QM-003" } }] };
  const ring = (sliceTile(wide, z, x, y)[0]!.geometry as number[][][])[0]!;
  expect(Math.max(...ring.map((p) => p[0]!))).toBe(4096 + 64);
  expect(Math.min(...ring.map((p) => p[0]!))).toBe(-64);
});

/**
 * The committed basemap tiles decode with an independent MVT reader
 * (@mapbox/vector-tile + pbf) and carry named streets and water; the set
 * covers zooms 10–16 and stays small.
 */
import { readFileSync, readdirSync, statSync } from "node:fs";
import { join } from "node:path";
import { PbfReader as Pbf } from "pbf";
import { VectorTile } from "@mapbox/vector-tile";
import { describe, expect, it } from "vitest";
import { TILES_DIR } from "./test-paths";

const BASEMAP = join(TILES_DIR, "basemap");
const style = JSON.parse(readFileSync(join(TILES_DIR, "basemap-style.json"), "utf8")) as { center: [number, number] };

/** XYZ tile holding lon/lat at zoom z (the slippy-map formula, OpenStreetMap wiki "Slippy map tilenames"). */
function tileAt([lon, lat]: [number, number], z: number): [number, number] {
  const r = (lat * Math.PI) / 180;
  return [Math.floor(((lon + 180) / 360) * 2 ** z), Math.floor(((1 - Math.log(Math.tan(r) + 1 / Math.cos(r)) / Math.PI) / 2) * 2 ** z)];
}

const decode = (z: number, x: number, y: number) => new VectorTile(new Pbf(readFileSync(join(BASEMAP, String(z), String(x), `${y}.pbf`))));

function layerProps(tile: VectorTile, name: string): Record<string, unknown>[] {
  const layer = tile.layers[name];
  if (!layer) return [];
  return Array.from({ length: layer.length }, (_, i) => layer.feature(i).properties);
}

describe("basemap tiles", () => {
  it("decode at the town centre (z14) with named streets of known classes and named water", () => {
    const [x, y] = tileAt(style.center, 14);
    const tile = decode(14, x, y);
    expect(Object.keys(tile.layers)).toEqual(expect.arrayContaining(["streets", "water", "landcover"]));
    const streets = layerProps(tile, "streets");
    expect(streets.length).toBeGreaterThan(5);
    for (const s of streets) {
      expect(typeof s.name).toBe("string");
      expect(["main", "minor", "track"]).toContain(s.class);
    }
    expect(streets.map((s) => s.name)).toEqual(expect.arrayContaining(["Ostrand Pike", "Quill Street"]));
    expect(layerProps(tile, "water").map((w) => w.name)).toContain("Marrow Brook");
  });

  it("have the town's label at low zoom and features in tile coordinates of extent 4096", () => {
    const [x, y] = tileAt(style.center, 11);
    const tile = decode(11, x, y);
    expect(layerProps(tile, "places").map((p) => p.name)).toContain("Quillmere");
    expect(tile.layers.streets!.extent).toBe(4096);
  });

  it("cover zooms 10 to 16 only, with a modest total size (< 15 MB)", () => {
    const zooms = readdirSync(BASEMAP).map(Number).sort((a, b) => a - b);
    expect(zooms).toEqual([10, 11, 12, 13, 14, 15, 16]);
    const files = (readdirSync(BASEMAP, { recursive: true }) as string[]).filter((f) => f.endsWith(".pbf"));
    const bytes = files.reduce((sum, f) => sum + statSync(join(BASEMAP, f)).size, 0);
    expect(files.length).toBeGreaterThan(50);
    expect(bytes).toBeLessThan(15 * 1024 * 1024);
  });
});

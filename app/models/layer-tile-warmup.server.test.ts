import { expect, test } from "vitest";
import { tilesCovering } from "./layer-tile-warmup.server";

/** Tile of a point by the OpenStreetMap wiki's "Slippy map tilenames" formulas (spherical Web Mercator). */
function slippyTile(lon: number, lat: number, z: number): [number, number] {
  const n = 2 ** z;
  const phi = (lat * Math.PI) / 180;
  return [Math.floor(((lon + 180) / 360) * n), Math.floor(((1 - Math.log(Math.tan(phi) + 1 / Math.cos(phi)) / Math.PI) / 2) * n)];
}

test("the tiles covering a box are the slippy-map tiles of its corners and everything between", () => {
  const bbox: [number, number, number, number] = [-80.352, 39.90075, -80.24558, 39.94732];
  for (const z of [10, 12, 13, 16]) {
    const [xw, yn] = slippyTile(bbox[0], bbox[3], z);
    const [xe, ys] = slippyTile(bbox[2], bbox[1], z);
    const tiles = tilesCovering(bbox, z);
    expect(tiles).toHaveLength((xe - xw + 1) * (ys - yn + 1));
    expect(tiles).toContainEqual([xw, yn]);
    expect(tiles).toContainEqual([xe, ys]);
  }
});

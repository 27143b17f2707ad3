/**
 * A small invented parcel fabric for take tests: a grid of 20 × 30 lots with streets every eighth
 * row, and among the lots concave (L-shaped) ones, lots with a hole (an inholding left out of the
 * fabric), two-part multipolygons and long strips that a corridor severs in two. Deterministic.
 */
import type { TakeParcelInput } from "../../app/geometry/take-types";

type Ring = number[][];

const rect = (x: number, y: number, w: number, h: number): Ring => [[x, y], [x + w, y], [x + w, y + h], [x, y + h], [x, y]];

/** Lots covering [x0, x0 + 20·nx] × [y0, y0 + 30·ny]; `kind` says which special case each lot is. */
export function makeTestFabric(x0: number, y0: number, nx: number, ny: number): (TakeParcelInput & { kind: string })[] {
  const out: (TakeParcelInput & { kind: string })[] = [];
  const W = 20;
  const H = 30;
  for (let i = 0; i < nx; i++) {
    for (let j = 0; j < ny; j++) {
      const x = x0 + i * W;
      const y = y0 + j * H;
      const id = `L-${i}-${j}`;
      if (j % 8 === 7) continue; // street
      if (i % 9 === 4) {
        if (j % 8 === 0) out.push({ parcelId: `S-${i}-${j}`, kind: "strip", polygons: [[rect(x, y, W, 7 * H)]] });
        continue;
      }
      if (i % 9 === 7 && j % 8 === 3) continue; // second part of the multipolygon below
      if (i % 9 === 7 && j % 8 === 1) {
        out.push({ parcelId: id, kind: "multi", polygons: [[rect(x, y, W, H)], [rect(x, y + 2 * H, W, H)]] });
        continue;
      }
      if ((i + j) % 5 === 0) {
        const ring = [[x, y], [x + W, y], [x + W, y + H - 12], [x + W - 8, y + H - 12], [x + W - 8, y + H], [x, y + H], [x, y]];
        out.push({ parcelId: id, kind: "concave", polygons: [[ring]] });
        continue;
      }
      if ((3 * i + j) % 7 === 0) {
        out.push({ parcelId: id, kind: "holed", polygons: [[rect(x, y, W, H), rect(x + 6, y + 9, 8, 12).reverse()]] });
        continue;
      }
      out.push({ parcelId: id, kind: "lot", polygons: [[rect(x, y, W, H)]] });
    }
  }
  return out;
}

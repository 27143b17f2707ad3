import { desc, eq } from "drizzle-orm";
import { layers, projects } from "~/db/schema";
import { worldXY } from "~/fabric/tiles/overview";
import { db } from "~/utils/db.server";
import { readLayerTile } from "./layer-tiles.server";

/** Zooms a map that fits a project's layers opens at (a town to a county on a laptop screen). */
const WARM_ZOOMS = [10, 11, 12, 13];
/** A zoom whose tiles over the layer are more than this is not the opening view: skipped. */
const MAX_TILES_PER_ZOOM = 16;
/** Layers warmed, newest first (the overview indexes kept in memory hold 8). */
const MAX_LAYERS = 8;

/** The tiles at zoom z that cover a WGS84 box. */
export function tilesCovering(bbox: [number, number, number, number], z: number): [number, number][] {
  const n = 2 ** z;
  const [x0, y0] = worldXY(bbox[0], bbox[3]).map((v) => Math.floor(v * n));
  const [x1, y1] = worldXY(bbox[2], bbox[1]).map((v) => Math.min(n - 1, Math.floor(v * n)));
  const out: [number, number][] = [];
  for (let x = x0!; x <= x1!; x++) for (let y = y0!; y <= y1!; y++) out.push([x, y]);
  return out;
}

/**
 * After start-up, renders into the tile cache the tiles a project map opens on (and builds each
 * layer's overview index on the way), one tile per turn of the event loop so requests are never
 * held up. The first visitor after a restart then gets the same answer time as the next one:
 * a town's first overview tile costs about half a second to build. Returns a stop function.
 */
export function warmLayerTilesInBackground(delayMs = 1000): () => void {
  let stopped = false;
  let timer: NodeJS.Timeout | undefined;
  const queue: (() => void)[] = [];
  const next = () => {
    const job = queue.shift();
    if (stopped || !job) return;
    job();
    timer = setTimeout(next, 0);
    timer.unref();
  };
  timer = setTimeout(() => {
    for (const { layer, crs } of db().select({ layer: layers, crs: projects.crs }).from(layers).innerJoin(projects, eq(layers.projectId, projects.id)).where(eq(layers.status, "active")).orderBy(desc(layers.id)).limit(MAX_LAYERS).all()) {
      for (const z of WARM_ZOOMS) {
        const tiles = tilesCovering(layer.bbox, z);
        if (tiles.length <= MAX_TILES_PER_ZOOM) for (const [x, y] of tiles) queue.push(() => void readLayerTile(layer, { crs }, z, x, y));
      }
    }
    next();
  }, delayMs);
  timer.unref();
  return () => {
    stopped = true;
    clearTimeout(timer);
  };
}

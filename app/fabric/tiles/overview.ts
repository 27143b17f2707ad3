import Flatbush from "flatbush";
import { TILE_BUFFER, TILE_EXTENT, type TileFeature } from "./vector-tiles";

/** Tile properties of a feature (MVT values; nulls already left out). */
export type OverviewProperties = Record<string, string | number> & { area?: number; landUse?: string; landValue?: number };

/**
 * One parcel or footprint as the overview sees it: its row id, its Web Mercator bounds in
 * world units (0..1 across the world, y down, as XYZ tiles count) and its tile properties.
 */
export interface OverviewItem { id: number; x0: number; y0: number; x1: number; y1: number; properties: OverviewProperties }

export interface OverviewOptions {
  /** Side of a coalescing cell in tile units (of TILE_EXTENT, which it must divide); default 32, 4 px on a 512-px tile. */
  cellUnits?: number;
  /** A feature whose bounds span at least this many tile units is drawn whole; default 64. */
  keepUnits?: number;
}

/** Items with a spatial index over their bounds, built once per layer. */
export interface OverviewIndex { items: OverviewItem[]; tree: Flatbush | null }

/** What one overview tile holds: coalesced cells, ready in tile coordinates, and the ids to draw whole. */
export interface OverviewTile { cells: TileFeature[]; wholeIds: number[] }

const DEFAULTS = { cellUnits: 32, keepUnits: 64 };

/** Web Mercator world x, y in 0..1 (y down) of a lon/lat in degrees (spherical EPSG:3857, normalised as XYZ tiles use). */
export function worldXY(lon: number, lat: number): [number, number] {
  const s = Math.sin((lat * Math.PI) / 180);
  const y = 0.5 - (0.25 * Math.log((1 + s) / (1 - s))) / Math.PI;
  return [lon / 360 + 0.5, Math.min(1, Math.max(0, y))];
}

/** Builds the spatial index `overviewTile` searches. */
export function indexOverview(items: OverviewItem[]): OverviewIndex {
  if (items.length === 0) return { items, tree: null };
  const tree = new Flatbush(items.length);
  for (const it of items) tree.add(it.x0, it.y0, it.x1, it.y1);
  tree.finish();
  return { items, tree };
}

/** The search box of tile z/x/y plus its buffer, in world units. */
function tileSearchBox(z: number, x: number, y: number): [number, number, number, number] {
  const n = 2 ** z;
  const pad = TILE_BUFFER / (n * TILE_EXTENT);
  return [x / n - pad, y / n - pad, (x + 1) / n + pad, (y + 1) / n + pad];
}

/** How many items' bounds meet tile z/x/y or its buffer: what drawing the tile exactly would hold. */
export function countInTile(index: OverviewIndex, z: number, x: number, y: number): number {
  return index.tree ? index.tree.search(...tileSearchBox(z, x, y)).length : 0;
}

interface Cell { i: number; j: number; count: number; area: number; value: number; valued: boolean; useArea: Map<string, number> }

function addToCell(cell: Cell, p: OverviewProperties): void {
  const area = p.area ?? 0;
  cell.count++;
  cell.area += area;
  if (p.landValue !== undefined) { cell.value += p.landValue; cell.valued = true; }
  if (p.landUse !== undefined) cell.useArea.set(p.landUse, (cell.useArea.get(p.landUse) ?? 0) + area);
}

/** A cell as a tile polygon; the ring's order gives the positive area MVT 2.1 §4.3.4.4 wants of an exterior. */
function cellFeature(cell: Cell, cellUnits: number): TileFeature {
  const x0 = cell.i * cellUnits, y0 = cell.j * cellUnits, x1 = x0 + cellUnits, y1 = y0 + cellUnits;
  const tags: OverviewProperties = { area: cell.area, count: cell.count };
  let best: [string, number] | undefined;
  for (const entry of cell.useArea) if (!best || entry[1] > best[1]) best = entry;
  if (best) tags.landUse = best[0];
  if (cell.valued) tags.landValue = cell.value;
  return { type: 3, tags, geometry: [[[x0, y0], [x1, y0], [x1, y1], [x0, y1], [x0, y0]]] };
}

/**
 * The generalised content of overview tile z/x/y, so a tile over a dense fabric stays small:
 * features spanning at least `keepUnits` tile units come back as ids to be drawn whole; smaller
 * ones whose bounds' centre lies in the tile are coalesced into square cells of `cellUnits`,
 * each carrying the sum of their `area`, the sum of their `landValue` (absent when none had
 * one), the `landUse` covering most of their area, and `count`. Cells nest in the tile grid.
 */
export function overviewTile(index: OverviewIndex, z: number, x: number, y: number, options: OverviewOptions = {}): OverviewTile {
  const { cellUnits, keepUnits } = { ...DEFAULTS, ...options };
  if (!Number.isInteger(TILE_EXTENT / cellUnits)) throw new RangeError(`cellUnits must divide ${TILE_EXTENT}, got ${cellUnits}`);
  const result: OverviewTile = { cells: [], wholeIds: [] };
  if (!index.tree) return result;
  const scale = 2 ** z * TILE_EXTENT;
  const cells = new Map<number, Cell>();
  for (const k of index.tree.search(...tileSearchBox(z, x, y))) {
    const it = index.items[k]!;
    if (Math.max(it.x1 - it.x0, it.y1 - it.y0) * scale >= keepUnits) { result.wholeIds.push(it.id); continue; }
    // Tile-local position of the centre in tile units; outside 0..extent it belongs to a neighbour.
    const u = ((it.x0 + it.x1) / 2) * scale - x * TILE_EXTENT;
    const v = ((it.y0 + it.y1) / 2) * scale - y * TILE_EXTENT;
    if (u < 0 || v < 0 || u >= TILE_EXTENT || v >= TILE_EXTENT) continue;
    const i = Math.floor(u / cellUnits), j = Math.floor(v / cellUnits);
    const key = j * (TILE_EXTENT / cellUnits) + i;
    let cell = cells.get(key);
    if (!cell) cells.set(key, (cell = { i, j, count: 0, area: 0, value: 0, valued: false, useArea: new Map() }));
    addToCell(cell, it.properties);
  }
  for (const cell of cells.values()) result.cells.push(cellFeature(cell, cellUnits));
  return result;
}

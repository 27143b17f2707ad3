import Flatbush from "flatbush";
import type { Bounds } from "./corridor-types";

/** A packed R-tree over bounding boxes (flatbush, Hilbert-sorted): indices of boxes that meet a query. */
export interface BoundsIndex {
  search(b: Bounds): number[];
}

/** Indexes `bounds` once; an empty list gives an index that finds nothing. */
export function indexBounds(bounds: Bounds[]): BoundsIndex {
  if (bounds.length === 0) return { search: () => [] };
  const index = new Flatbush(bounds.length);
  for (const b of bounds) index.add(b[0], b[1], b[2], b[3]);
  index.finish();
  return { search: (b) => index.search(b[0], b[1], b[2], b[3]) };
}

/**
 * Stable small integers for piece geometries (by their exact `key` text), so that a cache key is a
 * short list of numbers. Forgets everything past `limit` entries; `generation` then changes, and
 * keys made before are never equal to keys made after.
 */
export function createKeyInterner(limit = 200_000): { id(key: string): number; generation(): number } {
  let ids = new Map<string, number>();
  let gen = 0;
  return {
    id(key) {
      let v = ids.get(key);
      if (v === undefined) {
        if (ids.size >= limit) {
          ids = new Map();
          gen++;
        }
        v = ids.size;
        ids.set(key, v);
      }
      return v;
    },
    generation: () => gen,
  };
}

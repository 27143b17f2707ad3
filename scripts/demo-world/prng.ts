/**
 * Seeded pseudo-random numbers (mulberry32), so every run of the demo-world
 * generator draws the same sequence and writes byte-identical files.
 * Math.random is never used in this folder for that reason.
 */
export interface Rng {
  /** Uniform in [0, 1). */
  next(): number;
  /** Uniform in [lo, hi). */
  range(lo: number, hi: number): number;
  /** Integer in [lo, hi]. */
  int(lo: number, hi: number): number;
  /** True with probability p. */
  chance(p: number): boolean;
  pick<T>(items: readonly T[]): T;
}

/** A generator for one purpose; derive separate streams with distinct seeds so edits stay local. */
export function createRng(seed: number): Rng {
  let state = seed >>> 0;
  const next = (): number => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
  return {
    next,
    range: (lo, hi) => lo + (hi - lo) * next(),
    int: (lo, hi) => lo + Math.floor((hi - lo + 1) * next()),
    chance: (p) => next() < p,
    pick: (items) => {
      if (items.length === 0) throw new Error("pick from an empty list");
      return items[Math.floor(items.length * next())]!;
    },
  };
}

/** A stable hash of integers to [0, 1): jitter for a shared vertex, the same whichever neighbour asks. */
export function hashUnit(...keys: number[]): number {
  let h = 0x811c9dc5;
  for (const k of keys) {
    h = Math.imul(h ^ (k | 0), 0x01000193);
    h = Math.imul(h ^ (h >>> 13), 0x5bd1e995);
  }
  h ^= h >>> 15;
  return (h >>> 0) / 4294967296;
}

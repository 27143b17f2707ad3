import type { Position } from "geojson";
import type { AreaGeometry } from "../types";
import { signedDoubleArea } from "./ring-orientation";

/** What was done to one ring, counted. */
interface RingRepairs { closed: number; repeated: number; spikes: number; reversed: number }

const isPoint = (p: unknown): p is Position => Array.isArray(p) && p.length >= 2 && Number.isFinite(p[0]) && Number.isFinite(p[1]);
const same = (p: Position, q: Position) => p[0] === q[0] && p[1] === q[1];

/**
 * True when the ring turns straight back at b: a, b, c on one line (the exact cross-product
 * sign the validity check uses, segments.ts) and c lying back towards a. Such a spike encloses
 * no area, so dropping b leaves the polygon's area and interior as they were.
 */
function isSpike(a: Position, b: Position, c: Position): boolean {
  const cross = (b[0]! - a[0]!) * (c[1]! - a[1]!) - (b[1]! - a[1]!) * (c[0]! - a[0]!);
  const dot = (b[0]! - a[0]!) * (c[0]! - b[0]!) + (b[1]! - a[1]!) * (c[1]! - b[1]!);
  return cross === 0 && dot < 0;
}

/** Drops repeated vertices and spike tips from an open cycle of vertices, counting each. */
function cleanCycle(open: Position[], counts: RingRepairs): Position[] {
  const out: Position[] = [];
  for (const p of open) {
    if (out.length > 0 && same(out[out.length - 1]!, p)) { counts.repeated++; continue; }
    out.push(p);
    // A spike tip is found once the point after it arrives; removing it may expose another.
    while (out.length >= 3 && isSpike(out[out.length - 3]!, out[out.length - 2]!, out[out.length - 1]!)) {
      out.splice(out.length - 2, 1);
      counts.spikes++;
      // A there-and-back spike returns to its base: that point is part of the spike, not a repeat.
      if (same(out[out.length - 2]!, out[out.length - 1]!)) out.pop();
    }
  }
  // The cycle wraps: a last point equal to the first, and spikes at the seam.
  let changed = true;
  while (changed && out.length >= 3) {
    changed = false;
    if (same(out[0]!, out[out.length - 1]!)) { out.pop(); counts.repeated++; changed = true; continue; }
    const m = out.length;
    if (isSpike(out[m - 2]!, out[m - 1]!, out[0]!)) { out.pop(); counts.spikes++; changed = true; }
    else if (isSpike(out[m - 1]!, out[0]!, out[1]!)) { out.shift(); counts.spikes++; changed = true; }
  }
  return out;
}

/** One ring repaired where that is safe; rings with bad coordinates or under 3 corners are left for the validity check to refuse. */
function repairRing(ring: Position[], counts: RingRepairs, exterior: boolean, checkWinding: boolean): Position[] {
  if (!Array.isArray(ring) || ring.length < 3 || !ring.every(isPoint)) return ring;
  const closed = same(ring[0]!, ring[ring.length - 1]!);
  const local: RingRepairs = { closed: closed ? 0 : 1, repeated: 0, spikes: 0, reversed: 0 };
  const open = cleanCycle(closed ? ring.slice(0, -1) : ring, local);
  if (open.length < 3) return ring;
  const out = [...open, open[0]!];
  const area = signedDoubleArea(out);
  if (checkWinding && area !== 0 && area > 0 !== exterior) local.reversed++;
  for (const k of Object.keys(counts) as (keyof RingRepairs)[]) counts[k] += local[k];
  return out;
}

function describe(c: RingRepairs): string[] {
  const n = (k: number, one: string, many = `${one}s`) => `${k} ${k === 1 ? one : many}`;
  const notes: string[] = [];
  if (c.closed) notes.push(`closed ${n(c.closed, "unclosed ring")} (first point repeated at the end)`);
  if (c.repeated) notes.push(`removed ${n(c.repeated, "repeated vertex", "repeated vertices")}`);
  if (c.spikes) notes.push(`removed ${n(c.spikes, "zero-area spike")}`);
  if (c.reversed) notes.push(`turned ${n(c.reversed, "ring")} to RFC 7946 winding (exterior counter-clockwise, holes clockwise)`);
  return notes;
}

/**
 * Repairs what can be repaired without changing a parcel's area or interior: closes unclosed
 * rings, removes repeated consecutive vertices and zero-area spikes (as GEOS make_valid does,
 * which splits a spike off as a line). With `checkWinding` (GeoJSON, whose RFC 7946 §3.1.6 says
 * exteriors are counter-clockwise) rings wound the other way are counted; the readers rewind
 * every ring anyway. Self-intersections are not touched: they stay for the validity check to
 * refuse. Returns the notes, empty when nothing was done.
 */
export function repairGeometry<G extends AreaGeometry>(geometry: G, options: { checkWinding?: boolean } = {}): { geometry: G; repairs: string[] } {
  const counts: RingRepairs = { closed: 0, repeated: 0, spikes: 0, reversed: 0 };
  const polygon = (rings: Position[][]) => (Array.isArray(rings) ? rings.map((r, i) => repairRing(r, counts, i === 0, options.checkWinding ?? false)) : rings);
  const coordinates = geometry.type === "Polygon" ? polygon(geometry.coordinates) : Array.isArray(geometry.coordinates) ? geometry.coordinates.map(polygon) : geometry.coordinates;
  if (counts.closed + counts.repeated + counts.spikes + counts.reversed === 0) return { geometry, repairs: [] };
  return { geometry: { ...geometry, coordinates } as G, repairs: describe(counts) };
}

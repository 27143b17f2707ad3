/**
 * The street grid of Quillmere on the design plane: uneven column and row
 * spacing, two main streets crossing near the centre, one wide row that the
 * creek runs through. Right-of-way widths leave the street land outside every
 * block, so it stays outside every parcel.
 */
import { createRng } from "./prng";
import { streetStems } from "./names";

export type StreetClass = "main" | "minor" | "track";

export interface GridLine {
  /** u of a north–south street, or v of an east–west street. */
  at: number;
  name: string;
  cls: StreetClass;
  /** Right-of-way width, metres. */
  row: number;
}

export interface TownGrid {
  /** North–south streets, west to east. */
  columns: GridLine[];
  /** East–west streets, south to north. */
  rows: GridLine[];
  /** Index j of the row of blocks (between rows[j] and rows[j+1]) the creek runs through. */
  creekRow: number;
  /** Outer edge of the perimeter streets' right-of-way: [uMin, vMin, uMax, vMax]. */
  rect: [number, number, number, number];
}

const HALF_U = 1550;
const HALF_V = 720;
const CREEK_ROW = 3;
const ROW_MAIN = 24;
const ROW_MINOR = 16;

function lines(start: number, end: number, spacing: (i: number) => number): number[] {
  const out = [start];
  while (out[out.length - 1]! < end) out.push(out[out.length - 1]! + spacing(out.length - 1));
  return out;
}

const nearestToZero = (xs: number[]): number => xs.reduce((best, x, i) => (Math.abs(x) < Math.abs(xs[best]!) ? i : best), 0);

/** Builds the grid (seeded: the same every run). */
export function buildTownGrid(): TownGrid {
  const rng = createRng(20260412);
  const us = lines(-HALF_U, HALF_U, () => Math.round(rng.range(178, 252)));
  const vs = lines(-HALF_V, HALF_V, (j) => (j === CREEK_ROW ? 190 : Math.round(rng.range(96, 134))));
  const mainCol = nearestToZero(us);
  const mainRow = nearestToZero(vs.map((v) => v - 40));
  const stems = streetStems(rng, us.length + vs.length);
  const columns = us.map((at, i): GridLine => {
    const main = i === mainCol;
    return { at, cls: main ? "main" : "minor", row: main ? ROW_MAIN : ROW_MINOR, name: main ? "Quill Street" : `${stems[i]} ${rng.pick(["Street", "Lane", "Way"])}` };
  });
  const rows = vs.map((at, j): GridLine => {
    const main = j === mainRow;
    return { at, cls: main ? "main" : "minor", row: main ? ROW_MAIN : ROW_MINOR, name: main ? "Ostrand Pike" : `${stems[us.length + j]} ${rng.pick(["Avenue", "Road", "Row"])}` };
  });
  const first = (ls: GridLine[]) => ls[0]!.at - ls[0]!.row / 2;
  const last = (ls: GridLine[]) => ls[ls.length - 1]!.at + ls[ls.length - 1]!.row / 2;
  return { columns, rows, creekRow: CREEK_ROW, rect: [first(columns), first(rows), last(columns), last(rows)] };
}

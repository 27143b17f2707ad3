import { formatStation, parseStation, type StationStyle } from "~/geometry/stations";
import type { CorridorWidthRange } from "~/geometry/take-types";

/** What the planner types for one width range: stations as station text, widths blank for the base. */
export interface RangeText {
  from: string;
  to: string;
  left: string;
  right: string;
  transition: string;
}

/** Internal stations of the alignment's first and last points (start station + distance). */
export interface StationExtent {
  start: number;
  end: number;
}

/** The schema's limits (app/schemas/take-schemas.ts): widths and transitions 0…10 000, at most 200 ranges. */
export const MAX_WIDTH = 10_000;
export const MAX_RANGES = 200;

export const EMPTY_RANGE_TEXT: RangeText = { from: "", to: "", left: "", right: "", transition: "" };

/** A range as the table shows it: stations in the project's notation, an absent width as blank. */
export function rangeToText(r: CorridorWidthRange, style: StationStyle): RangeText {
  return {
    from: formatStation(r.fromStation, style),
    to: formatStation(r.toStation, style),
    left: r.left === undefined ? "" : String(r.left),
    right: r.right === undefined ? "" : String(r.right),
    transition: String(r.transition),
  };
}

/**
 * Reads typed text into a range. A field left as `original` showed it keeps the stored value, so
 * a station stored to more decimals than are shown is not rounded by editing another field.
 */
export function parseRangeText(text: RangeText, style: StationStyle, original?: CorridorWidthRange): { range: CorridorWidthRange } | { error: string } {
  const shown = original ? rangeToText(original, style) : undefined;
  try {
    const fromStation = shown?.from === text.from.trim() ? original!.fromStation : parseStation(text.from, style, "From station");
    const toStation = shown?.to === text.to.trim() ? original!.toStation : parseStation(text.to, style, "To station");
    const left = readWidth(text.left, "Left half-width");
    const right = readWidth(text.right, "Right half-width");
    const transition = readWidth(text.transition, "Transition") ?? 0;
    const range: CorridorWidthRange = { fromStation, toStation, transition };
    if (left !== undefined) range.left = left;
    if (right !== undefined) range.right = right;
    return { range };
  } catch (error) {
    return { error: error instanceof Error ? error.message : String(error) };
  }
}

function readWidth(text: string, name: string): number | undefined {
  const t = text.trim();
  if (t === "") return undefined;
  const n = Number(t);
  if (!Number.isFinite(n)) throw new Error(`${name} must be a number (leave it blank for the base width).`);
  return n;
}

/**
 * One message per range, or null where it is fine. Mirrors what the engine refuses
 * (createWidthProfile in app/geometry/corridor-widths.ts: from < to; widths and transition ≥ 0;
 * some width on one side; ranges touch at most, transitions included) and the schema's limit of
 * 10 000, and adds what the engine would silently ignore: a range outside the alignment's stations.
 * Overlaps are reported on both ranges. `extent` null skips the station-extent check.
 */
export function checkWidthRanges(ranges: readonly CorridorWidthRange[], base: { left: number; right: number }, extent: StationExtent | null, style: StationStyle): (string | null)[] {
  const station = (s: number) => formatStation(s, style);
  const slack = style === "metric" ? 0.0005 : 0.005; // half the last shown decimal: a typed end station matches
  const messages = ranges.map((r): string | null => {
    if (!(r.toStation > r.fromStation)) return `The range must end ahead of where it starts (${station(r.fromStation)} to ${station(r.toStation)}).`;
    if (extent && r.fromStation < extent.start - slack) return `It starts before the alignment's first station, ${station(extent.start)}.`;
    if (extent && r.toStation > extent.end + slack) return `It ends beyond the alignment's last station, ${station(extent.end)}.`;
    for (const [name, v] of [["left half-width", r.left], ["right half-width", r.right], ["transition", r.transition]] as const) {
      if (v !== undefined && v < 0) return `The ${name} cannot be negative.`;
      if (v !== undefined && v > MAX_WIDTH) return `The ${name} can be at most ${MAX_WIDTH.toLocaleString("en")}.`;
    }
    if (!((r.left ?? base.left) + (r.right ?? base.right) > 0)) return "The right-of-way needs a width on at least one side.";
    return null;
  });
  for (let i = 0; i < ranges.length; i++) {
    for (let j = 0; j < ranges.length; j++) {
      if (i === j || messages[i]) continue;
      const a = ranges[i]!;
      const b = ranges[j]!;
      // Touching is allowed (the engine's test is strict): a's taper ends where b's begins.
      const overlap = a.fromStation - a.transition < b.toStation + b.transition && b.fromStation - b.transition < a.toStation + a.transition;
      if (overlap) messages[i] = `It overlaps range ${j + 1} (tapers included: ${station(a.fromStation - a.transition)}–${station(a.toStation + a.transition)} against ${station(b.fromStation - b.transition)}–${station(b.toStation + b.transition)}); ranges may touch at most.`;
    }
  }
  return messages;
}

/** Ranges in station order (the engine sorts them too; the table reads better sorted). */
export function sortRanges(ranges: readonly CorridorWidthRange[]): CorridorWidthRange[] {
  return [...ranges].sort((a, b) => a.fromStation - b.fromStation);
}

export function sameRange(a: CorridorWidthRange | undefined, b: CorridorWidthRange): boolean {
  return !!a && a.fromStation === b.fromStation && a.toStation === b.toStation && a.left === b.left && a.right === b.right && a.transition === b.transition;
}

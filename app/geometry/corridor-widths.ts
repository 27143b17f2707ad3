import { GeometryInputError } from "./errors";
import type { CorridorInput, CorridorWidthRange } from "./take-types";
import { requireFinite, roundForMessage } from "./validate";

/** Half-widths along the centreline: piecewise linear in station. */
export interface WidthProfile {
  /** Right-of-way half-width left / right of the centreline at an internal station. */
  left(station: number): number;
  right(station: number): number;
  /** Stations where a width starts or stops changing, ascending. */
  breakpoints: number[];
}

/**
 * Reads and checks a corridor's widths. Inside a range the range's widths apply; over
 * `transition` before `fromStation` and after `toStation` the width changes linearly from the
 * base (common practice for right-of-way tapers). Ranges may touch but not overlap, transitions
 * included; widths are ≥ 0 and the two sides never both 0. Throws `GeometryInputError`.
 */
export function createWidthProfile(input: CorridorInput): WidthProfile {
  const baseLeft = requireWidth(input.left, "corridor.left");
  const baseRight = requireWidth(input.right, "corridor.right");
  requireSomeWidth(baseLeft, baseRight, "corridor.left");
  const ranges = (input.ranges ?? []).map((r, i) => checkRange(r, i, baseLeft, baseRight));
  const sorted = [...ranges].sort((a, b) => a.from - a.transition - (b.from - b.transition));
  for (let k = 1; k < sorted.length; k++) {
    const a = sorted[k - 1]!;
    const b = sorted[k]!;
    if (a.to + a.transition > b.from - b.transition) {
      throw new GeometryInputError("out_of_range", `width ranges ${a.i} and ${b.i} overlap (transitions included); make them touch at most`, { field: `corridor.ranges.${b.i}.fromStation` });
    }
  }
  const at = (station: number, side: "left" | "right"): number => {
    for (const r of sorted) {
      const inRange = r[side];
      const base = side === "left" ? baseLeft : baseRight;
      if (station >= r.from && station <= r.to) return inRange;
      if (r.transition > 0 && station > r.from - r.transition && station < r.from) return base + ((inRange - base) * (station - (r.from - r.transition))) / r.transition;
      if (r.transition > 0 && station > r.to && station < r.to + r.transition) return inRange + ((base - inRange) * (station - r.to)) / r.transition;
    }
    return side === "left" ? baseLeft : baseRight;
  };
  const breakpoints = sorted.flatMap((r) => [r.from - r.transition, r.from, r.to, r.to + r.transition]);
  return {
    left: (s) => at(s, "left"),
    right: (s) => at(s, "right"),
    breakpoints: [...new Set(breakpoints)].sort((a, b) => a - b),
  };
}

/** The same corridor with `extra` added to every half-width (an easement or a proximity band). */
export function widenCorridorInput(input: CorridorInput, extra: number): CorridorInput {
  const out: CorridorInput = { left: input.left + extra, right: input.right + extra };
  if (input.ranges) {
    out.ranges = input.ranges.map((r) => {
      const widened: CorridorWidthRange = { ...r, left: (r.left ?? input.left) + extra, right: (r.right ?? input.right) + extra };
      return widened;
    });
  }
  return out;
}

interface CheckedRange {
  i: number;
  from: number;
  to: number;
  transition: number;
  left: number;
  right: number;
}

function checkRange(r: CorridorWidthRange, i: number, baseLeft: number, baseRight: number): CheckedRange {
  const field = `corridor.ranges.${i}`;
  const from = requireFinite(r.fromStation, `${field}.fromStation`);
  const to = requireFinite(r.toStation, `${field}.toStation`);
  if (!(to > from)) throw new GeometryInputError("invalid_station", `${field} must end ahead of where it starts (from ${roundForMessage(from)} to ${roundForMessage(to)})`, { field: `${field}.toStation` });
  const transition = requireWidth(r.transition, `${field}.transition`);
  const left = r.left === undefined ? baseLeft : requireWidth(r.left, `${field}.left`);
  const right = r.right === undefined ? baseRight : requireWidth(r.right, `${field}.right`);
  requireSomeWidth(left, right, `${field}.left`);
  return { i, from, to, transition, left, right };
}

function requireWidth(value: unknown, field: string): number {
  const v = requireFinite(value, field);
  if (v < 0) throw new GeometryInputError("out_of_range", `${field} must be 0 or more, got ${roundForMessage(v)}`, { field, value: v });
  return v;
}

function requireSomeWidth(left: number, right: number, field: string): void {
  if (!(left + right > 0)) throw new GeometryInputError("out_of_range", "the right-of-way needs a width on at least one side", { field });
}

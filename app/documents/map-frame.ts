import type { Bounds } from "~/geometry/corridor-types";
import { METRES_PER_UNIT, type LengthUnit } from "~/geometry/units";
import type { Vec2 } from "~/geometry/vec2";

/** A rectangle on the page, PDF points (1/72 in), origin top-left. */
export interface Box {
  x: number;
  y: number;
  width: number;
  height: number;
}

/** A drawing of a piece of the grid on the page at a round scale, grid north up. */
export interface MapFrame {
  box: Box;
  /** The grid window shown (working units). */
  world: Bounds;
  /** Page points per working unit. */
  pointsPerUnit: number;
  /** The representative fraction: 1 : `ratio`. */
  ratio: number;
  toPage(p: Vec2): [number, number];
}

/** Metres per PDF point: 1 pt = 1/72 in, 1 in = 0.0254 m exactly (international inch). */
const METRES_PER_POINT = 0.0254 / 72;

/** Round scales (common practice on right-of-way plans): 1, 1.25, 2, 2.5, 5 × 10^k. */
const NICE_RATIO_STEPS = [1, 1.25, 2, 2.5, 5];

/** The smallest round ratio at or above `ratio`. */
export function roundScaleUp(ratio: number): number {
  const k = Math.floor(Math.log10(ratio));
  for (const e of [k, k + 1]) for (const step of NICE_RATIO_STEPS) if (step * 10 ** e >= ratio * (1 - 1e-12)) return step * 10 ** e;
  return 10 ** (k + 1);
}

/** A 1-2-5 number at or below `value` (scale bars, station ticks). */
export function roundDown125(value: number): number {
  const k = Math.floor(Math.log10(value));
  const base = 10 ** k;
  const m = value / base;
  return (m >= 5 ? 5 : m >= 2 ? 2 : 1) * base;
}

/**
 * Fits `world` (grid bounds, with a 10 % margin) into `box` at the next round scale 1:N, centred,
 * grid north up. N = (metres per unit) / (points per unit × metres per point).
 */
export function fitMapFrame(world: Bounds, box: Box, units: LengthUnit, margin = 0.1): MapFrame {
  const w = Math.max(world[2] - world[0], 1e-6) * (1 + 2 * margin);
  const h = Math.max(world[3] - world[1], 1e-6) * (1 + 2 * margin);
  const fit = Math.min(box.width / w, box.height / h);
  const ratio = roundScaleUp(METRES_PER_UNIT[units] / (fit * METRES_PER_POINT));
  const pointsPerUnit = METRES_PER_UNIT[units] / (ratio * METRES_PER_POINT);
  const cx = (world[0] + world[2]) / 2;
  const cy = (world[1] + world[3]) / 2;
  const halfW = box.width / pointsPerUnit / 2;
  const halfH = box.height / pointsPerUnit / 2;
  return {
    box,
    world: [cx - halfW, cy - halfH, cx + halfW, cy + halfH],
    pointsPerUnit,
    ratio,
    toPage: (p) => [box.x + box.width / 2 + (p[0] - cx) * pointsPerUnit, box.y + box.height / 2 - (p[1] - cy) * pointsPerUnit],
  };
}

/** Scale-bar length (working units): a 1-2-5 number near a quarter of the frame's width. */
export function scaleBarLength(frame: MapFrame): number {
  return roundDown125((frame.world[2] - frame.world[0]) / 4);
}

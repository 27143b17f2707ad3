import type { AlignmentPointInput, Vec2 } from "../geometry";
import { ExchangeInputError } from "./exchange-errors";
import type { ChainArc, ChainElement } from "./landxml-elements";

/** Join slack when reading a chain, as a fraction of its length (1 mm in 10 km), and the tangency slack, 1e-6 rad (0.2"). */
export const CHAIN_GAP_REL = 1e-7;
export const CHAIN_KINK_RAD = 1e-6;

/** Absolute join slack for a chain: CHAIN_GAP_REL of its length, plus round-off of its largest coordinate. */
export function chainTolerance(chain: ChainElement[]): number {
  let length = 0;
  let biggest = 0;
  for (const e of chain) {
    length += e.kind === "arc" ? e.radius * e.deltaRad : Math.hypot(e.end[0] - e.start[0], e.end[1] - e.start[1]);
    biggest = Math.max(biggest, Math.abs(e.start[0]), Math.abs(e.start[1]), Math.abs(e.end[0]), Math.abs(e.end[1]));
  }
  return CHAIN_GAP_REL * length + 1e-12 * biggest;
}

const headingOf = (a: Vec2, b: Vec2) => Math.atan2(b[1] - a[1], b[0] - a[0]);
const turn = (from: number, to: number) => Math.atan2(Math.sin(to - from), Math.cos(to - from));

/** Math heading of the arc's tangent at its start and end (radius direction ± 90° on the turning side). */
function arcHeadings(a: ChainArc): [number, number] {
  const q = (a.sign * Math.PI) / 2;
  return [headingOf(a.center, a.start) + q, headingOf(a.center, a.end) + q];
}

function headingsOf(e: ChainElement): [number, number] {
  if (e.kind === "arc") return arcHeadings(e);
  const h = headingOf(e.start, e.end);
  return [h, h];
}

/** Where the line through p along heading h1 meets the line through q along h2. */
function intersect(p: Vec2, h1: number, q: Vec2, h2: number): Vec2 | undefined {
  const d1: Vec2 = [Math.cos(h1), Math.sin(h1)];
  const d2: Vec2 = [Math.cos(h2), Math.sin(h2)];
  const den = d1[0] * d2[1] - d1[1] * d2[0];
  if (Math.abs(den) < 1e-12) return undefined;
  const t = ((q[0] - p[0]) * d2[1] - (q[1] - p[1]) * d2[0]) / den;
  return [p[0] + t * d1[0], p[1] + t * d1[1]];
}

/** Splits arcs joined end to end into runs that turn the same way (a reverse curve starts a new run). */
function groupElements(chain: ChainElement[]): (ChainElement | ChainArc[])[] {
  const out: (ChainElement | ChainArc[])[] = [];
  for (const e of chain) {
    const last = out[out.length - 1];
    if (e.kind === "arc" && Array.isArray(last) && last[0]!.sign === e.sign) last.push(e);
    else out.push(e.kind === "arc" ? [e] : e);
  }
  return out;
}

/** The PI of a run of one or two same-direction arcs: the intersection of its entry and exit tangents. */
function curvePoint(run: ChainArc[]): AlignmentPointInput {
  const first = run[0]!;
  const last = run[run.length - 1]!;
  const where = `Curve ${first.index + 1}`;
  if (run.length > 2) {
    throw new ExchangeInputError("unsupported_geometry", `${where}: ${run.length} arcs turning the same way meet without tangents; Takeline curves have at most two arcs (a compound curve).`, { element: first.index });
  }
  const total = run.reduce((s, a) => s + a.deltaRad, 0);
  if (total >= Math.PI - 1e-9) {
    throw new ExchangeInputError("unsupported_geometry", `${where} turns ${((total * 180) / Math.PI).toFixed(4)}°; a curve at a PI must turn less than 180°.`, { element: first.index });
  }
  const pi = intersect(first.start, arcHeadings(first)[0], last.end, arcHeadings(last)[1])!;
  if (run.length === 1) return { x: pi[0], y: pi[1], curve: { type: "simple", radius: first.radius } };
  return { x: pi[0], y: pi[1], curve: { type: "compound", radius1: first.radius, radius2: last.radius, delta1: (first.deltaRad * 180) / Math.PI } };
}

/** Plain-language notes about joins that are not exact: gaps, kinks, and arcs whose radius or PI disagree. */
function checkJoins(chain: ChainElement[], tolerance: number): string[] {
  const notes: string[] = [];
  chain.forEach((e, i) => {
    if (e.kind === "arc") {
      const r2 = Math.hypot(e.end[0] - e.center[0], e.end[1] - e.center[1]);
      if (Math.abs(r2 - e.radius) > tolerance) notes.push(`Curve ${e.index + 1}: Start and End are not the same distance from Center (${e.radius} vs ${r2}); Start was used.`);
      if (e.radiusAttr !== undefined && Math.abs(e.radiusAttr - e.radius) > 1e-6 * e.radius) notes.push(`Curve ${e.index + 1}: radius attribute ${e.radiusAttr} differs from the coordinates' ${e.radius}; the coordinates were used.`);
    }
    const prev = chain[i - 1];
    if (!prev) return;
    const gap = Math.hypot(e.start[0] - prev.end[0], e.start[1] - prev.end[1]);
    if (gap > tolerance) notes.push(`Element ${e.index + 1} starts ${gap} away from the end of element ${prev.index + 1}.`);
    const kink = Math.abs(turn(headingsOf(prev)[1], headingsOf(e)[0]));
    const angleJoin = prev.kind === "line" && e.kind === "line";
    if (!angleJoin && kink > CHAIN_KINK_RAD) notes.push(`Element ${e.index + 1} is not tangent to element ${prev.index + 1} (kink ${((kink * 180) / Math.PI).toFixed(6)}°); the PI list follows the curve's own tangents.`);
  });
  return notes;
}

/**
 * Rebuilds a PI list from a chain of Lines and Curves: the first and last points are the chain's
 * ends; two Lines meeting at an angle make a PI without a curve; a lone arc's PI is the intersection
 * of its tangents (a simple curve); two arcs turning the same way with no Line between them are one
 * compound curve at one PI (radius1, radius2, delta1); arcs turning opposite ways are two PIs
 * (a reverse curve). Throws `unsupported_geometry` for three or more arcs in a row turning the
 * same way or a curve of 180° or more. Zero-length Lines are dropped first.
 */
export function rebuildPis(input: ChainElement[]): { points: AlignmentPointInput[]; warnings: string[] } {
  const tolerance = chainTolerance(input);
  return rebuildWithin(input, tolerance);
}

function rebuildWithin(input: ChainElement[], tolerance: number): { points: AlignmentPointInput[]; warnings: string[] } {
  const chain = input.filter((e) => e.kind === "arc" || Math.hypot(e.end[0] - e.start[0], e.end[1] - e.start[1]) > tolerance);
  if (chain.length === 0) throw new ExchangeInputError("no_alignment", "The alignment's CoordGeom has no Line or Curve of any length.");
  const warnings = checkJoins(chain, tolerance);
  const points: AlignmentPointInput[] = [{ x: chain[0]!.start[0], y: chain[0]!.start[1] }];
  let previous: ChainElement | ChainArc[] | undefined;
  for (const item of groupElements(chain)) {
    if (Array.isArray(item)) points.push(curvePoint(item));
    else if (previous && !Array.isArray(previous) && previous.kind === "line") points.push({ x: item.start[0], y: item.start[1] });
    previous = item;
  }
  const last = chain[chain.length - 1]!;
  points.push({ x: last.end[0], y: last.end[1] });
  return { points, warnings };
}

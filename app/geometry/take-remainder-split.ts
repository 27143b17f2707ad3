import { flatRingArea } from "./corridor-pieces";
import type { CorridorPiece } from "./corridor-types";
import { createBoundaryPath } from "./take-boundary-path";
import type { RingRun, RingWalk } from "./take-ring-walk";
import type { PreparedPolygon } from "./take-shapes";
import type { Vec2 } from "./vec2";

interface Node {
  run: number;
  exit: boolean;
  u: number;
  at: Vec2;
}

/**
 * Exact areas of the connected pieces of (polygon − corridor) from the ring walks, or null when
 * the crossings do not pair up cleanly (the caller then falls back to a chorded difference).
 * Each piece's boundary is a cycle of outside runs of the polygon's rings joined by stretches of
 * the corridor boundary: leaving a run where the ring re-enters the corridor, the piece's boundary
 * follows the corridor boundary backwards to the previous crossing along it, which is where some
 * run leaves the corridor. Runs so joined are one piece (union–find); each piece's area is
 * ½∮(x dy − y dx) over its runs (shoelace) and corridor stretches (exact arcs), by Green's theorem.
 */
export function splitRemainder(polygon: PreparedPolygon, walks: RingWalk[], all: CorridorPiece[], near: CorridorPiece[]): number[] | null {
  const ox = polygon.bounds[0];
  const oy = polygon.bounds[1];
  const path = createBoundaryPath(all, new Set(near.map((p) => p.index)), ox, oy);
  const runs: { ring: number; run: RingRun }[] = walks.flatMap((w, ring) => w.runs.map((run) => ({ ring, run })));
  const nodes: Node[] = [];
  runs.forEach(({ run }, k) => {
    nodes.push({ run: k, exit: true, u: path.position(run.exit.tag, run.exit.x, run.exit.y), at: [run.exit.x, run.exit.y] });
    nodes.push({ run: k, exit: false, u: path.position(run.entry.tag, run.entry.x, run.entry.y), at: [run.entry.x, run.entry.y] });
  });
  if (nodes.some((n) => Number.isNaN(n.u))) return null;
  nodes.sort((a, b) => a.u - b.u);
  const parent = runs.map((_, k) => k);
  const find = (k: number): number => (parent[k] === k ? k : (parent[k] = find(parent[k]!)));
  const area = runs.map(({ ring, run }) => runIntegral(polygon.rings[ring]!, run, ox, oy));
  const extra = runs.map(() => 0);
  for (let k = 0; k < nodes.length; k++) {
    const a = nodes[k]!;
    if (!a.exit) continue;
    const b = nodes[(k + 1) % nodes.length]!;
    if (b.exit) return null;
    const along = path.integrate(a.u, a.at, b.u, b.at);
    if (!Number.isFinite(along)) return null;
    parent[find(a.run)] = find(b.run);
    extra[a.run] = -along;
  }
  const pieces = new Map<number, number>();
  runs.forEach((_, k) => pieces.set(find(k), (pieces.get(find(k)) ?? 0) + area[k]! + extra[k]!));
  // A ring wholly outside the corridor (a hole away from it) bounds whichever piece holds it; that is
  // only known for sure when there is one piece.
  const loose = walks.map((w, i) => (w.state === "outside" ? flatRingArea(polygon.rings[i]!) : 0)).reduce((x, y) => x + y, 0);
  if (walks.some((w) => w.state === "outside")) {
    if (pieces.size !== 1) return null;
    const [root, a] = [...pieces][0]!;
    pieces.set(root, a + loose);
  }
  return [...pieces.values()];
}

/** ½Σ(x_i y_{i+1} − x_{i+1} y_i) along a ring from a run's exit point to its entry point. */
function runIntegral(ring: number[], run: RingRun, ox: number, oy: number): number {
  const m = ring.length / 2;
  let px = run.exit.x - ox;
  let py = run.exit.y - oy;
  let sum = 0;
  const step = (x: number, y: number) => {
    sum += px * y - x * py;
    px = x;
    py = y;
  };
  if (!(run.entry.edge === run.exit.edge && run.entry.t >= run.exit.t)) {
    for (let e = (run.exit.edge + 1) % m; ; e = (e + 1) % m) {
      step(ring[2 * e]! - ox, ring[2 * e + 1]! - oy);
      if (e === run.entry.edge) break;
    }
  }
  step(run.entry.x - ox, run.entry.y - oy);
  return sum / 2;
}


import { refineZero } from "./compound-zero-scan";

/** A point of the plane of the two free angles (x outer, y inner), radians. */
export type PlanePoint = [number, number];

/** A chain of the zero contour of g: nodes on grid edges in order, closed or open at the grid's edge. */
export interface ContourChain {
  nodes: PlanePoint[];
  closed: boolean;
}

/**
 * The zero contour of g over the grid xs × ys by marching squares (W. E. Lorensen and H. E.
 * Cline's cell cases in two dimensions): a node where g changes sign along a grid edge (placed on
 * the contour by Brent's method along the edge), two nodes joined inside each cell they bound, a
 * saddle cell resolved by the asymptotic decider. Nodes are chained through shared edges, so
 * every component of the contour that crosses a grid line comes out as one chain, whatever its
 * shape. `gridValue(i, j)` may give g at grid points faster (tabulated); NaN leaves a cell out.
 */
export function traceZeroContour(
  g: (x: number, y: number) => number,
  xs: readonly number[],
  ys: readonly number[],
  gridValue: (i: number, j: number) => number = (i, j) => g(xs[i]!, ys[j]!),
): ContourChain[] {
  const [nx, ny] = [xs.length, ys.length];
  const values = new Float64Array(nx * ny);
  for (let i = 0; i < nx; i++) for (let j = 0; j < ny; j++) values[i * ny + j] = gridValue(i, j);
  const links = linkCells(values, nx, ny);
  const H = (nx - 1) * ny;
  const place = (edge: number): PlanePoint => {
    const horizontal = edge < H;
    const [i, j] = horizontal ? [Math.floor(edge / ny), edge % ny] : [Math.floor((edge - H) / (ny - 1)), (edge - H) % (ny - 1)];
    const [i2, j2] = horizontal ? [i + 1, j] : [i, j + 1];
    const [v0, v1] = [values[i * ny + j]!, values[i2 * ny + j2]!];
    const point = (u: number): PlanePoint => [xs[i]! + u * (xs[i2]! - xs[i]!), ys[j]! + u * (ys[j2]! - ys[j]!)];
    // Exactly on the contour (Brent along the edge): near twin roots the other condition changes
    // so slowly along the contour that an interpolated node can carry the wrong sign.
    return point(v0 === 0 ? 0 : refineZero((u) => g(...point(u)), 0, 1, v0, v1));
  };
  return chainLinks(links).map(({ edges, closed }) => ({ nodes: edges.map(place), closed }));
}

/**
 * Marching-squares cell cases: links between the sign-changing edges of each cell. Edge ids:
 * horizontal (i, j)–(i+1, j) is i·ny + j; vertical (i, j)–(i, j+1) is H + i·(ny − 1) + j.
 */
function linkCells(values: Float64Array, nx: number, ny: number): Map<number, number[]> {
  const H = (nx - 1) * ny;
  const links = new Map<number, number[]>();
  const link = (p: number, q: number) => {
    (links.get(p) ?? links.set(p, []).get(p)!).push(q);
    (links.get(q) ?? links.set(q, []).get(q)!).push(p);
  };
  // Scalars only in this loop (it visits every cell): no arrays per cell.
  for (let i = 0; i + 1 < nx; i++) {
    for (let j = 0; j + 1 < ny; j++) {
      const va = values[i * ny + j]!;
      const vb = values[(i + 1) * ny + j]!;
      const vc = values[(i + 1) * ny + j + 1]!;
      const vd = values[i * ny + j + 1]!;
      // A cell with an undefined corner (NaN: outside the domain) is left out.
      if (Number.isNaN(va + vb + vc + vd)) continue;
      const [a, b, c, d] = [va >= 0, vb >= 0, vc >= 0, vd >= 0];
      if (a === b && b === c && c === d) continue;
      const [bottom, right, top, left] = [i * ny + j, H + (i + 1) * (ny - 1) + j, i * ny + j + 1, H + i * (ny - 1) + j];
      if (a !== b && b !== c && c !== d) {
        // Saddle, by the asymptotic decider (G. M. Nielson and B. Hamann, IEEE Visualization
        // 1991): the corners of the sign of the bilinear interpolant at its saddle are joined.
        const joined = ((va * vc - vb * vd) / (va + vc - vb - vd) >= 0) === a;
        link(joined ? bottom : left, joined ? right : bottom);
        link(joined ? top : right, joined ? left : top);
      } else {
        // Exactly two cut edges: the first cut (in the order bottom, right, top, left) and the other.
        const first = a !== b ? bottom : b !== c ? right : top;
        const second = d !== a ? left : c !== d ? top : right;
        link(first, second);
      }
    }
  }
  return links;
}

/** Walks the link graph (every node has one or two links): open chains from their ends first, then loops. */
function chainLinks(links: Map<number, number[]>): { edges: number[]; closed: boolean }[] {
  const seen = new Set<number>();
  const out: { edges: number[]; closed: boolean }[] = [];
  const walk = (start: number) => {
    const edges = [start];
    seen.add(start);
    for (let at = start, next = links.get(start)!.find((n) => !seen.has(n)); next !== undefined; next = links.get(at)!.find((n) => !seen.has(n))) {
      edges.push(next);
      seen.add(next);
      at = next;
    }
    const last = edges[edges.length - 1]!;
    return { edges, closed: edges.length > 2 && links.get(last)!.includes(start) };
  };
  for (const [edge, ends] of links) if (ends.length === 1 && !seen.has(edge)) out.push(walk(edge));
  for (const edge of links.keys()) if (!seen.has(edge)) out.push(walk(edge));
  return out;
}

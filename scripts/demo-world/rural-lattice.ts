/**
 * The lattice the rural tracts are cut from: rays from the town centre
 * through points on the town's edge, crossed by irregular bands further out.
 * Roads and the creek follow fixed rays, so tracts meet them along a shared
 * boundary; every other vertex is jittered by a stable hash, and each edge is
 * computed once so both neighbouring tracts get exactly the same vertices.
 */
import { hashUnit } from "./prng";
import { ruralMeander } from "./creek";
import { densify, type Uv } from "./warp";

export type RayKind = { kind: "plain" | "corner" | "creek" } | { kind: "road"; name: string; cls: "main" | "track" };

export interface Lattice {
  rays: { t: number; ray: RayKind }[];
  bands: number;
  point(k: number, b: number): Uv;
  edge(k1: number, b1: number, k2: number, b2: number): Uv[];
  rectPoint(t: number): Uv;
}

const SCALES = [1, 1.3, 1.62, 1.98, 2.4];

/** Builds the lattice around rect [u0, v0, u1, v1] with the given fixed rays (positions on the perimeter). */
export function buildLattice(rect: [number, number, number, number], fixed: { t: number; ray: RayKind }[]): Lattice {
  const [u0, v0, u1, v1] = rect;
  const w = u1 - u0;
  const h = v1 - v0;
  const perimeter = 2 * (w + h);
  const centre: Uv = [(u0 + u1) / 2, (v0 + v1) / 2];
  const rectPoint = (tRaw: number): Uv => {
    const t = ((tRaw % perimeter) + perimeter) % perimeter;
    if (t <= w) return [u0 + t, v0];
    if (t <= w + h) return [u1, v0 + t - w];
    if (t <= 2 * w + h) return [u1 - (t - w - h), v1];
    return [u0, v1 - (t - 2 * w - h)];
  };
  const corners = [0, w, w + h, 2 * w + h].map((t) => ({ t, ray: { kind: "corner" } as RayKind }));
  const sorted = [...corners, ...fixed].sort((a, b) => a.t - b.t);
  const rays: { t: number; ray: RayKind }[] = [];
  sorted.forEach((f, i) => {
    const next = i + 1 < sorted.length ? sorted[i + 1]!.t : perimeter;
    const n = Math.max(1, Math.round((next - f.t) / 330));
    rays.push(f);
    for (let s = 1; s < n; s++) rays.push({ t: f.t + ((next - f.t) * s) / n, ray: { kind: "plain" } });
  });
  const K = rays.length;
  const mod = (k: number) => ((k % K) + K) % K;
  const tOf = (k: number) => rays[mod(k)]!.t + (k >= K ? perimeter : k < 0 ? -perimeter : 0);
  const point = (kRaw: number, b: number): Uv => {
    const k = mod(kRaw);
    if (b === 0) return rectPoint(rays[k]!.t);
    const gap = Math.min(tOf(k) - tOf(k - 1), tOf(k + 1) - tOf(k));
    const dt = rays[k]!.ray.kind === "plain" ? (hashUnit(k, b, 1) - 0.5) * 0.44 * gap : 0;
    const s = SCALES[b]! + (hashUnit(k, b, 2) - 0.5) * (b === SCALES.length - 1 ? 0.12 : 0.09);
    const p = rectPoint(rays[k]!.t + dt);
    return [centre[0] + s * (p[0] - centre[0]), centre[1] + s * (p[1] - centre[1])];
  };
  const cache = new Map<string, Uv[]>();
  const compute = (k1: number, b1: number, k2: number, b2: number): Uv[] => {
    const a = point(k1, b1);
    const z = point(k2, b2);
    const len = Math.hypot(z[0] - a[0], z[1] - a[1]);
    const nx = -(z[1] - a[1]) / len;
    const ny = (z[0] - a[0]) / len;
    const at = (f: number, off: number): Uv => [a[0] + (z[0] - a[0]) * f + nx * off, a[1] + (z[1] - a[1]) * f + ny * off];
    if (b1 === b2 && b1 === 0) return [...densify(a, z, 40), z];
    const ray = rays[mod(k1)]!.ray;
    if (b1 !== b2 && ray.kind === "creek") {
      const n = Math.ceil(len / 12);
      return Array.from({ length: n + 1 }, (_, i) => at(i / n, ruralMeander(i / n, k1 + b1)));
    }
    if (b1 !== b2 && ray.kind === "road") return [...densify(a, z, 80), z];
    const knots: Uv[] = b1 === b2
      ? [a, at(1 / 3, (hashUnit(k1, b1, 3) - 0.5) * 0.12 * len), at(2 / 3, (hashUnit(k1, b1, 4) - 0.5) * 0.12 * len), z]
      : [a, at(0.5, (hashUnit(k1, b1, 5) - 0.5) * 0.16 * len), z];
    const out: Uv[] = [];
    for (let i = 0; i + 1 < knots.length; i++) out.push(...densify(knots[i]!, knots[i + 1]!, 80));
    return [...out, z];
  };
  /** Edge path between two lattice points (both included); the canonical direction is lower band, then lower ray. */
  const edge = (k1: number, b1: number, k2: number, b2: number): Uv[] => {
    const forward = b1 < b2 || (b1 === b2 && mod(k1) < mod(k2) && !(mod(k1) === 0 && mod(k2) === K - 1)) || (b1 === b2 && mod(k1) === K - 1 && mod(k2) === 0);
    const [ka, ba, kb, bb] = forward ? [k1, b1, k2, b2] : [k2, b2, k1, b1];
    const key = `${mod(ka)},${ba}>${mod(kb)},${bb}`;
    let path = cache.get(key);
    if (!path) cache.set(key, (path = compute(mod(ka), ba, mod(kb), bb)));
    return forward ? path : [...path].reverse();
  };
  return { rays, bands: SCALES.length - 1, point, edge, rectPoint };
}

/**
 * Fabric benchmark (issue 4 goals): ingest of a 200,000-parcel zipped Shapefile, and parcel tiles
 * at zoom 16, 14, 13 and 12 (first request of each distinct tile, then from the tile cache). Prints figures; it is a benchmark, never a test.
 * Needs ogr2ogr (Debian gdal-bin) to write the synthetic Shapefile.
 */
import { mkdtempSync } from "node:fs";
import { availableParallelism, loadavg, tmpdir } from "node:os";
import { join } from "node:path";
import type { Feature } from "geojson";

const COUNT = Number(process.env.BENCH_PARCELS ?? 200_000);
process.env.DATABASE_URL = join(mkdtempSync(join(tmpdir(), "bench-fabric-")), "bench.sqlite");

/** A jittered grid of 20 m × 30 m lots in EPSG:32617 (deterministic), like a dense county fabric. */
function syntheticParcels(count: number): Feature[] {
  const cols = Math.ceil(Math.sqrt(count * 1.5));
  const features: Feature[] = [];
  const jitter = (i: number) => ((Math.sin(i * 12.9898) * 43758.5453) % 1) * 2;
  for (let i = 0; i < count; i++) {
    const c = i % cols;
    const r = Math.floor(i / cols);
    const x = 540_000 + c * 20;
    const y = 4_400_000 + r * 30;
    const ring = [[x, y], [x + 20 + jitter(i), y], [x + 20 + jitter(i), y + 30], [x, y + 30], [x, y]];
    features.push({ type: "Feature", geometry: { type: "Polygon", coordinates: [ring] }, properties: { APN: `B-${i}`, OWNER_NM: `Owner ${i % 997}`, LAND_VAL: 1000 + (i % 5000) } });
  }
  return features;
}

function median(xs: number[]): number {
  const s = [...xs].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)]!;
}

function lonLatToTile(lon: number, lat: number, z: number): [number, number] {
  const n = 2 ** z;
  const x = Math.floor(((lon + 180) / 360) * n);
  const latRad = (lat * Math.PI) / 180;
  const y = Math.floor(((1 - Math.log(Math.tan(latRad) + 1 / Math.cos(latRad)) / Math.PI) / 2) * n);
  return [x, y];
}

const { shapefileZip } = await import("./demo-world/write-shapefile");
const { readParcelUpload } = await import("../app/fabric/index.server");
const { crsCode, ingestLayer } = await import("../app/models/layer-ingest.server");
const { createProject } = await import("../app/models/projects.server");
const { insertUser } = await import("../app/models/users.server");
const { readLayerTile, forgetLayerTiles } = await import("../app/models/layer-tiles.server");

const zip = shapefileZip("bench_parcels", syntheticParcels(COUNT));
console.log(`synthetic fabric: ${COUNT.toLocaleString()} parcels, ${(zip.length / 1e6).toFixed(1)} MB zipped`);
const user = insertUser({ email: "bench@example.test", name: "Bench", role: "planner", passwordHash: null, status: "active" });
const project = createProject({ name: "Bench", description: "", units: "m" }, user);

/** Wall time, and this process's CPU time, since `start` (CPU time shows the work itself when other jobs share the cores). */
function elapsed(start: { wall: number; cpu: NodeJS.CpuUsage }): string {
  const cpu = process.cpuUsage(start.cpu);
  return `${((performance.now() - start.wall) / 1000).toFixed(1)} s (CPU ${((cpu.user + cpu.system) / 1e6).toFixed(1)} s)`;
}
const mark = () => ({ wall: performance.now(), cpu: process.cpuUsage() });

let peakRss = 0;
const sampler = setInterval(() => (peakRss = Math.max(peakRss, process.memoryUsage().rss)), 50);
const t0 = mark();
const upload = await readParcelUpload({ fileName: "bench.zip", bytes: new Uint8Array(zip), kind: "parcels" });
const readTime = elapsed(t0);
const t1 = mark();
const layer = ingestLayer({ ...project, crs: null }, user, { name: "bench", kind: "parcels", sourceFileName: "bench.zip" }, upload);
const storeTime = elapsed(t1);
clearInterval(sampler);
peakRss = Math.max(peakRss, process.memoryUsage().rss);
console.log(`ingest: read + check + reproject ${readTime}, store with R*Tree ${storeTime}, total ${elapsed(t0)} (goal < 20 s); peak RSS ${(peakRss / 1e9).toFixed(2)} GB (goal < 2 GB); load average ${loadavg()[0]!.toFixed(1)} on ${availableParallelism()} cores`);

const [w, s, e, n] = upload.bbox;
const centre: [number, number] = [(w + e) / 2, (s + n) / 2];
const stored = { ...project, crs: crsCode(upload.workingCrs) };
forgetLayerTiles(layer.id);
const tFirst = mark();
readLayerTile(layer, stored, 12, ...lonLatToTile(centre[0], centre[1], 12));
console.log(`first z12 tile (builds the layer's overview index): ${elapsed(tFirst)}`);

/** Up to 30 distinct tiles of zoom z over the fabric, nearest the centre first. */
function tilesAround(z: number): [number, number][] {
  const [x0, y1] = lonLatToTile(w, s, z);
  const [x1, y0] = lonLatToTile(e, n, z);
  const [cx, cy] = lonLatToTile(centre[0], centre[1], z);
  const all: [number, number][] = [];
  for (let x = x0; x <= x1; x++) for (let y = y0; y <= y1; y++) all.push([x, y]);
  return all.sort((a, b) => Math.hypot(a[0] - cx, a[1] - cy) - Math.hypot(b[0] - cx, b[1] - cy)).slice(0, 30);
}

for (const z of [16, 14, 13, 12]) {
  const list = tilesAround(z);
  const time = (f: () => void) => { const t = performance.now(); f(); return performance.now() - t; };
  let bytes = 0;
  // First request of each tile: sliced and encoded (nothing of that tile cached yet).
  const cold = list.map(([x, y]) => time(() => { bytes = Math.max(bytes, readLayerTile(layer, stored, z, x, y)?.bytes.length ?? 0); }));
  // The same tiles again: served from the tile cache.
  const cached = list.map(([x, y]) => time(() => readLayerTile(layer, stored, z, x, y)));
  const goal = z === 16 ? " (goal < 30 ms)" : z === 12 ? " (goal < 300 ms)" : "";
  console.log(`tile z${z}, ${list.length} distinct tiles: first request median ${median(cold).toFixed(1)} ms, max ${Math.max(...cold).toFixed(0)} ms${goal}; cached median ${median(cached).toFixed(2)} ms; largest ${(bytes / 1024).toFixed(0)} KB`);
}
console.log(`load average at the end ${loadavg()[0]!.toFixed(1)}`);

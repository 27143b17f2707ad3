/**
 * Fabric benchmark (issue 4 goals): ingest of a 200,000-parcel zipped Shapefile, and parcel tiles
 * at zoom 16 and 12 once warm. Prints figures; it is a benchmark, never a test.
 * Needs ogr2ogr (Debian gdal-bin) to write the synthetic Shapefile.
 */
import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
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
const { ingestLayer } = await import("../app/models/layer-ingest.server");
const { createProject } = await import("../app/models/projects.server");
const { insertUser } = await import("../app/models/users.server");
const { readLayerTile, forgetLayerTiles } = await import("../app/models/layer-tiles.server");

const zip = shapefileZip("bench_parcels", syntheticParcels(COUNT));
console.log(`synthetic fabric: ${COUNT.toLocaleString()} parcels, ${(zip.length / 1e6).toFixed(1)} MB zipped`);
const user = insertUser({ email: "bench@example.test", name: "Bench", role: "planner", passwordHash: null, status: "active" });
const project = createProject({ name: "Bench", description: "", units: "m" }, user);

let peakRss = 0;
const sampler = setInterval(() => (peakRss = Math.max(peakRss, process.memoryUsage().rss)), 50);
const t0 = performance.now();
const upload = await readParcelUpload({ fileName: "bench.zip", bytes: new Uint8Array(zip), kind: "parcels" });
const t1 = performance.now();
const layer = ingestLayer({ ...project, crs: null }, user, { name: "bench", kind: "parcels", sourceFileName: "bench.zip" }, upload);
const t2 = performance.now();
clearInterval(sampler);
peakRss = Math.max(peakRss, process.memoryUsage().rss);
console.log(`ingest: read + check + reproject ${((t1 - t0) / 1000).toFixed(1)} s, store with R*Tree ${((t2 - t1) / 1000).toFixed(1)} s, total ${((t2 - t0) / 1000).toFixed(1)} s (goal < 20 s); peak RSS ${(peakRss / 1e9).toFixed(2)} GB (goal < 2 GB)`);

const [w, s, e, n] = upload.bbox;
const centre: [number, number] = [(w + e) / 2, (s + n) / 2];
forgetLayerTiles(layer.id);
const tIndex = performance.now();
readLayerTile(layer, 12, ...lonLatToTile(centre[0], centre[1], 12));
console.log(`first tile (builds the layer's tile index): ${(performance.now() - tIndex).toFixed(0)} ms`);
for (const z of [16, 12]) {
  const times: number[] = [];
  for (let k = 0; k < 30; k++) {
    const [x, y] = lonLatToTile(centre[0] + (k % 6) * 0.0004, centre[1] + Math.floor(k / 6) * 0.0003, z);
    const t = performance.now();
    readLayerTile(layer, z, x, y);
    times.push(performance.now() - t);
  }
  console.log(`tile z${z} warm: median ${median(times).toFixed(1)} ms (goal ${z === 16 ? "< 30 ms" : "< 300 ms"})`);
}

/**
 * Test helpers that ask independent reference tools from Debian packages:
 * PROJ's cs2cs (proj-bin), GDAL's ogr2ogr/ogrinfo (gdal-bin) and GEOS through
 * shapely (python3-shapely). Used only by tests; nothing here ships.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";

/**
 * PROJ cs2cs with EPSG codes, so PROJ's own EPSG database defines both CRSs.
 * Input and output use each CRS's authority axis order (EPSG:4326 is lat, lon).
 */
export function cs2cs(fromEpsg: number, toEpsg: number, points: [number, number][]): [number, number][] {
  const input = points.map((p) => `${p[0]} ${p[1]}`).join("\n") + "\n";
  const out = execFileSync("cs2cs", ["-f", "%.9f", `EPSG:${fromEpsg}`, `EPSG:${toEpsg}`], { input, encoding: "utf8" });
  return out.trim().split("\n").map((line) => {
    const [a, b] = line.trim().split(/\s+/).map(Number);
    return [a!, b!];
  });
}

/** A fresh temporary folder; call the returned `cleanup` when done. */
export function tempDir(): { dir: string; cleanup: () => void } {
  const dir = mkdtempSync(join(tmpdir(), "takeline-fabric-"));
  return { dir, cleanup: () => rmSync(dir, { recursive: true, force: true }) };
}

/** One invented row for a reference file: WKT geometry plus attributes. */
export interface WktRow {
  wkt: string;
  [field: string]: string | number;
}

/** Writes rows as a CSV with a WKT column, the input GDAL's CSV driver reads. */
function writeCsv(path: string, rows: WktRow[]): void {
  const fields = Object.keys(rows[0]!);
  const quote = (v: string | number) => (typeof v === "number" ? String(v) : `"${v.replace(/"/g, '""')}"`);
  const lines = [fields.join(","), ...rows.map((r) => fields.map((f) => quote(r[f]!)).join(","))];
  writeFileSync(path, lines.join("\n") + "\n");
}

/**
 * Builds a reference file with GDAL's ogr2ogr from WKT rows: `driver` is
 * "ESRI Shapefile", "GPKG" or "GeoJSON". Numeric columns become numbers via a
 * .csvt. Returns the output path inside `dir`.
 */
export function ogrFromRows(dir: string, opts: { rows: WktRow[]; driver: string; out: string; srs?: string; extra?: string[]; layer?: string }): string {
  const csv = join(dir, `${opts.layer ?? "src"}.csv`);
  writeCsv(csv, opts.rows);
  const types = Object.entries(opts.rows[0]!).map(([k, v]) => (k === "wkt" ? "WKT" : typeof v === "number" ? "Real" : "String"));
  writeFileSync(csv + "t", types.join(",") + "\n");
  const out = join(dir, opts.out);
  const args = ["-f", opts.driver, out, csv, "-oo", "GEOM_POSSIBLE_NAMES=wkt", "-oo", "KEEP_GEOM_COLUMNS=NO", "-nlt", "PROMOTE_TO_MULTI"];
  if (opts.srs) args.push("-a_srs", opts.srs);
  if (opts.layer) args.push("-nln", opts.layer);
  execFileSync("ogr2ogr", [...args, ...(opts.extra ?? [])], { stdio: "pipe" });
  return out;
}

/** Zips files (by path) flat into one archive with Python's zipfile; returns the bytes. */
export function zipFiles(paths: string[]): Buffer {
  const { dir, cleanup } = tempDir();
  try {
    const zip = join(dir, "upload.zip");
    const script = "import sys, zipfile, os\nwith zipfile.ZipFile(sys.argv[1], 'w', zipfile.ZIP_DEFLATED) as z:\n    [z.write(p, os.path.basename(p)) for p in sys.argv[2:]]";
    execFileSync(python(), ["-c", script, zip, ...paths]);
    return readFileSync(zip);
  } finally {
    cleanup();
  }
}

let pythonCmd: string | undefined;
/** A python3 that has shapely: the PATH one, else Debian's, where python3-shapely installs. */
function python(): string {
  if (pythonCmd) return pythonCmd;
  for (const cmd of ["python3", "/usr/bin/python3"]) {
    try {
      execFileSync(cmd, ["-c", "import shapely"], { stdio: "pipe" });
      return (pythonCmd = cmd);
    } catch {
      // try the next interpreter
    }
  }
  throw new Error("python3 with shapely (Debian python3-shapely) is required by these tests");
}

/** Runs a shapely script that reads JSON on stdin and prints JSON. */
export function shapely<T>(script: string, input: unknown): T {
  const prelude = "import sys, json\nfrom shapely.geometry import shape\ndata = json.load(sys.stdin)\n";
  const out = execFileSync(python(), ["-c", prelude + script], { input: JSON.stringify(input), encoding: "utf8" });
  return JSON.parse(out) as T;
}

/** GEOS planar areas of GeoJSON geometries (shapely `area`). */
export function geosAreas(geometries: unknown[]): number[] {
  return shapely<number[]>("print(json.dumps([shape(g).area for g in data]))", geometries);
}

/** GEOS validity of GeoJSON geometries (shapely `is_valid`). */
export function geosValid(geometries: unknown[]): boolean[] {
  return shapely<boolean[]>("print(json.dumps([shape(g).is_valid for g in data]))", geometries);
}

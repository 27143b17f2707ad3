/**
 * Runs tests/reference/corridor_geos.py (GEOS through Debian's python3-shapely) on a job and
 * returns its JSON. Shared by the take tests and scripts/bench-takes.ts; never shipped.
 */
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import type { AlignmentElement } from "../../app/geometry/alignment-types";
import type { CorridorInput, PolygonCoords } from "../../app/geometry/take-types";

const SCRIPT = join(dirname(fileURLToPath(import.meta.url)), "corridor_geos.py");

/** A reference job: the alignment, widths and the parcels to overlay. */
export interface GeosJob {
  elements: AlignmentElement[];
  corridor: CorridorInput;
  parcels: { id: string; polygons: PolygonCoords[] }[];
  /** Chord sagitta of the reference corridor's curves, units. Default 1e-5. */
  sagitta?: number;
  /** Also time the overlay with a corridor chorded at this sagitta. */
  geosSagitta?: number;
  unparcelled?: boolean;
  /** Also return the areas of the pieces of (parcel − corridor) for every taken parcel. */
  pieces?: boolean;
  repeat?: number;
  /** The reference right-of-way as GEOS's buffer of the centreline (equal constant half-widths only): valid where the corridor covers ground twice. */
  buffered?: boolean;
}

/** What GEOS computed. Areas in square units, times in seconds (measured inside python). */
export interface GeosResult {
  corridorArea: number;
  takes: Record<string, number>;
  wideArea?: number;
  wideTakes?: Record<string, number>;
  unparcelledArea?: number;
  pieces?: Record<string, number[]>;
  overlaySeconds: number;
  coarseOverlaySeconds?: number;
  coarseVertices?: number;
  /** Largest per-parcel difference between the coarse and the reference corridor's takes. */
  coarseMaxDiff?: number;
  fabricSeconds: number;
  candidates: number;
  vertices: number;
}

let pythonCmd: string | undefined;

/** A python3 that can import shapely: the one on PATH, else Debian's (where python3-shapely installs). */
export function shapelyPython(): string {
  if (pythonCmd) return pythonCmd;
  for (const cmd of ["python3", "/usr/bin/python3"]) {
    try {
      execFileSync(cmd, ["-c", "import shapely.geometry, shapely.strtree"], { stdio: "pipe" });
      return (pythonCmd = cmd);
    } catch {
      // try the next interpreter
    }
  }
  throw new Error("GEOS reference needs python3 with shapely: install Debian's python3-shapely (apt-get install python3-shapely)");
}

/** Runs the GEOS reference on `job` (parcels written to a temp file) and parses its answer. */
export function runGeosTakes(job: GeosJob): GeosResult {
  const python = shapelyPython();
  const dir = mkdtempSync(join(tmpdir(), "takeline-geos-"));
  try {
    const parcelsFile = join(dir, "parcels.json");
    writeFileSync(parcelsFile, JSON.stringify(job.parcels));
    const jobFile = join(dir, "job.json");
    writeFileSync(jobFile, JSON.stringify({ ...job, parcels: undefined, parcelsFile }));
    const out = execFileSync(python, [SCRIPT, jobFile], { encoding: "utf8", maxBuffer: 1 << 30 });
    return JSON.parse(out) as GeosResult;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

/** Runs description_geos.py (GEOS through Debian's python3-shapely) on descriptions; used only by tests. */
import { execFileSync } from "node:child_process";
import { mkdtempSync, rmSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { dirname, join } from "node:path";
import { fileURLToPath } from "node:url";
import { shapelyPython } from "../../../tests/reference/geos-takes";
import type { AlignmentElement } from "~/geometry/alignment-types";
import type { CorridorInput, PolygonCoords } from "~/geometry/take-types";
import type { TakeDescription } from "../describe-take";

const SCRIPT = join(dirname(fileURLToPath(import.meta.url)), "description_geos.py");

/** GEOS's verdict on one description: its polygon's area, the reference take's, and how far apart they are. */
export interface GeosDescriptionCheck {
  area: number;
  refArea: number;
  symDiff: number;
  hausdorff: number;
  valid: boolean;
}

/** Compares each description's courses, walked and densified, with GEOS's parcel ∩ independently built corridor. */
export function checkDescriptionsWithGeos(job: { elements: AlignmentElement[]; corridor: CorridorInput; parcels: { id: string; polygons: PolygonCoords[] }[]; descriptions: TakeDescription[] }): Record<string, GeosDescriptionCheck> {
  const dir = mkdtempSync(join(tmpdir(), "takeline-legal-geos-"));
  try {
    const descriptions = Object.fromEntries(job.descriptions.map((d) => [d.parcelId, d.parts.map((p) => p.rings.map((r) => r.courses))]));
    const file = join(dir, "job.json");
    writeFileSync(file, JSON.stringify({ elements: job.elements, corridor: job.corridor, parcels: job.parcels, descriptions }));
    return JSON.parse(execFileSync(shapelyPython(), [SCRIPT, file], { encoding: "utf8", maxBuffer: 1 << 28 })) as Record<string, GeosDescriptionCheck>;
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}

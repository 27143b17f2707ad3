import { readFileSync } from "node:fs";
import { resolve } from "node:path";
import { readParcelUpload } from "~/fabric/index.server";
import { ingestLayer } from "./layer-ingest.server";
import { listProjectLayers } from "./layers.server";
import { findProjectByName, type Project } from "./projects.server";

/** The invented Quillmere fabric that `scripts/demo-world/build.ts` generates into data/demo/. */
const DEMO_LAYERS = [
  { file: "quillmere-parcels.zip", name: "Ostrand County parcels", kind: "parcels" as const, fields: undefined },
  { file: "quillmere-buildings.zip", name: "Building footprints", kind: "buildings" as const, fields: { parcelId: "APN", landValue: "BLDG_VAL" } },
];

/** Loads the demo parcel fabric into the demo project once; later runs leave existing layers alone. */
export async function seedDemoFabric(projectName: string, plannerId: number): Promise<number> {
  const project = findProjectByName(projectName);
  if (!project) throw new Error(`demo project ${projectName} is missing`);
  const present = new Set(listProjectLayers(project.id).filter((l) => l.status === "active").map((l) => l.kind));
  let loaded = 0;
  for (const layer of DEMO_LAYERS) {
    if (present.has(layer.kind)) continue;
    const bytes = new Uint8Array(readFileSync(resolve("data/demo", layer.file)));
    const fresh = findProjectByName(projectName) as Project;
    const upload = await readParcelUpload({ fileName: layer.file, bytes, kind: layer.kind, fields: layer.fields, workingCrs: fresh.crs ?? undefined, areaUnit: fresh.units });
    ingestLayer(fresh, { id: plannerId }, { name: layer.name, kind: layer.kind, sourceFileName: layer.file }, upload);
    loaded += upload.featureCount;
  }
  return loaded;
}

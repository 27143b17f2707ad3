import { randomBytes } from "node:crypto";
import { readParcelUpload } from "~/fabric/index.server";
import { createAlternative, type AlternativeInputs } from "~/models/alternatives.server";
import { ingestLayer } from "~/models/layer-ingest.server";
import { createProject, findProjectForUser, upsertProjectMember } from "~/models/projects.server";
import { createUser } from "./users";

/** West end of the invented test strip, in WGS 84 / UTM zone 17N (EPSG:32617) metres. */
export const STRIP_X0 = 561_000;
export const STRIP_Y = 4_419_000;

/**
 * Ten parcels of 100 m frontage along a straight east–west line, each 200 m deep and centred on it,
 * except the last, only 44 m deep, so a 40 m right-of-way leaves two 200 m² slivers (a full take).
 * Closed form: each take is 100 m × 40 m = 4,000 m², over stations 100·i to 100·(i + 1).
 */
function stripGeoJson(count: number): Uint8Array {
  const features = Array.from({ length: count }, (_, i) => {
    const [x0, x1] = [STRIP_X0 + 100 * i, STRIP_X0 + 100 * (i + 1)];
    const half = i === count - 1 ? 22 : 100;
    const ring = [[x0, STRIP_Y - half], [x1, STRIP_Y - half], [x1, STRIP_Y + half], [x0, STRIP_Y + half], [x0, STRIP_Y - half]];
    return { type: "Feature", properties: { parcel_id: `FL-${String(i + 1).padStart(3, "0")}`, owner: `Owner ${i + 1} of Ferrow Lane`, address: `${i + 1} Ferrow Lane` }, geometry: { type: "Polygon", coordinates: [ring] } };
  });
  return new TextEncoder().encode(JSON.stringify({ type: "FeatureCollection", features }));
}

/** The straight line over the strip with a 40 m right-of-way (20 m each side). */
export function stripAlternative(overrides: Partial<AlternativeInputs> = {}): AlternativeInputs {
  return {
    name: "Ferrow straight",
    description: "",
    designSpeed: 80,
    speedUnit: "km/h",
    emaxPercent: 8,
    alignment: { units: "m", startStation: 0, points: [{ x: STRIP_X0, y: STRIP_Y }, { x: STRIP_X0 + 1000, y: STRIP_Y }] },
    corridor: { left: 20, right: 20 },
    rules: {},
    acceptedChecks: [],
    ...overrides,
  };
}

/** A metric project with a planner, two managers, two land agents and an analyst, the strip fabric and one alternative. */
export async function createDecisionProject(parcelCount = 10) {
  const tag = randomBytes(3).toString("hex");
  const [planner, manager, manager2, agentA, agentB, analyst, admin] = await Promise.all([
    createUser({ role: "planner", name: "Pella Planner", email: `planner-${tag}@example.test` }),
    createUser({ role: "manager", name: "Mando Manager", email: `manager-${tag}@example.test` }),
    createUser({ role: "manager", name: "Mira Second", email: `manager2-${tag}@example.test` }),
    createUser({ role: "agent", name: "Ada Agent", email: `agent-a-${tag}@example.test` }),
    createUser({ role: "agent", name: "Bram Agent", email: `agent-b-${tag}@example.test` }),
    createUser({ role: "analyst", name: "Ana Lyst", email: `analyst-${tag}@example.test` }),
    createUser({ role: "admin", name: "Adi Admin", email: `admin-${tag}@example.test` }),
  ]);
  const created = createProject({ name: `Ferrow Lane ${tag}`, description: "", units: "m" }, planner);
  for (const u of [manager, manager2, agentA, agentB, analyst]) upsertProjectMember(created.id, u.id, u.role);
  const upload = await readParcelUpload({ fileName: "strip.geojson", bytes: stripGeoJson(parcelCount), kind: "parcels", sourceCrs: "EPSG:32617", workingCrs: "EPSG:32617", areaUnit: "m", fields: { parcelId: "parcel_id", owner: "owner", address: "address" } });
  ingestLayer(created, planner, { name: "Strip", kind: "parcels", sourceFileName: "strip.geojson" }, upload);
  const project = findProjectForUser(created.id, planner)!;
  const alternative = createAlternative(project.id, stripAlternative(), planner.id);
  return { project, alternative, planner, manager, manager2, agentA, agentB, analyst, admin };
}

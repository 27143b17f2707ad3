import { expect } from "vitest";
import { get } from "./support/http";
import { bearer } from "./support/layer-uploads";

/** The parts of the impacts JSON the export journeys compare with. */
export interface ApiImpacts {
  units: string;
  summary: Record<string, number>;
  parcels: { parcelId: string; owner: string | null; takeArea: number; easementArea: number; remainderArea: number; parcelArea: number; classification: string; estimatedCost: number; remainderPieces: number }[];
}

/** One course of a description as the API returns it. */
export interface ApiCourse {
  kind: "line" | "arc";
  part: number;
  ring: number;
  from: [number, number];
  to: [number, number];
  bearing: string;
  azimuthDeg?: number;
  distance?: number;
  radius?: number;
  deltaDeg?: number;
  delta?: string;
  arcLength?: number;
  direction?: "left" | "right";
  chordAzimuthDeg?: number;
  chordDistance?: number;
}

export interface ApiDescription {
  text: string;
  courses: ApiCourse[];
  area: number;
  closure: number;
  roundedClosure: number;
  parts: { label: string; rings: { hole: boolean; area: number; courses: ApiCourse[] }[] }[];
}

/** The demo project and its alternatives (ids and names), read from the API, and a planner token. */
export async function demoProject(): Promise<{ auth: Record<string, string>; projectId: number; alternatives: { id: number; name: string }[] }> {
  const auth = await bearer("planner@demo.test");
  const projects = (await (await get("/api/v1/projects", auth)).json()) as { projects: { id: number; name: string }[] };
  const project = projects.projects.find((p) => p.name === "Quillmere Eastern Bypass");
  if (!project) throw new Error("the demo project is missing");
  const list = (await (await get(`/api/v1/projects/${project.id}/alternatives`, auth)).json()) as { alternatives: { id: number; name: string }[] };
  expect(list.alternatives.length).toBeGreaterThanOrEqual(3);
  return { auth, projectId: project.id, alternatives: list.alternatives.map(({ id, name }) => ({ id, name })) };
}

export async function readImpactsJson(alternativeId: number, auth: Record<string, string>): Promise<ApiImpacts> {
  const res = await get(`/api/v1/alternatives/${alternativeId}/impacts`, auth);
  expect(res.status).toBe(200);
  return (await res.json()) as ApiImpacts;
}

/** Unit vector [east, north] of an azimuth (degrees clockwise from grid north). */
function along(azimuthDeg: number): [number, number] {
  const a = (azimuthDeg * Math.PI) / 180;
  return [Math.sin(a), Math.cos(a)];
}

/**
 * Walks a ring's courses from its first point with the numbers the API reports — lines by azimuth
 * and distance, arcs by chord azimuth and chord distance — and measures the misclosure and the
 * area enclosed: shoelace of the walked points plus each arc's circular segment R²/2·(Δ − sin Δ)
 * (CRC Standard Mathematical Tables, "circular segment"), signed by its turn.
 */
export function walkCourses(courses: ApiCourse[]): { misclosure: number; area: number } {
  const [x0, y0] = courses[0]!.from;
  let [x, y, twice, segments] = [0, 0, 0, 0];
  for (const c of courses) {
    const [az, d] = c.kind === "line" ? [c.azimuthDeg!, c.distance!] : [c.chordAzimuthDeg!, c.chordDistance!];
    const [ux, uy] = along(az);
    const [nx, ny] = [x + d * ux, y + d * uy];
    twice += x * ny - nx * y;
    [x, y] = [nx, ny];
    if (c.kind === "arc") {
      const delta = (c.deltaDeg! * Math.PI) / 180;
      segments += (c.direction === "left" ? 1 : -1) * (c.radius! ** 2 / 2) * (delta - Math.sin(delta));
    }
  }
  expect(Number.isFinite(x0 + y0)).toBe(true);
  return { misclosure: Math.hypot(x, y), area: Math.abs(twice / 2 + segments) };
}

import { expect } from "vitest";
import { execFileSync } from "node:child_process";
import { readdirSync, readFileSync, writeFileSync } from "node:fs";
import { join } from "node:path";
import { ogrFromRows, tempDir, zipFiles, type WktRow } from "~/fabric/test-support/reference-tools.server";
import { baseUrl } from "./browser";
import { postJson } from "./http";

/** A bearer token for a demo account. */
export async function bearer(email: string): Promise<Record<string, string>> {
  const res = await postJson("/api/v1/tokens", { email, password: "takeline-demo", label: "layers e2e" });
  expect(res.status).toBe(201);
  return { authorization: `Bearer ${((await res.json()) as { token: string }).token}` };
}

/** Creates a project over the API as the given (planner) caller; returns its id. */
export async function newProject(auth: Record<string, string>, body: Record<string, unknown>): Promise<number> {
  const res = await postJson("/api/v1/projects", body, auth);
  expect(res.status).toBe(201);
  return ((await res.json()) as { id: number }).id;
}

export type UploadParts = { name?: string; kind?: string; sourceCrs?: string; fields?: string; replacesLayerId?: string };

/** Posts a multipart layer upload (or preview) the way a browser form would. */
export function postLayer(projectId: number, auth: Record<string, string>, file: Uint8Array | null, fileName: string, parts: UploadParts = {}, preview = false): Promise<Response> {
  const form = new FormData();
  for (const [k, v] of Object.entries({ name: "Quillmere parcels", kind: "parcels", ...parts })) if (v !== undefined) form.set(k, v);
  if (file) form.set("file", new Blob([new Uint8Array(file)]), fileName);
  return fetch(`${baseUrl()}/api/v1/projects/${projectId}/layers${preview ? "/preview" : ""}`, { method: "POST", headers: auth, body: form });
}

/**
 * A zipped Shapefile written by GDAL's ogr2ogr from WKT rows, in `srs`. `edit` may replace the
 * .prj text or drop sidecar files (by extension) before zipping.
 */
export function shapefileZip(rows: WktRow[], srs: string, edit: { drop?: string[]; prj?: string } = {}): Buffer {
  const { dir, cleanup } = tempDir();
  try {
    ogrFromRows(dir, { rows, driver: "ESRI Shapefile", out: "parcels.shp", srs, layer: "parcels" });
    if (edit.prj !== undefined) writeFileSync(join(dir, "parcels.prj"), edit.prj);
    const files = readdirSync(dir).filter((f) => f.startsWith("parcels.") && !(edit.drop ?? []).some((d) => f.endsWith(d)));
    return zipFiles(files.map((f) => join(dir, f)));
  } finally {
    cleanup();
  }
}

/** Writes the rows as a Shapefile with GDAL, reprojects it with ogr2ogr -t_srs and returns the GeoJSON: the reference geometry. */
export function gdalReprojected(rows: WktRow[], srs: string, targetSrs: string): { features: { geometry: unknown; properties: Record<string, unknown> }[] } {
  const { dir, cleanup } = tempDir();
  try {
    const shp = ogrFromRows(dir, { rows, driver: "ESRI Shapefile", out: "parcels.shp", srs, layer: "parcels" });
    const out = join(dir, "reprojected.geojson");
    ogrReproject(shp, out, targetSrs);
    return JSON.parse(readFileSync(out, "utf8"));
  } finally {
    cleanup();
  }
}

function ogrReproject(src: string, out: string, targetSrs: string): void {
  execFileSync("ogr2ogr", ["-f", "GeoJSON", "-t_srs", targetSrs, "-lco", "COORDINATE_PRECISION=10", out, src], { stdio: "pipe" });
}

/** Lists the project's layers over the API. */
export async function layerList(projectId: number, auth: Record<string, string>): Promise<{ id: number; status: string; featureCount: number }[]> {
  const res = await fetch(`${baseUrl()}/api/v1/projects/${projectId}/layers`, { headers: auth });
  expect(res.status).toBe(200);
  return ((await res.json()) as { layers: { id: number; status: string; featureCount: number }[] }).layers;
}

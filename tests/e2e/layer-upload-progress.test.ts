import { expect, test } from "vitest";
import { get } from "./support/http";
import { bearer, newProject, postLayer } from "./support/layer-uploads";

type Job = { stage: string | null; label: string; fraction: number; finished: boolean };

/** 30,000 invented 10 m lots near Quillmere in WGS84, as GeoJSON: large enough to be processed in several chunks. */
function manyLots(): Uint8Array {
  const features = Array.from({ length: 30_000 }, (_, i) => {
    const x = 14.5 + (i % 200) * 0.0002;
    const y = 47.8 + Math.floor(i / 200) * 0.0002;
    return { type: "Feature", properties: { APN: `QM-P${i}` }, geometry: { type: "Polygon", coordinates: [[[x, y], [x + 0.0001, y], [x + 0.0001, y + 0.0001], [x, y + 0.0001], [x, y]]] } };
  });
  return new TextEncoder().encode(JSON.stringify({ type: "FeatureCollection", features }));
}

test("an upload sent with an Upload-Job-Id reports its processing while it runs; the answer is the usual 201", async () => {
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere progress", units: "m" });
  const jobId = "e2e-progress-0001";
  const seen: Job[] = [];
  let done = false;
  const upload = postLayer(projectId, { ...planner, "Upload-Job-Id": jobId }, manyLots(), "lots.geojson").finally(() => (done = true));
  while (!done) {
    const res = await get(`/api/v1/projects/${projectId}/layers/progress/${jobId}`, planner);
    if (res.status === 200) seen.push((await res.json()) as Job);
    await new Promise((r) => setTimeout(r, 30));
  }
  const res = await upload;
  expect(res.status).toBe(201);
  expect(((await res.json()) as { featureCount: number }).featureCount).toBe(30_000);
  // Polls answered while the file was processed, at stages part-way through.
  const during = seen.filter((j) => !j.finished && j.fraction > 0 && j.fraction < 1);
  expect(during.length).toBeGreaterThan(0);
  expect(new Set(during.map((j) => j.stage))).toContain("coordinates");
  const fractions = seen.map((j) => j.fraction);
  expect(fractions.every((f, i) => i === 0 || f >= fractions[i - 1]!)).toBe(true);
  const last = (await (await get(`/api/v1/projects/${projectId}/layers/progress/${jobId}`, planner)).json()) as Job;
  expect(last).toMatchObject({ finished: true, fraction: 1 });
});

test("a job is visible to its uploader only: other roles get 403, unknown ids 404, no session 401", async () => {
  const planner = await bearer("planner@demo.test");
  const projectId = await newProject(planner, { name: "Quillmere progress access", units: "m" });
  const lot = { type: "FeatureCollection", features: [{ type: "Feature", properties: { APN: "QM-A1" }, geometry: { type: "Polygon", coordinates: [[[14.5, 47.8], [14.5001, 47.8], [14.5001, 47.8001], [14.5, 47.8]]] } }] };
  const res = await postLayer(projectId, { ...planner, "Upload-Job-Id": "e2e-progress-0002" }, new TextEncoder().encode(JSON.stringify(lot)), "one.geojson", {}, true);
  expect(res.status).toBe(200);
  const path = `/api/v1/projects/${projectId}/layers/progress/e2e-progress-0002`;
  expect((await get(path, planner)).status).toBe(200);
  // Only planners upload, so only they poll; another planner's view of a job is refused in the model test.
  const other = await get(path, await bearer("manager@demo.test"));
  expect(other.status).toBe(403);
  expect(((await other.json()) as { error: { code: string } }).error.code).toBe("forbidden");
  expect((await get(`/api/v1/projects/${projectId}/layers/progress/e2e-progress-9999`, planner)).status).toBe(404);
  expect((await get(`/api/v1/projects/${projectId}/layers/progress/bad`, planner)).status).toBe(404);
  expect((await get(path)).status).toBe(401);
});

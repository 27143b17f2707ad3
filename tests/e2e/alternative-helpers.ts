import type { Page } from "playwright-core";
import { get, sessionCookie } from "./support/http";

/** The API's view of an alternative (the fields the journeys compare with the page). */
export interface ApiAlternative {
  id: number;
  projectId: number;
  name: string;
  version: number;
  alignment: { units: string; points: { x: number; y: number; curve?: { type: string; radius?: number; radius1?: number; radius2?: number; delta1?: number } }[] };
  summary: { takeArea: number; estimatedCost: number; parcelsAffected: number; displacements: number; length: number; fullTakes: number; partialTakes: number };
}

export async function plannerCookie(): Promise<string> {
  return sessionCookie("planner@demo.test");
}

/** The demo project's alternatives in creation order, read from the API (never hard-coded figures). */
export async function listDemoAlternatives(cookie: string): Promise<ApiAlternative[]> {
  const projects = (await (await get("/api/v1/projects", { cookie })).json()) as { projects: { id: number; name: string }[] };
  const project = projects.projects.find((p) => p.name === "Quillmere Eastern Bypass");
  if (!project) throw new Error("the demo project is missing");
  const list = (await (await get(`/api/v1/projects/${project.id}/alternatives`, { cookie })).json()) as { alternatives: { id: number }[] };
  return Promise.all(list.alternatives.map((a) => readAlternative(a.id, cookie)));
}

export async function readAlternative(id: number, cookie: string): Promise<ApiAlternative> {
  const res = await get(`/api/v1/alternatives/${id}`, { cookie });
  if (res.status !== 200) throw new Error(`GET alternative ${id}: ${res.status}`);
  return (await res.json()) as ApiAlternative;
}

/** Waits until the map has loaded, the first preview has answered and the tiles had time to draw. */
export async function waitForEditor(page: Page): Promise<void> {
  await page.setViewportSize({ width: 1280, height: 1000 });
  await page.waitForFunction(() => (window as unknown as { __takelineMapReady?: boolean }).__takelineMapReady === true, null, { timeout: 45_000 });
  await waitForPreview(page);
  // Markers must be inside the viewport for mouse events to reach them.
  await page.getByTestId("alternative-map").scrollIntoViewIfNeeded();
  await page.waitForTimeout(2500);
}

/** Waits for the preview in flight (if any) to answer. */
export async function waitForPreview(page: Page): Promise<void> {
  await page.locator('[data-testid="take-totals"][aria-busy="false"]').waitFor({ timeout: 30_000 });
}

/** Waits until autosave reports the given version. */
export async function waitForSaved(page: Page, version: number): Promise<void> {
  await page.getByTestId("save-status").filter({ hasText: `Saved · version ${version}` }).waitFor({ timeout: 30_000 });
}

/** The number a totals cell shows, e.g. "136,231.6 m²" → 136231.6. */
export function shownNumber(text: string | null): number {
  return Number((text ?? "").replace(/[^\d.-]/g, ""));
}

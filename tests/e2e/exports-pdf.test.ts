import { execFileSync } from "node:child_process";
import { beforeAll, expect, test } from "vitest";
import { withTempDir, writeInto } from "../reference/exports-gdal";
import { get } from "./support/http";
import { bearer } from "./support/layer-uploads";
import { demoProject, readImpactsJson, type ApiDescription } from "./exports-support";

let demo: Awaited<ReturnType<typeof demoProject>>;
beforeAll(async () => {
  demo = await demoProject();
});

/** Text of a PDF as Debian's poppler-utils pdftotext reads it (page order, no layout). */
function pdfText(bytes: Uint8Array): Promise<string> {
  return withTempDir((dir) => execFileSync("pdftotext", ["-enc", "UTF-8", writeInto(dir, "doc.pdf", bytes), "-"], { encoding: "utf8" }));
}

/** Page count from poppler's pdfinfo. */
function pdfPages(bytes: Uint8Array): Promise<number> {
  return withTempDir((dir) => Number(/Pages:\s+(\d+)/.exec(execFileSync("pdfinfo", [writeInto(dir, "doc.pdf", bytes)], { encoding: "utf8" }))![1]));
}

async function fetchPdf(path: string, auth = demo.auth): Promise<Uint8Array> {
  const res = await get(path, auth);
  expect(res.status).toBe(200);
  expect(res.headers.get("content-type")).toBe("application/pdf");
  expect(res.headers.get("content-disposition")).toMatch(/filename=".+\.pdf"/);
  return new Uint8Array(await res.arrayBuffer());
}

test("a take exhibit is a PDF whose text holds the names, the caution and every course of the description API, bearings and distances as written", async () => {
  // The first take with a curve course in the first alternative, so the curve table is checked too.
  const alt = demo.alternatives[0]!;
  const impacts = await readImpactsJson(alt.id, demo.auth);
  let chosen: { parcelId: string; d: ApiDescription } | undefined;
  for (const p of impacts.parcels.filter((x) => x.takeArea > 0)) {
    const d = (await (await get(`/api/v1/alternatives/${alt.id}/parcels/${encodeURIComponent(p.parcelId)}/description`, demo.auth)).json()) as ApiDescription;
    if (d.courses.some((c) => c.kind === "arc")) {
      chosen = { parcelId: p.parcelId, d };
      break;
    }
  }
  expect(chosen).toBeDefined();
  const pdf = await fetchPdf(`/api/v1/alternatives/${alt.id}/parcels/${encodeURIComponent(chosen!.parcelId)}/exhibit.pdf`);
  // PDF 32000-1:2008 §7.5.2: the file begins with the header %PDF-1.n.
  expect(new TextDecoder().decode(pdf.slice(0, 8))).toMatch(/^%PDF-1\.\d/);
  const text = await pdfText(pdf);
  expect(text).toContain("RIGHT-OF-WAY TAKE EXHIBIT");
  expect(text).toContain(`Parcel ${chosen!.parcelId}`);
  expect(text).toContain("Quillmere Eastern Bypass");
  expect(text).toContain(alt.name);
  expect(text).toContain("licensed professional land surveyor");
  expect(text).toContain("grid north");
  expect(text).toMatch(/Scale 1:[\d,]+/);
  for (const c of chosen!.d.courses) {
    expect(text).toContain(c.bearing);
    expect(text).toContain((c.kind === "line" ? c.distance! : c.chordDistance!).toFixed(3));
    if (c.kind === "arc") {
      expect(text).toContain(c.radius!.toFixed(3));
      expect(text).toContain(c.delta!);
      expect(text).toContain(c.arcLength!.toFixed(3));
    }
  }
  expect(text).toContain(chosen!.d.area.toFixed(2));
});

test("the project report lists every alternative with its take area and draws them on a map page", async () => {
  const pdf = await fetchPdf(`/api/v1/projects/${demo.projectId}/report.pdf`);
  expect(new TextDecoder().decode(pdf.slice(0, 5))).toBe("%PDF-");
  const text = await pdfText(pdf);
  expect(text).toContain("ALTERNATIVES REPORT");
  expect(text).toContain("Figure 1.");
  const comparison = (await (await get(`/api/v1/projects/${demo.projectId}/comparison`, demo.auth)).json()) as { alternatives: { name: string; summary: { takeArea: number } }[]; matrix: { parcelId: string }[] };
  for (const a of comparison.alternatives) {
    expect(text).toContain(a.name);
    expect(text).toContain(a.summary.takeArea.toLocaleString("en-US", { minimumFractionDigits: 1, maximumFractionDigits: 1 }));
  }
  for (const r of comparison.matrix) expect(text).toContain(r.parcelId);
  expect(await pdfPages(pdf)).toBeGreaterThanOrEqual(3);
});

test("PDFs need a project member: 401 without a session, 403 for an agent, 404 for a parcel with no take", async () => {
  const alt = demo.alternatives[0]!;
  const taken = (await readImpactsJson(alt.id, demo.auth)).parcels.find((p) => p.takeArea > 0)!;
  expect((await get(`/api/v1/projects/${demo.projectId}/report.pdf`)).status).toBe(401);
  expect((await get(`/api/v1/projects/${demo.projectId}/report.pdf`, await bearer("agent@demo.test"))).status).toBe(403);
  expect((await get(`/api/v1/alternatives/${alt.id}/parcels/${encodeURIComponent(taken.parcelId)}/exhibit.pdf`, await bearer("agent@demo.test"))).status).toBe(403);
  const none = await get(`/api/v1/alternatives/${alt.id}/parcels/NO-SUCH-PARCEL/exhibit.pdf`, demo.auth);
  expect(none.status).toBe(404);
  expect(none.headers.get("content-type")).toMatch(/json/);
});

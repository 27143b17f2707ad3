import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import { join } from "node:path";
import { simpleParser } from "mailparser";
import { expect, inject } from "vitest";
import type { CaughtMail } from "~/utils/mail-inbox.server";
import { baseUrl } from "./browser";
import { postJson, sessionCookie } from "./http";
import { bearer, newProject, postLayer, shapefileZip } from "./layer-uploads";

export const DEMO_ROLES = { planner: "planner@demo.test", manager: "manager@demo.test", agent: "agent@demo.test", agent2: "agent2@demo.test", analyst: "analyst@demo.test", admin: "admin@demo.test" } as const;
export type DemoRole = keyof typeof DEMO_ROLES;

// An invented strip (EPSG:32617 metres): `count` lots of 100 m frontage, 200 m deep, centred on a
// straight east–west line. A 40 m right-of-way takes exactly 100 × 40 = 4 000 m² of each (closed form),
// over stations 100·i to 100·(i + 1) of a line that starts at the strip's west edge at station 0.
const Y = 4_421_500;
const lot = (x0: number, i: number) => {
  const [a, b] = [x0 + 100 * i, x0 + 100 * (i + 1)];
  return `POLYGON ((${a} ${Y - 100}, ${b} ${Y - 100}, ${b} ${Y + 100}, ${a} ${Y + 100}, ${a} ${Y - 100}))`;
};

export interface StripProject {
  projectId: number;
  auth: Record<DemoRole, Record<string, string>>;
  /** Creates an alternative along the whole strip (or `length` metres of it) and returns its id. */
  alternative: (name: string, length?: number) => Promise<number>;
  parcelIds: string[];
}

/** Adds a demo account to the project through the project page's own form, as a planner would. */
async function addMember(projectId: number, plannerCookie: string, email: string, role: string): Promise<void> {
  const res = await fetch(`${baseUrl()}/projects/${projectId}`, { method: "POST", headers: { cookie: plannerCookie, "content-type": "application/x-www-form-urlencoded" }, body: new URLSearchParams({ intent: "add-member", email, role }), redirect: "manual" });
  expect(res.status).toBe(200);
}

/** A project of the planner with the strip fabric, every demo role as a member, parcel IDs `<prefix>-01…`. */
export async function createStripProject(name: string, prefix: string, x0: number, count = 8): Promise<StripProject> {
  const auth = Object.fromEntries(await Promise.all(Object.entries(DEMO_ROLES).map(async ([r, email]) => [r, await bearer(email)]))) as StripProject["auth"];
  const parcelIds = Array.from({ length: count }, (_, i) => `${prefix}-${String(i + 1).padStart(2, "0")}`);
  // GDAL writes the zip before the first request: a slow first ogr2ogr between two requests can outlast
  // the server's keep-alive, and the upload would then go out on a socket the server just closed.
  const zip = shapefileZip(parcelIds.map((id, i) => ({ wkt: lot(x0, i), APN: id, OWNER_NM: `Owner of ${id}`, SITUS: `${i + 1} Strip Road` })), "EPSG:32617");
  const projectId = await newProject(auth.planner, { name, units: "m", crs: "EPSG:32617" });
  expect((await postLayer(projectId, auth.planner, zip, "strip.zip")).status).toBe(201);
  const cookie = await sessionCookie(DEMO_ROLES.planner);
  for (const r of ["manager", "agent", "agent2", "analyst"] as const) await addMember(projectId, cookie, DEMO_ROLES[r], r === "agent2" ? "agent" : r);
  const alternative = async (altName: string, length = 100 * count) => {
    const alignment = { units: "m", startStation: 0, points: [{ x: x0, y: Y }, { x: x0 + length, y: Y }] };
    const res = await postJson(`/api/v1/projects/${projectId}/alternatives`, { name: altName, alignment, corridor: { left: 20, right: 20 } }, auth.planner);
    expect(res.status).toBe(201);
    return ((await res.json()) as { id: number }).id;
  };
  return { projectId, auth, alternative, parcelIds };
}

export function send(method: "POST" | "PUT" | "PATCH", path: string, body: unknown, headers: Record<string, string>): Promise<Response> {
  return fetch(`${baseUrl()}${path}`, { method, headers: { "content-type": "application/json", ...headers }, body: JSON.stringify(body), redirect: "manual" });
}

/** The text of an attachment of a caught message, parsed from its .eml file. */
export async function attachmentText(mail: CaughtMail, filename: RegExp): Promise<string> {
  const parsed = await simpleParser(readFileSync(join(inject("mailDir"), mail.file)));
  const found = parsed.attachments.find((a) => filename.test(a.filename ?? ""));
  if (!found) throw new Error(`no attachment ${filename} in ${mail.subject}`);
  return found.content.toString("utf8");
}

/** Python's csv module (an RFC 4180 reader independent of ours) reads the CSV into dicts. */
export function readCsvWithPython(csv: string): Record<string, string>[] {
  const script = "import sys, csv, json, io\nprint(json.dumps(list(csv.DictReader(io.StringIO(sys.stdin.read(), newline='')))))";
  return JSON.parse(execFileSync("python3", ["-c", script], { input: csv, encoding: "utf8" }));
}

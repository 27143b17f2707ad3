import { beforeAll, expect, test } from "vitest";
import { get } from "./support/http";
import { createStripProject, send, type StripProject } from "./support/decision-project";

type Item = { caseId: number; parcelId: string; status: string; statusLabel: string; takeArea: number; remainderArea: number; classification: string; stationFrom: number; stationTo: number; lastNote: string | null; state: string; history?: { kind: string; from: string | null; to: string | null; note: string; by: string | null }[] };

let strip: StripProject;
let mine: Item[];
let theirs: Item[];

const list = async (auth: Record<string, string>, query = "") => ((await (await get(`/api/v1/me/parcels?projectId=${strip.projectId}${query}`, auth)).json()) as { parcels: Item[] }).parcels;

beforeAll(async () => {
  strip = await createStripProject("Work API Strip", "WA", 565_000, 6);
  const id = await strip.alternative("Work line");
  expect((await send("POST", `/api/v1/alternatives/${id}/submit`, {}, strip.auth.planner)).status).toBe(200);
  expect((await send("POST", `/api/v1/alternatives/${id}/decision`, { decision: "approve", comment: "", split: "even" }, strip.auth.manager)).status).toBe(200);
  mine = await list(strip.auth.agent);
  theirs = await list(strip.auth.agent2);
});

test("each agent lists only their own parcels, with the take as approved (closed form: 100 m × 40 m each)", async () => {
  expect(mine.map((p) => p.parcelId)).toEqual(["WA-04", "WA-05", "WA-06"]);
  expect(theirs.map((p) => p.parcelId)).toEqual(["WA-01", "WA-02", "WA-03"]);
  for (const p of [...mine, ...theirs]) expect([p.takeArea, p.remainderArea, p.classification, p.status, p.state]).toEqual([4000, 16000, "partial", "not-started", "open"]);
  expect(mine.map((p) => [p.stationFrom, p.stationTo])).toEqual([[300, 400], [400, 500], [500, 600]]);
});

test("only land agents have a work list: every other role gets 403", async () => {
  for (const role of ["admin", "planner", "manager", "analyst"] as const) {
    expect((await get("/api/v1/me/parcels", strip.auth[role])).status, role).toBe(403);
    expect((await send("PATCH", `/api/v1/me/parcels/${mine[0]!.caseId}`, { note: "x" }, strip.auth[role])).status, role).toBe(403);
  }
});

test("an agent moves a parcel on with a note; the history says who did what", async () => {
  const caseId = mine[0]!.caseId;
  const res = await send("PATCH", `/api/v1/me/parcels/${caseId}`, { status: "owner-contacted", note: "Phoned the owner; site visit on Tuesday." }, strip.auth.agent);
  expect(res.status).toBe(200);
  const item = (await res.json()) as Item;
  expect([item.status, item.statusLabel, item.lastNote]).toEqual(["owner-contacted", "Owner contacted", "Phoned the owner; site visit on Tuesday."]);
  expect(item.history!.slice(0, 2).map((h) => [h.kind, h.from, h.to, h.by])).toEqual([
    ["note", null, null, "Nella Fostrum"],
    ["status", "not-started", "owner-contacted", "Nella Fostrum"],
  ]);
  expect((await list(strip.auth.agent, "&status=owner-contacted")).map((p) => p.parcelId)).toEqual(["WA-04"]);
  expect(await list(strip.auth.agent, "&status=agreed,acquired")).toEqual([]);
});

test("refusals: another agent's parcel is 404, a move the rules refuse is 409, an empty change is 422", async () => {
  expect((await send("PATCH", `/api/v1/me/parcels/${theirs[0]!.caseId}`, { note: "not mine" }, strip.auth.agent)).status).toBe(404);
  expect((await get(`/api/v1/me/parcels/${theirs[0]!.caseId}`, strip.auth.agent)).status).toBe(404);
  const refused = await send("PATCH", `/api/v1/me/parcels/${mine[1]!.caseId}`, { status: "acquired" }, strip.auth.agent);
  expect(refused.status).toBe(409);
  expect(await refused.json()).toMatchObject({ error: { code: "conflict", details: { status: "not-started" } } });
  expect((await send("PATCH", `/api/v1/me/parcels/${mine[1]!.caseId}`, {}, strip.auth.agent)).status).toBe(422);
  expect((await send("PATCH", `/api/v1/me/parcels/${mine[1]!.caseId}`, { status: "sold" }, strip.auth.agent)).status).toBe(422);
  expect((await get("/api/v1/me/parcels?status=sold", strip.auth.agent)).status).toBe(422);
});

test("a parcel the next preferred alternative no longer takes is released: it leaves the list, changes are 409", async () => {
  const shorter = await strip.alternative("Shorter work line", 500);
  expect((await send("POST", `/api/v1/alternatives/${shorter}/submit`, {}, strip.auth.planner)).status).toBe(200);
  expect((await send("POST", `/api/v1/alternatives/${shorter}/decision`, { decision: "approve", comment: "" }, strip.auth.manager)).status).toBe(200);
  expect((await list(strip.auth.agent)).map((p) => p.parcelId)).toEqual(["WA-04", "WA-05"]);
  const released = (await list(strip.auth.agent, "&released=1")).find((p) => p.parcelId === "WA-06")!;
  expect(released.state).toBe("released");
  expect((await send("PATCH", `/api/v1/me/parcels/${released.caseId}`, { note: "late" }, strip.auth.agent)).status).toBe(409);
  // The status worked so far is kept across the new approval.
  expect((await list(strip.auth.agent))[0]!.status).toBe("owner-contacted");
});

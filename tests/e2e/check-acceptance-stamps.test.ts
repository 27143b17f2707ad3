import { beforeAll, expect, test } from "vitest";
import { DEMO_ACCOUNTS } from "~/models/demo-accounts";
import { get, postJson } from "./support/http";
import { send } from "./support/decision-project";
import { bearer, newProject } from "./support/layer-uploads";

// An invented line (EPSG:32617 metres) with one curve of R = 150 m at PI 1. At the default 80 km/h
// and emax 8 % the minimum radius is 229 m (AASHTO Green Book 2018, Table 3-7 formula
// R = V²/(127(e + f)) with f = 0.14; derived, see the project's reference notes), so the
// min-radius check at PI 1 fails and can be accepted.
const X0 = 563000;
const Y0 = 4419000;
const bend = { units: "m", startStation: 0, points: [{ x: X0, y: Y0 }, { x: X0 + 250, y: Y0, curve: { type: "simple", radius: 150 } }, { x: X0 + 500, y: Y0 + 100 }] };
const CHECK = "min-radius:pi-1";
const REASON = "Existing bridge abutment fixes the curve; advisory speed posted.";
const PLANNER_NAME = DEMO_ACCOUNTS.find((a) => a.email === "planner@demo.test")!.name;

type Acceptance = { id: string; reason: string; acceptedBy?: string; acceptedAt?: string };
type Stored = { version: number; acceptedChecks: Acceptance[]; summary: { checkWarnings: number; checksAccepted: number } };

let planner: Record<string, string>;
let projectId: number;
beforeAll(async () => {
  planner = await bearer("planner@demo.test");
  projectId = await newProject(planner, { name: "Quillmere Acceptance Bend", units: "m", crs: "EPSG:32617" });
});

async function createBend(name: string): Promise<Stored & { id: number }> {
  const res = await postJson(`/api/v1/projects/${projectId}/alternatives`, { name, alignment: bend, corridor: { left: 15, right: 15 } }, planner);
  expect(res.status).toBe(201);
  return (await res.json()) as Stored & { id: number };
}

async function save(id: number, body: Record<string, unknown>): Promise<Stored> {
  const res = await send("PUT", `/api/v1/alternatives/${id}`, body, planner);
  expect(res.status).toBe(200);
  return (await res.json()) as Stored;
}

async function stored(id: number): Promise<Stored> {
  const res = await get(`/api/v1/alternatives/${id}`, planner);
  expect(res.status).toBe(200);
  return (await res.json()) as Stored;
}

/** Lets the clock move past the last stamp's millisecond, so a restamp is told apart from a kept stamp. */
function passMillisecond(): Promise<void> {
  return new Promise((r) => setTimeout(r, 5));
}

/** Runs `act` and checks `acceptedAt` is an ISO 8601 UTC instant inside the time it took. */
async function expectStampedDuring(act: () => Promise<Acceptance | undefined>): Promise<Acceptance> {
  const before = Date.now();
  const a = await act();
  const after = Date.now();
  expect(a?.acceptedBy).toBe(PLANNER_NAME);
  expect(a?.acceptedAt).toMatch(/^\d{4}-\d\d-\d\dT\d\d:\d\d:\d\d\.\d{3}Z$/);
  const at = Date.parse(a!.acceptedAt!);
  expect(at).toBeGreaterThanOrEqual(before);
  expect(at).toBeLessThanOrEqual(after);
  return a!;
}

test("a check accepted through PUT is stamped with the planner's name and the time, and GET returns the stamp", async () => {
  const alt = await createBend("Stamped bend");
  expect(alt.acceptedChecks).toEqual([]);
  expect(alt.summary.checksAccepted).toBe(0);
  const saved = await expectStampedDuring(async () => (await save(alt.id, { version: alt.version, acceptedChecks: [{ id: CHECK, reason: REASON }] })).acceptedChecks[0]);
  const read = await stored(alt.id);
  expect(read.acceptedChecks).toEqual([{ id: CHECK, reason: REASON, acceptedBy: PLANNER_NAME, acceptedAt: saved.acceptedAt }]);
  // The acceptance is of the failing check itself, not an orphan id.
  expect(read.summary.checksAccepted).toBe(1);
});

test("a later save that keeps the acceptance unchanged keeps its original stamp, and one that forges a stamp is ignored", async () => {
  const alt = await createBend("Kept bend");
  const first = (await save(alt.id, { version: alt.version, acceptedChecks: [{ id: CHECK, reason: REASON }] })).acceptedChecks;
  await passMillisecond();
  // Another edit sends the acceptance back as the editor does (no stamp): the stamp stays.
  const kept = await save(alt.id, { version: alt.version + 1, corridor: { left: 16, right: 16 }, acceptedChecks: [{ id: CHECK, reason: REASON }] });
  expect(kept.acceptedChecks).toEqual(first);
  // A client claiming someone else accepted it, at another time, changes nothing.
  const forged = { id: CHECK, reason: REASON, acceptedBy: "Orla Venmick", acceptedAt: "2001-02-03T04:05:06.000Z" };
  const afterForgery = await save(alt.id, { version: alt.version + 2, acceptedChecks: [forged] });
  expect(afterForgery.acceptedChecks).toEqual(first);
  expect((await stored(alt.id)).acceptedChecks).toEqual(first);
});

test("a new acceptance sent with a forged stamp gets the signed-in planner's stamp instead", async () => {
  const alt = await createBend("Forged bend");
  const forged = { id: CHECK, reason: REASON, acceptedBy: "Orla Venmick", acceptedAt: "2001-02-03T04:05:06.000Z" };
  await expectStampedDuring(async () => (await save(alt.id, { version: alt.version, acceptedChecks: [forged] })).acceptedChecks[0]);
});

test("changing the reason restamps the acceptance", async () => {
  const alt = await createBend("Restamped bend");
  const first = (await save(alt.id, { version: alt.version, acceptedChecks: [{ id: CHECK, reason: REASON }] })).acceptedChecks[0]!;
  await passMillisecond();
  const newReason = "Design speed lowered to 50 km/h through the bridge approach.";
  const again = await expectStampedDuring(async () => (await save(alt.id, { version: alt.version + 1, acceptedChecks: [{ id: CHECK, reason: newReason }] })).acceptedChecks[0]);
  expect(again.reason).toBe(newReason);
  expect(Date.parse(again.acceptedAt!)).toBeGreaterThan(Date.parse(first.acceptedAt!));
});

test("an acceptance given when the alternative is created is stamped too", async () => {
  const res = await expectStampedDuring(async () => {
    const r = await postJson(`/api/v1/projects/${projectId}/alternatives`, { name: "Created accepted", alignment: bend, corridor: { left: 15, right: 15 }, acceptedChecks: [{ id: CHECK, reason: REASON, acceptedBy: "Orla Venmick" }] }, planner);
    expect(r.status).toBe(201);
    return ((await r.json()) as Stored).acceptedChecks[0];
  });
  expect(res.reason).toBe(REASON);
});

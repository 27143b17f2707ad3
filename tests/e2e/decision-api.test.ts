import { beforeAll, expect, test } from "vitest";
import { baseUrl } from "./support/browser";
import { get, postJson, sessionCookie } from "./support/http";
import { inviteAndAccept } from "./support/accounts";
import { attachmentText, createStripProject, readCsvWithPython, send, type DemoRole, type StripProject } from "./support/decision-project";
import { bearer } from "./support/layer-uploads";
import { waitForMail } from "./support/mail";

const NAME = "Decision API Strip";
let strip: StripProject;
let secondManager: Record<string, string>;

beforeAll(async () => {
  strip = await createStripProject(NAME, "DA", 563_000);
  // A second manager, through the product's own invitation path, added to the project by the planner.
  await inviteAndAccept("manager-two@demo.test", "manager", "second-manager-pw-1");
  const planner = await sessionCookie("planner@demo.test");
  const added = await fetch(`${baseUrl()}/projects/${strip.projectId}`, { method: "POST", headers: { cookie: planner, "content-type": "application/x-www-form-urlencoded" }, body: new URLSearchParams({ intent: "add-member", email: "manager-two@demo.test", role: "manager" }) });
  expect(added.status).toBe(200);
  const token = await postJson("/api/v1/tokens", { email: "manager-two@demo.test", password: "second-manager-pw-1" });
  secondManager = { authorization: `Bearer ${((await token.json()) as { token: string }).token}` };
});

const ROLES: DemoRole[] = ["admin", "planner", "manager", "agent", "analyst"];
const statusOf = async (res: Promise<Response>) => (await res).status;

/**
 * Every action over HTTP against every role, from a state that allows it: the roles that may not
 * get 403 (and the alternative does not move), the one that may gets 200, and the same request again
 * gets 409 (the state no longer allows it). Expected statuses written out by hand from issue 6.
 */
const STEPS: { action: string; path: (id: number) => string; body: unknown; may: DemoRole; after: string }[] = [
  { action: "submit", path: (id) => `/api/v1/alternatives/${id}/submit`, body: { comment: "For decision" }, may: "planner", after: "submitted" },
  { action: "withdraw", path: (id) => `/api/v1/alternatives/${id}/withdraw`, body: {}, may: "planner", after: "draft" },
  { action: "submit again", path: (id) => `/api/v1/alternatives/${id}/submit`, body: {}, may: "planner", after: "submitted" },
  { action: "return", path: (id) => `/api/v1/alternatives/${id}/decision`, body: { decision: "return", comment: "Narrow it at DA-03." }, may: "manager", after: "returned" },
  { action: "resubmit", path: (id) => `/api/v1/alternatives/${id}/submit`, body: {}, may: "planner", after: "submitted" },
  { action: "approve", path: (id) => `/api/v1/alternatives/${id}/decision`, body: { decision: "approve", comment: "Go ahead." }, may: "manager", after: "approved" },
];

test("every lifecycle action against every role: 403 for the roles that may not, 200 for the one that may, then 409", async () => {
  const id = await strip.alternative("Matrix line");
  for (const step of STEPS) {
    for (const role of ROLES.filter((r) => r !== step.may)) {
      expect(await statusOf(send("POST", step.path(id), step.body, strip.auth[role])), `${role} ${step.action}`).toBe(403);
    }
    const ok = await send("POST", step.path(id), step.body, strip.auth[step.may]);
    expect(ok.status, `${step.may} ${step.action}`).toBe(200);
    const body = (await ok.json()) as { status?: string; alternative?: { status: string } };
    expect(body.status ?? body.alternative?.status).toBe(step.after);
    const again = await send("POST", step.path(id), step.body, strip.auth[step.may]);
    expect(again.status, `${step.may} ${step.action} again`).toBe(409);
    expect(((await again.json()) as { error: { code: string } }).error.code).toBe("conflict");
  }
  const now = (await (await get(`/api/v1/alternatives/${id}`, strip.auth.analyst)).json()) as { status: string; version: number };
  expect(now).toMatchObject({ status: "approved", version: 1 });
});

test("returning needs comments (422); bodies are checked; non-members get 404", async () => {
  const id = await strip.alternative("Checks line");
  expect((await send("POST", `/api/v1/alternatives/${id}/submit`, {}, strip.auth.planner)).status).toBe(200);
  const noComment = await send("POST", `/api/v1/alternatives/${id}/decision`, { decision: "return", comment: "  " }, strip.auth.manager);
  expect(noComment.status).toBe(422);
  expect(await noComment.json()).toMatchObject({ error: { code: "unprocessable", details: [{ path: "comment" }] } });
  expect((await send("POST", `/api/v1/alternatives/${id}/decision`, { decision: "maybe", comment: "" }, strip.auth.manager)).status).toBe(422);
  expect((await send("POST", `/api/v1/alternatives/999999/decision`, { decision: "approve", comment: "" }, strip.auth.manager)).status).toBe(404);
  expect((await get(`/api/v1/alternatives/${id}/decision`, strip.auth.manager)).status).toBe(405);
});

test("two managers deciding at once: exactly one decision wins, the other gets a clear 409", async () => {
  const id = await strip.alternative("Race line");
  expect((await send("POST", `/api/v1/alternatives/${id}/submit`, {}, strip.auth.planner)).status).toBe(200);
  const [a, b] = await Promise.all([
    send("POST", `/api/v1/alternatives/${id}/decision`, { decision: "approve", comment: "Approve from manager one." }, strip.auth.manager),
    send("POST", `/api/v1/alternatives/${id}/decision`, { decision: "return", comment: "Return from manager two." }, secondManager),
  ]);
  const statuses = [a.status, b.status].sort();
  expect(statuses).toEqual([200, 409]);
  const loser = (await (a.status === 409 ? a : b).json()) as { error: { code: string; message: string } };
  expect(loser.error.code).toBe("conflict");
  expect(loser.error.message).toMatch(/Someone else acted on this alternative first|awaiting a decision/);
  const winner = a.status === 200 ? "approved" : "returned";
  const now = (await (await get(`/api/v1/alternatives/${id}`, strip.auth.planner)).json()) as { status: string };
  expect(now.status).toBe(winner);
});

test("assignments: 403 for every role but manager, 409 for an alternative that is not preferred, 422 for a non-agent", async () => {
  const notPreferred = await strip.alternative("Never approved");
  for (const role of ["admin", "planner", "agent", "analyst"] as const) {
    expect(await statusOf(send("PUT", `/api/v1/alternatives/${notPreferred}/assignments`, { split: "even" }, strip.auth[role])), role).toBe(403);
  }
  expect((await send("PUT", `/api/v1/alternatives/${notPreferred}/assignments`, { split: "even" }, strip.auth.manager)).status).toBe(409);
  const preferred = await strip.alternative("Preferred line");
  expect((await send("POST", `/api/v1/alternatives/${preferred}/submit`, {}, strip.auth.planner)).status).toBe(200);
  expect((await send("POST", `/api/v1/alternatives/${preferred}/decision`, { decision: "approve", comment: "" }, strip.auth.manager)).status).toBe(200);
  const bad = await send("PUT", `/api/v1/alternatives/${preferred}/assignments`, { assignments: [{ parcelId: "DA-01", agentEmail: "analyst@demo.test" }] }, strip.auth.manager);
  expect(bad.status).toBe(422);
  expect(await bad.json()).toMatchObject({ error: { details: [{ path: "assignments.0.agentEmail" }] } });
});

test("an even split mails each agent the CSV of exactly their parcels; re-assignment tells both", async () => {
  const id = await strip.alternative("Split line");
  expect((await send("POST", `/api/v1/alternatives/${id}/submit`, {}, strip.auth.planner)).status).toBe(200);
  expect((await send("POST", `/api/v1/alternatives/${id}/decision`, { decision: "approve", comment: "", split: "even" }, strip.auth.manager)).status).toBe(200);
  // Agents ordered by e-mail: agent2@ before agent@ ("2" < "@"); eight lots in station order, four each.
  const expected = { "agent2@demo.test": ["DA-01", "DA-02", "DA-03", "DA-04"], "agent@demo.test": ["DA-05", "DA-06", "DA-07", "DA-08"] };
  for (const [email, ids] of Object.entries(expected)) {
    const mail = await waitForMail(email, new RegExp(`Your parcels: ${NAME} — 4 assigned to you`));
    const rows = readCsvWithPython(await attachmentText(mail, /\.csv$/));
    expect(rows.map((r) => r.parcel_id)).toEqual(ids);
    for (const r of rows) expect(Number(r.take_area_m2)).toBe(4000);
  }
  const moved = await send("PUT", `/api/v1/alternatives/${id}/assignments`, { assignments: [{ parcelId: "DA-04", agentEmail: "agent@demo.test" }] }, strip.auth.manager);
  expect(await moved.json()).toMatchObject({ changed: 1, notified: 2 });
  const gone = await waitForMail("agent2@demo.test", new RegExp(`Parcels moved from you: ${NAME}`));
  expect(gone.text).toContain("DA-04 (now with Nella Fostrum)");
  expect(readCsvWithPython(await attachmentText(gone, /\.csv$/)).map((r) => r.parcel_id)).toEqual(["DA-01", "DA-02", "DA-03"]);
  const token = await bearer("agent@demo.test");
  const list = (await (await get(`/api/v1/me/parcels?projectId=${strip.projectId}`, token)).json()) as { parcels: { parcelId: string }[] };
  expect(list.parcels.map((p) => p.parcelId)).toEqual(["DA-04", "DA-05", "DA-06", "DA-07", "DA-08"]);
});

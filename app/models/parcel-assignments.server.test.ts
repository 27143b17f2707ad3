import { execFileSync } from "node:child_process";
import { expect, test } from "vitest";
import { createDecisionProject } from "../../tests/factories/decision-project";
import { decideAlternative, submitAlternative } from "./decisions.server";
import { listOutbox } from "./mail-outbox.server";
import { assignParcels } from "./parcel-assignments.server";
import { listProjectCases } from "./parcel-cases.server";

const BASE = "http://takeline.test";
const mailTo = (email: string) => listOutbox(1000).filter((m) => m.to === email);

/** Python's csv module reads the attachment back (an RFC 4180 reader independent of ours). */
function csvRows(csv: string): Record<string, string>[] {
  const script = "import sys, csv, json, io\nprint(json.dumps(list(csv.DictReader(io.StringIO(sys.stdin.read(), newline='')))))";
  return JSON.parse(execFileSync("python3", ["-c", script], { input: csv, encoding: "utf8" }));
}

async function approved(split = false) {
  const f = await createDecisionProject();
  const submitted = submitAlternative(f.alternative, f.project, f.planner, "", BASE).alternative;
  const alternative = decideAlternative(submitted, f.project, f.manager, { decision: "approve", comment: "", ...(split ? { assign: { split: "even" as const } } : {}) }, BASE).alternative;
  return { ...f, alternative };
}

test("assigning parcels mails the agent exactly their parcels: summary in the body, CSV attached, work-list link", async () => {
  const f = await approved();
  expect(mailTo(f.agentA.email)).toEqual([]);
  const out = assignParcels(f.alternative, f.project, { assignments: [{ parcelId: "FL-003", agentEmail: f.agentA.email }, { parcelId: "FL-010", agentEmail: f.agentA.email.toUpperCase() }] }, f.manager, BASE);
  expect(out.changed).toBe(2);
  const [mail] = mailTo(f.agentA.email);
  expect(mail!.subject).toBe(`Your parcels: ${f.project.name} — 2 assigned to you`);
  expect(mail!.text).toContain("New to you (2): FL-003, FL-010");
  expect(mail!.text).toContain(`Your work list: ${BASE}/work?project=${f.project.id}`);
  expect(mail!.text).toContain("not surveys or appraisals");
  const rows = csvRows(mail!.attachments![0]!.content);
  expect(rows.map((r) => [r.parcel_id, r.take_area_m2, r.classification, r.station_range])).toEqual([
    ["FL-003", "4000", "partial", "0+200.000 to 0+300.000"],
    ["FL-010", "4000", "full", "0+900.000 to 1+000.000"],
  ]);
  expect(rows[0]).toMatchObject({ owner: "Owner 3 of Ferrow Lane", address: "3 Ferrow Lane", remainder_area_m2: "16000" });
  expect(mailTo(f.agentB.email)).toEqual([]);
});

test("re-assignment notifies both agents once; repeating it changes nothing and mails no one", async () => {
  const f = await approved(true);
  const before = listOutbox(1000).length;
  assignParcels(f.alternative, f.project, { assignments: [{ parcelId: "FL-002", agentEmail: f.agentB.email }] }, f.manager, BASE);
  const fresh = listOutbox(1000).slice(before);
  expect(fresh.map((m) => m.to).sort()).toEqual([f.agentA.email, f.agentB.email].sort());
  const toA = fresh.find((m) => m.to === f.agentA.email)!;
  expect(toA.subject).toBe(`Parcels moved from you: ${f.project.name}`);
  expect(toA.text).toContain("FL-002 (now with Bram Agent)");
  expect(csvRows(toA.attachments![0]!.content).map((r) => r.parcel_id)).toEqual(["FL-001", "FL-003", "FL-004", "FL-005"]);
  const toB = fresh.find((m) => m.to === f.agentB.email)!;
  expect(csvRows(toB.attachments![0]!.content).map((r) => r.parcel_id)).toEqual(["FL-002", "FL-006", "FL-007", "FL-008", "FL-009", "FL-010"]);

  const again = assignParcels(f.alternative, f.project, { assignments: [{ parcelId: "FL-002", agentEmail: f.agentB.email }] }, f.manager, BASE);
  expect(again).toMatchObject({ changed: 0, mailed: [] });
  expect(listOutbox(1000).length).toBe(before + 2);
});

test("a split of a selection keeps station order among the chosen parcels", async () => {
  const f = await approved();
  assignParcels(f.alternative, f.project, { split: "even", parcelIds: ["FL-009", "FL-002", "FL-005"] }, f.manager, BASE);
  const byParcel = Object.fromEntries(listProjectCases(f.project.id).map((c) => [c.parcelId, c.agentEmail]));
  expect([byParcel["FL-002"], byParcel["FL-005"], byParcel["FL-009"], byParcel["FL-001"]]).toEqual([f.agentA.email, f.agentA.email, f.agentB.email, null]);
});

test("refusals: unknown parcels and non-agents are 422 with each problem, an alternative that is not preferred is 409", async () => {
  const f = await approved();
  const problem = async (fn: () => unknown) => {
    try {
      fn();
    } catch (e) {
      if (e instanceof Response) return { status: e.status, body: (await e.json()) as { error: { details?: { path: string; message: string }[] } } };
      throw e;
    }
    throw new Error("expected a refusal");
  };
  const bad = await problem(() => assignParcels(f.alternative, f.project, { assignments: [{ parcelId: "FL-999", agentEmail: f.agentA.email }, { parcelId: "FL-001", agentEmail: f.analyst.email }] }, f.manager, BASE));
  expect(bad.status).toBe(422);
  expect(bad.body.error.details!.map((d) => d.path)).toEqual(["assignments.0.parcelId", "assignments.1.agentEmail"]);
  const other = { ...f.alternative, id: f.alternative.id + 1000, name: "Not it" };
  expect((await problem(() => assignParcels(other, f.project, { split: "even" }, f.manager, BASE))).status).toBe(409);
  expect(listProjectCases(f.project.id).every((c) => c.agentId === null)).toBe(true);
});

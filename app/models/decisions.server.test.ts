import { eq } from "drizzle-orm";
import { expect, test } from "vitest";
import { alternativeTransitions, preferredAlternatives, takeResults } from "~/db/schema";
import { db } from "~/utils/db.server";
import { createDecisionProject, stripAlternative } from "../../tests/factories/decision-project";
import { listOutbox } from "./mail-outbox.server";
import { createAlternative, findAlternativeForUser, findAlternativeVersion } from "./alternatives.server";
import { decideAlternative, submitAlternative, withdrawSubmission } from "./decisions.server";
import { listProjectCases } from "./parcel-cases.server";
import { findPreferred, listApprovals } from "./preferred-alternatives.server";

const BASE = "http://takeline.test";

/** The 409 (or 403) envelope a refusal throws. */
async function refusal(fn: () => unknown): Promise<{ status: number; code: string; message: string }> {
  try {
    fn();
  } catch (error) {
    if (!(error instanceof Response)) throw error;
    const body = (await error.json()) as { error: { code: string; message: string } };
    return { status: error.status, ...body.error };
  }
  throw new Error("expected a refusal");
}

const mailTo = (email: string) => listOutbox(1000).filter((m) => m.to === email);

test("submit, then approve: states, history with who/version/comment, the approval pinned to version and take result, cases and mail", async () => {
  const f = await createDecisionProject();
  const submitted = submitAlternative(f.alternative, f.project, f.planner, "Ready for a look", BASE).alternative;
  expect(submitted.status).toBe("submitted");
  expect(mailTo(f.manager.email).map((m) => m.subject)).toEqual([`Decision requested: Ferrow straight (${f.project.name})`]);

  const outcome = decideAlternative(submitted, f.project, f.manager, { decision: "approve", comment: "Least land.", version: 1, assign: { split: "even" } }, BASE);
  expect(outcome.alternative.status).toBe("approved");
  expect(outcome.parcels).toBe(10);

  const history = db().select().from(alternativeTransitions).where(eq(alternativeTransitions.alternativeId, f.alternative.id)).all();
  expect(history.map((h) => [h.action, h.fromStatus, h.toStatus, h.version, h.actorId, h.comment])).toEqual([
    ["submit", "draft", "submitted", 1, f.planner.id, "Ready for a look"],
    ["approve", "submitted", "approved", 1, f.manager.id, "Least land."],
  ]);

  const preferred = findPreferred(f.project.id)!;
  const stored = db().select().from(takeResults).where(eq(takeResults.id, preferred.takeResultId!)).get()!;
  expect([preferred.alternativeId, preferred.version, preferred.status, stored.alternativeId]).toEqual([f.alternative.id, 1, "preferred", f.alternative.id]);

  // Closed form: each take is 100 m × 40 m; the 44 m-deep last parcel keeps two 200 m² slivers → full.
  const cases = listProjectCases(f.project.id);
  expect(cases.map((c) => [c.parcelId, c.takeArea, c.classification, c.stationFrom, c.stationTo])).toEqual(
    Array.from({ length: 10 }, (_, i) => [`FL-${String(i + 1).padStart(3, "0")}`, 4000, i === 9 ? "full" : "partial", 100 * i, 100 * (i + 1)]),
  );
  // Even split in station order, agents by e-mail: agent-a gets the first five, agent-b the rest.
  expect(cases.map((c) => c.agentEmail)).toEqual([...Array(5).fill(f.agentA.email), ...Array(5).fill(f.agentB.email)]);
  expect(mailTo(f.agentA.email)).toHaveLength(1);
  expect(mailTo(f.agentB.email)).toHaveLength(1);
  expect(mailTo(f.planner.email).map((m) => m.subject)).toEqual([`Approved: Ferrow straight is the preferred alternative of ${f.project.name}`]);
  expect(mailTo(f.planner.email)[0]!.text).toContain("Least land.");
});

test("two managers deciding at once: the first decision wins, the second gets a 409 and changes nothing", async () => {
  const f = await createDecisionProject();
  const submitted = submitAlternative(f.alternative, f.project, f.planner, "", BASE).alternative;
  // Both managers loaded the page (and the alternative) before either decided.
  const seenByFirst = findAlternativeForUser(submitted.id, f.manager)!;
  const seenBySecond = findAlternativeForUser(submitted.id, f.manager2)!;
  decideAlternative(seenByFirst, f.project, f.manager, { decision: "approve", comment: "Go." }, BASE);
  const lost = await refusal(() => decideAlternative(seenBySecond, f.project, f.manager2, { decision: "return", comment: "Too costly." }, BASE));
  expect(lost).toMatchObject({ status: 409, code: "conflict" });
  expect(lost.message).toMatch(/Someone else acted on this alternative first: it is now preferred/);
  expect(findAlternativeForUser(submitted.id, f.manager)!.status).toBe("approved");
  const decisions = db().select().from(alternativeTransitions).where(eq(alternativeTransitions.alternativeId, submitted.id)).all().filter((t) => t.action !== "submit");
  expect(decisions.map((d) => [d.action, d.actorId])).toEqual([["approve", f.manager.id]]);
  expect(mailTo(f.planner.email).filter((m) => /Returned/.test(m.subject))).toEqual([]);
});

test("a decision on a version the manager did not see is refused", async () => {
  const f = await createDecisionProject();
  const submitted = submitAlternative(f.alternative, f.project, f.planner, "", BASE).alternative;
  const r = await refusal(() => decideAlternative(submitted, f.project, f.manager, { decision: "approve", comment: "", version: 7 }, BASE));
  expect(r).toMatchObject({ status: 409 });
  expect(r.message).toMatch(/version 7/);
});

test("a returned alternative sends its comments to the planner who submitted it; it can be fixed and submitted again", async () => {
  const f = await createDecisionProject();
  const submitted = submitAlternative(f.alternative, f.project, f.planner, "", BASE).alternative;
  const returned = decideAlternative(submitted, f.project, f.manager, { decision: "return", comment: "Widen the easement near FL-004." }, BASE).alternative;
  expect(returned.status).toBe("returned");
  const [mail] = mailTo(f.planner.email);
  expect(mail!.subject).toBe(`Returned with comments: Ferrow straight (${f.project.name})`);
  expect(mail!.text).toMatch(/which you submitted on \d{4}-\d{2}-\d{2}/);
  expect(mail!.text).toContain("Widen the easement near FL-004.");
  expect(findPreferred(f.project.id)).toBeUndefined();
  expect(submitAlternative(returned, f.project, f.planner, "Widened", BASE).alternative.status).toBe("submitted");
});

test("refusals: a planner may not decide (403), a draft cannot be approved or withdrawn (409)", async () => {
  const f = await createDecisionProject();
  expect(await refusal(() => decideAlternative(f.alternative, f.project, f.planner, { decision: "approve", comment: "" }, BASE))).toMatchObject({ status: 403, code: "forbidden" });
  expect(await refusal(() => decideAlternative(f.alternative, f.project, f.manager, { decision: "approve", comment: "" }, BASE))).toMatchObject({ status: 409 });
  expect(await refusal(() => withdrawSubmission(f.alternative, f.planner, ""))).toMatchObject({ status: 409 });
  expect(await refusal(() => submitAlternative(f.alternative, f.project, f.manager, "", BASE))).toMatchObject({ status: 403 });
});

test("a later approval supersedes the earlier one; both stay on record, one preferred, and cases follow the new takes", async () => {
  const f = await createDecisionProject();
  const first = submitAlternative(f.alternative, f.project, f.planner, "", BASE).alternative;
  decideAlternative(first, f.project, f.manager, { decision: "approve", comment: "", assign: { split: "even" } }, BASE);
  // A second line over the west half only: 600 m long, so FL-007…FL-010 are no longer taken (FL-006 ends at the line's end).
  const shorter = createAlternative(f.project.id, stripAlternative({ name: "Ferrow short", alignment: { units: "m", startStation: 0, points: [{ x: 561_000, y: 4_419_000 }, { x: 561_600, y: 4_419_000 }] } }), f.planner.id);
  const second = submitAlternative(shorter, f.project, f.planner, "", BASE).alternative;
  decideAlternative(second, f.project, f.manager, { decision: "approve", comment: "Shorter." }, BASE);

  expect(findAlternativeForUser(first.id, f.manager)!.status).toBe("superseded");
  const approvals = listApprovals(f.project.id);
  expect(approvals.map((a) => [a.alternativeId, a.status])).toEqual([[second.id, "preferred"], [first.id, "superseded"]]);
  expect(approvals[1]!.supersededById).toBe(approvals[0]!.id);
  const all = listProjectCases(f.project.id, { includeReleased: true });
  expect(all.filter((c) => c.state === "open").map((c) => c.parcelId)).toEqual(["FL-001", "FL-002", "FL-003", "FL-004", "FL-005", "FL-006"]);
  expect(all.filter((c) => c.state === "released").map((c) => c.parcelId)).toEqual(["FL-007", "FL-008", "FL-009", "FL-010"]);
  // Agents keep their parcels across the new approval.
  expect(all.find((c) => c.parcelId === "FL-006")!.agentEmail).toBe(f.agentB.email);
  // The database itself refuses a second preferred row for the project.
  expect(() => db().insert(preferredAlternatives).values({ projectId: f.project.id, alternativeId: first.id, version: 1, summary: {} }).run()).toThrow(/UNIQUE/);
  const replaced = db().select().from(alternativeTransitions).where(eq(alternativeTransitions.alternativeId, first.id)).all().at(-1)!;
  expect([replaced.action, replaced.toStatus, replaced.comment]).toEqual(["supersede", "superseded", "Replaced by Ferrow short (version 1)."]);
});

test("the approved inputs stay as they were: version snapshot and stored take result are untouched by later approvals", async () => {
  const f = await createDecisionProject();
  const submitted = submitAlternative(f.alternative, f.project, f.planner, "", BASE).alternative;
  decideAlternative(submitted, f.project, f.manager, { decision: "approve", comment: "" }, BASE);
  const pinned = findPreferred(f.project.id)!;
  const before = db().select().from(takeResults).where(eq(takeResults.id, pinned.takeResultId!)).get();
  expect(findAlternativeVersion(f.alternative.id, 1)?.corridor).toEqual({ left: 20, right: 20 });
  expect(db().select().from(takeResults).where(eq(takeResults.id, pinned.takeResultId!)).get()).toEqual(before);
});

import { eq } from "drizzle-orm";
import { expect, test } from "vitest";
import { alternativeTransitions, takeResults } from "~/db/schema";
import { db } from "~/utils/db.server";
import { createDecisionProject } from "../../tests/factories/decision-project";
import { saveAlternativeChecked } from "./alternative-service.server";
import { findAlternativeForUser, findAlternativeVersion } from "./alternatives.server";
import { decideAlternative, submitAlternative } from "./decisions.server";
import { listProjectCases } from "./parcel-cases.server";
import { findPreferred, listApprovals } from "./preferred-alternatives.server";

const BASE = "http://takeline.test";

async function approvedProject() {
  const f = await createDecisionProject();
  const submitted = submitAlternative(f.alternative, f.project, f.planner, "", BASE).alternative;
  const approved = decideAlternative(submitted, f.project, f.manager, { decision: "approve", comment: "", assign: { split: "even" } }, BASE).alternative;
  return { ...f, approved };
}

test("editing an approved alternative starts a new draft version; the approved version stays frozen and preferred", async () => {
  const f = await approvedProject();
  const pinned = findPreferred(f.project.id)!;
  const storedBefore = db().select().from(takeResults).where(eq(takeResults.id, pinned.takeResultId!)).get();
  const casesBefore = listProjectCases(f.project.id);

  const outcome = saveAlternativeChecked(f.approved, f.project, { version: 1, corridor: { left: 25, right: 25 } }, f.planner.id);
  expect(outcome.kind).toBe("saved");
  if (outcome.kind !== "saved") return;
  expect([outcome.alternative.version, outcome.alternative.status]).toEqual([2, "draft"]);
  // The new draft's figures (closed form): 100 m × 50 m per parcel, but all 44 m of the shallow last one.
  expect(outcome.summary!.takeArea).toBeCloseTo(9 * 5000 + 4400, 6);

  // Frozen: version 1's inputs, its stored take result and the preferred record pointing at it.
  expect(findAlternativeVersion(f.approved.id, 1)?.corridor).toEqual({ left: 20, right: 20 });
  expect(db().select().from(takeResults).where(eq(takeResults.id, pinned.takeResultId!)).get()).toEqual(storedBefore);
  expect(findPreferred(f.project.id)).toMatchObject({ id: pinned.id, alternativeId: f.approved.id, version: 1, status: "preferred" });
  expect(listProjectCases(f.project.id)).toEqual(casesBefore);
  const last = db().select().from(alternativeTransitions).where(eq(alternativeTransitions.alternativeId, f.approved.id)).all().at(-1)!;
  expect([last.action, last.fromStatus, last.toStatus, last.version]).toEqual(["edit", "approved", "draft", 2]);
  expect(last.comment).toBe("Version 1 stays as approved; the edit starts version 2.");
});

test("approving the new version replaces version 1 as preferred; cases get the new figures and keep their agents", async () => {
  const f = await approvedProject();
  const saved = saveAlternativeChecked(f.approved, f.project, { version: 1, corridor: { left: 25, right: 25 } }, f.planner.id);
  if (saved.kind !== "saved") throw new Error("expected a save");
  const submitted = submitAlternative(saved.alternative, f.project, f.planner, "", BASE).alternative;
  decideAlternative(submitted, f.project, f.manager, { decision: "approve", comment: "" }, BASE);
  expect(listApprovals(f.project.id).map((a) => [a.version, a.status])).toEqual([[2, "preferred"], [1, "superseded"]]);
  const cases = listProjectCases(f.project.id);
  expect(cases.map((c) => c.takeArea)).toEqual([...Array(9).fill(5000), 4400]);
  expect(cases[0]!.agentEmail).toBe(f.agentA.email);
});

test("an alternative awaiting a decision cannot be edited: 409, nothing saved", async () => {
  const f = await createDecisionProject();
  const submitted = submitAlternative(f.alternative, f.project, f.planner, "", BASE).alternative;
  let status = 0;
  try {
    saveAlternativeChecked(submitted, f.project, { version: 1, name: "Renamed" }, f.planner.id);
  } catch (error) {
    if (!(error instanceof Response)) throw error;
    status = error.status;
    expect(((await error.json()) as { error: { message: string } }).error.message).toMatch(/withdraw the submission/);
  }
  expect(status).toBe(409);
  expect(findAlternativeForUser(submitted.id, f.planner)).toMatchObject({ name: "Ferrow straight", version: 1, status: "submitted" });
});

test("a save started before the alternative was submitted is refused inside the save, not applied to the submitted version", async () => {
  const f = await createDecisionProject();
  const seenByEditor = findAlternativeForUser(f.alternative.id, f.planner)!;
  submitAlternative(f.alternative, f.project, f.planner, "", BASE);
  let status = 0;
  try {
    saveAlternativeChecked(seenByEditor, f.project, { version: 1, name: "Late edit" }, f.planner.id);
  } catch (error) {
    if (!(error instanceof Response)) throw error;
    status = error.status;
  }
  expect(status).toBe(409);
  expect(findAlternativeForUser(f.alternative.id, f.planner)).toMatchObject({ name: "Ferrow straight", version: 1, status: "submitted" });
});

test("editing a returned alternative makes it a draft again", async () => {
  const f = await createDecisionProject();
  const submitted = submitAlternative(f.alternative, f.project, f.planner, "", BASE).alternative;
  const returned = decideAlternative(submitted, f.project, f.manager, { decision: "return", comment: "Narrower." }, BASE).alternative;
  const saved = saveAlternativeChecked(returned, f.project, { version: 1, corridor: { left: 15, right: 15 } }, f.planner.id);
  expect(saved.kind === "saved" && [saved.alternative.status, saved.alternative.version]).toEqual(["draft", 2]);
});

import { expect, test } from "vitest";
import { createDecisionProject, stripAlternative } from "../../tests/factories/decision-project";
import { readAcquisitionProgress } from "./acquisition-progress.server";
import { createAlternative } from "./alternatives.server";
import { decideAlternative, submitAlternative } from "./decisions.server";
import { updateAgentCase } from "./parcel-case-updates.server";
import { findAgentCase, listAgentWork, listCaseEvents } from "./work-list.server";

const BASE = "http://takeline.test";

async function working() {
  const f = await createDecisionProject();
  const submitted = submitAlternative(f.alternative, f.project, f.planner, "", BASE).alternative;
  decideAlternative(submitted, f.project, f.manager, { decision: "approve", comment: "", assign: { split: "even" } }, BASE);
  const mine = listAgentWork(f.agentA.id);
  return { ...f, mine };
}

async function refusedWith(fn: () => unknown): Promise<number> {
  try {
    fn();
  } catch (e) {
    if (e instanceof Response) return e.status;
    throw e;
  }
  return 200;
}

test("an agent sees only their own parcels, and another agent's parcel is not found", async () => {
  const f = await working();
  expect(f.mine.map((w) => w.c.parcelId)).toEqual(["FL-001", "FL-002", "FL-003", "FL-004", "FL-005"]);
  const theirs = listAgentWork(f.agentB.id)[0]!;
  expect(findAgentCase(theirs.c.id, f.agentA.id)).toBeUndefined();
  expect(await refusedWith(() => updateAgentCase(theirs.c.id, f.agentA.id, { note: "mine?" }))).toBe(404);
});

test("status moves with a note are recorded in the history; the rules refuse acquiring before agreement", async () => {
  const f = await working();
  const id = f.mine[0]!.c.id;
  updateAgentCase(id, f.agentA.id, { status: "owner-contacted", note: "Met Owner 1 at the farm gate." });
  expect(await refusedWith(() => updateAgentCase(id, f.agentA.id, { status: "acquired" }))).toBe(409);
  updateAgentCase(id, f.agentA.id, { status: "offer-made" });
  updateAgentCase(id, f.agentA.id, { status: "agreed" });
  const done = updateAgentCase(id, f.agentA.id, { status: "acquired" });
  expect(done.c.status).toBe("acquired");
  expect(await refusedWith(() => updateAgentCase(id, f.agentA.id, { status: "escalated" }))).toBe(409);
  // Notes can still be added to an acquired parcel.
  expect(updateAgentCase(id, f.agentA.id, { note: "Deed recorded." }).lastNote).toBe("Deed recorded.");
  const history = listCaseEvents(id).reverse().map((e) => [e.kind, e.fromValue, e.toValue, e.note]);
  expect(history).toEqual([
    ["opened", null, null, ""],
    ["assigned", null, f.agentA.email, ""],
    ["status", "not-started", "owner-contacted", ""],
    ["note", null, null, "Met Owner 1 at the farm gate."],
    ["status", "owner-contacted", "offer-made", ""],
    ["status", "offer-made", "agreed", ""],
    ["status", "agreed", "acquired", ""],
    ["note", null, null, "Deed recorded."],
  ]);
});

test("the manager's progress: parcels by status and the estimated cost committed (agreed or acquired)", async () => {
  const f = await working();
  const [a, b, c] = f.mine;
  updateAgentCase(a!.c.id, f.agentA.id, { status: "agreed" });
  updateAgentCase(b!.c.id, f.agentA.id, { status: "agreed" });
  updateAgentCase(b!.c.id, f.agentA.id, { status: "acquired" });
  updateAgentCase(c!.c.id, f.agentA.id, { status: "escalated" });
  const p = readAcquisitionProgress(f.project.id);
  expect(p.parcels).toBe(10);
  expect([p.byStatus.agreed.parcels, p.byStatus.acquired.parcels, p.byStatus.escalated.parcels, p.byStatus["not-started"].parcels]).toEqual([1, 1, 1, 7]);
  expect(p.committedCost).toBeCloseTo(a!.c.estimatedCost + b!.c.estimatedCost, 6);
  expect(p.estimatedCost).toBeCloseTo(f.mine.concat(listAgentWork(f.agentB.id)).reduce((s, w) => s + w.c.estimatedCost, 0), 6);
  expect(p.byAgent.map((x) => [x.email, x.parcels, x.acquired])).toEqual([[f.agentA.email, 5, 1], [f.agentB.email, 5, 0]]);
});

test("a parcel the new preferred alternative no longer takes is released: off the list, no more changes", async () => {
  const f = await working();
  const short = createAlternative(f.project.id, stripAlternative({ name: "Short", alignment: { units: "m", startStation: 0, points: [{ x: 561_000, y: 4_419_000 }, { x: 561_300, y: 4_419_000 }] } }), f.planner.id);
  decideAlternative(submitAlternative(short, f.project, f.planner, "", BASE).alternative, f.project, f.manager, { decision: "approve", comment: "" }, BASE);
  expect(listAgentWork(f.agentA.id).map((w) => w.c.parcelId)).toEqual(["FL-001", "FL-002", "FL-003"]);
  const released = f.mine[4]!.c.id;
  expect(findAgentCase(released, f.agentA.id)!.c.state).toBe("released");
  expect(await refusedWith(() => updateAgentCase(released, f.agentA.id, { note: "still here?" }))).toBe(409);
  expect(listAgentWork(f.agentA.id, { includeReleased: true })).toHaveLength(5);
});

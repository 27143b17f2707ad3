import { expect, test } from "vitest";
import { ALTERNATIVE_STATES, LIFECYCLE_ACTIONS, availableActions, planTransition, rolesFor, statesAllowing, type LifecycleActor } from "./alternative-lifecycle";

const ACTORS: LifecycleActor[] = ["admin", "planner", "manager", "agent", "analyst", "system"];

// Written out by hand from issue 6 ("Lifecycle of an alternative"), not derived from the code:
// one line per action and state, one word per actor in the order of ACTORS.
// A state name = allowed, leading there; 403 = that role may never do it; 409 = not from this state.
const MATRIX = `
submit    draft       403 submitted 403 403 403 403
submit    submitted   403 409       403 403 403 403
submit    approved    403 409       403 403 403 403
submit    returned    403 submitted 403 403 403 403
submit    superseded  403 409       403 403 403 403
withdraw  draft       403 409       403 403 403 403
withdraw  submitted   403 draft     403 403 403 403
withdraw  approved    403 409       403 403 403 403
withdraw  returned    403 409       403 403 403 403
withdraw  superseded  403 409       403 403 403 403
approve   draft       403 403 409      403 403 403
approve   submitted   403 403 approved 403 403 403
approve   approved    403 403 409      403 403 403
approve   returned    403 403 409      403 403 403
approve   superseded  403 403 409      403 403 403
return    draft       403 403 409      403 403 403
return    submitted   403 403 returned 403 403 403
return    approved    403 403 409      403 403 403
return    returned    403 403 409      403 403 403
return    superseded  403 403 409      403 403 403
edit      draft       403 draft 403 403 403 403
edit      submitted   403 409   403 403 403 403
edit      approved    403 draft 403 403 403 403
edit      returned    403 draft 403 403 403 403
edit      superseded  403 draft 403 403 403 403
supersede draft       403 403 403 403 403 409
supersede submitted   403 403 403 403 403 409
supersede approved    403 403 403 403 403 superseded
supersede returned    403 403 403 403 403 409
supersede superseded  403 403 403 403 403 409
`;

const rows = MATRIX.trim()
  .split("\n")
  .map((line) => line.trim().split(/\s+/));

test("the matrix covers every action from every state, for every actor", () => {
  const covered = new Set(rows.map(([action, state]) => `${action} ${state}`));
  for (const action of LIFECYCLE_ACTIONS) for (const state of ALTERNATIVE_STATES) expect(covered.has(`${action} ${state}`), `${action} ${state}`).toBe(true);
  expect(rows).toHaveLength(LIFECYCLE_ACTIONS.length * ALTERNATIVE_STATES.length);
  for (const row of rows) expect(row).toHaveLength(2 + ACTORS.length);
});

for (const [action, state, ...outcomes] of rows) {
  test(`${action} from ${state}: ${outcomes.join(" ")}`, () => {
    ACTORS.forEach((actor, i) => {
      const plan = planTransition(state as never, action as never, actor);
      const seen = plan.ok ? plan.to : plan.refusal === "role" ? "403" : "409";
      expect(seen, `${actor} ${action} from ${state}`).toBe(outcomes[i]);
    });
  });
}

test("editing an approved or replaced version starts a new version; editing a draft does not", () => {
  const edit = (from: (typeof ALTERNATIVE_STATES)[number]) => planTransition(from, "edit", "planner");
  expect(edit("approved")).toMatchObject({ ok: true, startsNewVersion: true });
  expect(edit("superseded")).toMatchObject({ ok: true, startsNewVersion: true });
  expect(edit("draft")).toMatchObject({ ok: true, startsNewVersion: false });
  expect(edit("returned")).toMatchObject({ ok: true, startsNewVersion: false });
});

test("refusals say what to do in plain words", () => {
  const plan = planTransition("submitted", "edit", "planner");
  expect(plan.ok).toBe(false);
  if (!plan.ok) expect(plan.message).toMatch(/withdraw the submission/);
  const role = planTransition("submitted", "approve", "planner");
  if (!role.ok && role.refusal === "role") expect(role.neededActors).toEqual(["manager"]);
  else throw new Error("a planner must not approve");
});

test("the guarded states and roles agree with the matrix", () => {
  expect(statesAllowing("approve")).toEqual(["submitted"]);
  expect(statesAllowing("submit")).toEqual(["draft", "returned"]);
  expect(rolesFor("supersede")).toEqual([]);
  expect(rolesFor("return")).toEqual(["manager"]);
  expect(availableActions("submitted", "manager")).toEqual(["approve", "return"]);
  expect(availableActions("returned", "planner")).toEqual(["submit"]);
});

test("the access table names the same roles as the lifecycle", async () => {
  const { ACCESS } = await import("~/utils/access");
  expect([...ACCESS.submitAlternatives]).toEqual(rolesFor("submit"));
  expect([...ACCESS.submitAlternatives]).toEqual(rolesFor("withdraw"));
  expect([...ACCESS.decideAlternatives]).toEqual(rolesFor("approve"));
  expect([...ACCESS.decideAlternatives]).toEqual(rolesFor("return"));
  expect([...ACCESS.editAlternatives]).toEqual(rolesFor("edit"));
});

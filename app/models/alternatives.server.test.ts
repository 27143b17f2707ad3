import { expect, test } from "vitest";
import { createTestAlternative } from "../../tests/factories/alternatives";
import { createUser } from "../../tests/factories/users";
import { findAlternativeForUser, findAlternativeVersion, listAlternatives, updateAlternative } from "./alternatives.server";
import { createProject } from "./projects.server";

test("a new alternative is version 1, draft, with its own colour", async () => {
  const planner = await createUser({ role: "planner" });
  const project = createProject({ name: "Mill Run", description: "", units: "m" }, planner);
  const a = createTestAlternative(project.id, planner.id, { name: "North" });
  const b = createTestAlternative(project.id, planner.id, { name: "South" });
  expect([a.version, a.status]).toEqual([1, "draft"]);
  expect(a.colour).not.toBe(b.colour);
  expect(listAlternatives(project.id).map((x) => x.name)).toEqual(["North", "South"]);
});

test("a save from the current version wins and keeps the old version on record", async () => {
  const planner = await createUser({ role: "planner" });
  const project = createProject({ name: "Ash Ford", description: "", units: "m" }, planner);
  const a = createTestAlternative(project.id, planner.id);
  const outcome = updateAlternative(a.id, 1, { corridor: { left: 25, right: 25 } }, planner.id);
  expect(outcome.kind).toBe("saved");
  if (outcome.kind !== "saved") return;
  expect(outcome.alternative.version).toBe(2);
  expect(outcome.alternative.corridor).toEqual({ left: 25, right: 25 });
  expect(findAlternativeVersion(a.id, 1)?.corridor).toEqual({ left: 20, right: 20 });
});

test("a second save from the same version is a conflict and changes nothing", async () => {
  const planner = await createUser({ role: "planner" });
  const project = createProject({ name: "Brent Hill", description: "", units: "m" }, planner);
  const a = createTestAlternative(project.id, planner.id);
  updateAlternative(a.id, 1, { name: "First writer" }, planner.id);
  const second = updateAlternative(a.id, 1, { name: "Second writer" }, planner.id);
  expect(second.kind).toBe("conflict");
  if (second.kind !== "conflict") return;
  expect(second.current).toMatchObject({ name: "First writer", version: 2 });
});

test("only members of the project (and admins) find an alternative", async () => {
  const planner = await createUser({ role: "planner" });
  const outsider = await createUser({ role: "analyst" });
  const admin = await createUser({ role: "admin" });
  const project = createProject({ name: "Coldharbour", description: "", units: "m" }, planner);
  const a = createTestAlternative(project.id, planner.id);
  expect(findAlternativeForUser(a.id, outsider)).toBeUndefined();
  expect(findAlternativeForUser(a.id, admin)?.id).toBe(a.id);
  expect(findAlternativeForUser(a.id, planner)?.id).toBe(a.id);
});

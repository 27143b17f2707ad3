import { expect, test } from "vitest";
import { createProject, findProjectForUser, listProjectMembers, listProjectsForUser, upsertProjectMember } from "./projects.server";
import { createUser } from "../../tests/factories/users";

test("a project's creator is its first member, with their role", async () => {
  const planner = await createUser({ role: "planner" });
  const project = createProject({ name: "Ridge Road", description: "", units: "usft" }, planner);
  expect(listProjectMembers(project.id)).toEqual([expect.objectContaining({ userId: planner.id, role: "planner" })]);
});

test("users see only the projects they are members of; admins see all", async () => {
  const planner = await createUser({ role: "planner" });
  const outsider = await createUser({ role: "analyst" });
  const admin = await createUser({ role: "admin" });
  const project = createProject({ name: "Ford Lane", description: "", units: "m" }, planner);
  expect(findProjectForUser(project.id, outsider)).toBeUndefined();
  expect(listProjectsForUser(outsider)).toEqual([]);
  expect(findProjectForUser(project.id, admin)?.name).toBe("Ford Lane");
  upsertProjectMember(project.id, outsider.id, "analyst");
  expect(listProjectsForUser(outsider).map((p) => p.id)).toEqual([project.id]);
});

import { hashPassword } from "~/utils/password.server";
import { db } from "~/utils/db.server";
import { recordAuditEvent } from "./audit.server";
import { seedDemoAlternatives } from "./demo-alternatives.server";
import { seedDemoFabric } from "./demo-fabric.server";
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from "./demo-accounts";
import { createProject, findProjectByName, upsertProjectMember } from "./projects.server";
import { findUserByEmail, insertUser, setUserPassword, updateUserProfile } from "./users.server";

/** The invented scenario: a bypass around the town of Quillmere, Ostrand County. */
export const DEMO_PROJECT = {
  name: "Quillmere Eastern Bypass",
  description: "Two-lane rural bypass east of Quillmere, Ostrand County (an invented place): compare the river-side and ridge-side corridors.",
  units: "m" as const,
};

/** Creates or refreshes the demo users, project and parcel fabric. Safe to run any number of times. */
export async function seedDemo(): Promise<{ users: number; projectId: number; features: number }> {
  const seeded = await seedDemoAccounts();
  const features = await seedDemoFabric(DEMO_PROJECT.name, seeded.plannerId);
  seedDemoAlternatives(DEMO_PROJECT.name, seeded.plannerId);
  return { users: seeded.users, projectId: seeded.projectId, features };
}

async function seedDemoAccounts() {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  return db().transaction((tx) => {
    const ids = DEMO_ACCOUNTS.map((account) => {
      const existing = findUserByEmail(account.email, tx);
      if (!existing) return insertUser({ ...account, passwordHash, status: "active" }, tx).id;
      updateUserProfile(existing.id, { name: account.name, role: account.role }, tx);
      setUserPassword(existing.id, passwordHash, tx);
      return existing.id;
    });
    const planner = DEMO_ACCOUNTS.findIndex((a) => a.role === "planner");
    const plannerId = ids[planner]!;
    const project = findProjectByName(DEMO_PROJECT.name, tx) ?? createProject(DEMO_PROJECT, { id: plannerId, role: "planner" }, tx);
    DEMO_ACCOUNTS.forEach((account, i) => upsertProjectMember(project.id, ids[i]!, account.role, tx));
    recordAuditEvent({ actorId: null, projectId: project.id, action: "demo.seeded", subject: DEMO_PROJECT.name }, tx);
    return { users: ids.length, projectId: project.id, plannerId };
  });
}

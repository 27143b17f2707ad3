import { and, asc, eq } from "drizzle-orm";
import { resolveTakeRules } from "~/calculations/take-rules";
import type { LengthUnit } from "~/geometry/units";
import { projectMembers, projects, users } from "~/db/schema";
import { db, type Db } from "~/utils/db.server";
import { recordAuditEvent } from "./audit.server";
import type { Role } from "~/utils/roles";

export type Project = typeof projects.$inferSelect;
export type ProjectInput = Pick<Project, "name" | "description" | "units"> & Partial<Pick<Project, "crs" | "scaleFactor">>;

/** Creates a project with its creator as first member, in one transaction. */
export function createProject(input: ProjectInput, creator: { id: number; role: Role }, tx: Db = db()): Project {
  return tx.transaction((t) => {
    const project = t.insert(projects).values({ ...input, createdBy: creator.id }).returning().get();
    t.insert(projectMembers).values({ projectId: project.id, userId: creator.id, role: creator.role }).run();
    return project;
  });
}

/** Creates a project and records `project.created` in the same transaction (the API's path). */
export function createProjectAudited(input: ProjectInput, creator: { id: number; role: Role }, tx: Db = db()): Project {
  return tx.transaction((t) => {
    const project = createProject(input, creator, t);
    recordAuditEvent({ actorId: creator.id, projectId: project.id, action: "project.created", subject: project.name }, t);
    return project;
  });
}

/** Projects the user is a member of; admins see every project. */
export function listProjectsForUser(user: { id: number; role: Role }, tx: Db = db()): Project[] {
  if (user.role === "admin") return tx.select().from(projects).orderBy(asc(projects.name)).all();
  return tx
    .select({ project: projects })
    .from(projects)
    .innerJoin(projectMembers, and(eq(projectMembers.projectId, projects.id), eq(projectMembers.userId, user.id)))
    .orderBy(asc(projects.name))
    .all()
    .map((r) => r.project);
}

/** The project if the user may see it (member, or admin), scoped in the query itself. */
export function findProjectForUser(projectId: number, user: { id: number; role: Role }, tx: Db = db()): Project | undefined {
  if (user.role === "admin") return tx.select().from(projects).where(eq(projects.id, projectId)).get();
  return tx
    .select({ project: projects })
    .from(projects)
    .innerJoin(projectMembers, and(eq(projectMembers.projectId, projects.id), eq(projectMembers.userId, user.id)))
    .where(eq(projects.id, projectId))
    .get()?.project;
}

export function findProjectByName(name: string, tx: Db = db()): Project | undefined {
  return tx.select().from(projects).where(eq(projects.name, name)).get();
}

export function listProjectMembers(projectId: number, tx: Db = db()) {
  return tx
    .select({ userId: users.id, email: users.email, name: users.name, role: projectMembers.role })
    .from(projectMembers)
    .innerJoin(users, eq(users.id, projectMembers.userId))
    .where(eq(projectMembers.projectId, projectId))
    .orderBy(asc(users.name))
    .all();
}

/** Adds a member or changes their project role. */
export function upsertProjectMember(projectId: number, userId: number, role: Role, tx: Db = db()): void {
  tx.insert(projectMembers)
    .values({ projectId, userId, role })
    .onConflictDoUpdate({ target: [projectMembers.projectId, projectMembers.userId], set: { role } })
    .run();
}

export function removeProjectMember(projectId: number, userId: number, tx: Db = db()): void {
  tx.delete(projectMembers).where(and(eq(projectMembers.projectId, projectId), eq(projectMembers.userId, userId))).run();
}

/**
 * The project as the API shows it: `takeRules` are the project's own (areas and per-area rates in
 * its units), `resolvedTakeRules` the rules in effect (defaults, then the project's).
 */
export function toProjectJson(p: Project) {
  return {
    id: p.id, name: p.name, description: p.description, units: p.units, crs: p.crs, scaleFactor: p.scaleFactor,
    takeRules: p.takeRules ?? {},
    resolvedTakeRules: resolveTakeRules(p.units as LengthUnit, p.takeRules),
    createdBy: p.createdBy, createdAt: p.createdAt.toISOString(),
  };
}

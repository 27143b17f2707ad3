import type { Role } from "./roles";

/**
 * Who may open each area of the app. Routes pass these to requireUser; the navigation and the
 * role × page test read the same table, so the three can never disagree.
 */
export const ACCESS = {
  projects: ["admin", "planner", "manager", "analyst"],
  createProject: ["planner"],
  // A project's take and cost rules (PATCH /api/v1/projects/:id and the project page's rules card).
  editProjectRules: ["planner", "admin"],
  editAlternatives: ["planner"],
  takesApi: ["admin", "planner", "manager", "analyst"],
  workList: ["agent"],
  // Issue 6: the decision pages, and who may act there (the lifecycle's rolesFor() agrees, tested).
  decisions: ["planner", "manager", "analyst"],
  submitAlternatives: ["planner"],
  decideAlternatives: ["manager"],
  assignParcels: ["manager"],
  manageUsers: ["admin"],
  devMail: ["admin"],
  calculator: ["admin", "planner", "manager", "agent", "analyst"],
  account: ["admin", "planner", "manager", "agent", "analyst"],
} as const satisfies Record<string, readonly Role[]>;

export type Area = keyof typeof ACCESS;

export function mayOpen(role: Role, area: Area): boolean {
  return (ACCESS[area] as readonly Role[]).includes(role);
}

/** Where each role lands after signing in. */
export const HOME_BY_ROLE: Record<Role, string> = {
  admin: "/admin/users",
  planner: "/projects",
  manager: "/projects",
  analyst: "/projects",
  agent: "/work",
};

/** The roles a Takeline user can hold; the API spells them exactly like this. */
export const ROLES = ["admin", "planner", "manager", "agent", "analyst"] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: "Administrator",
  planner: "Planner",
  manager: "Manager",
  agent: "Land agent",
  analyst: "Analyst",
};

export function isRole(value: unknown): value is Role {
  return typeof value === "string" && (ROLES as readonly string[]).includes(value);
}

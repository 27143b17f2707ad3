import type { Role } from "~/utils/roles";

/** Demo mode only: one account per role, all members of the demo project (issue 2 contract). */
export const DEMO_PASSWORD = "takeline-demo";

export const DEMO_ACCOUNTS: { email: string; name: string; role: Role }[] = [
  { email: "admin@demo.test", name: "Orla Venmick", role: "admin" },
  { email: "planner@demo.test", name: "Tamsin Quorral", role: "planner" },
  { email: "manager@demo.test", name: "Bedric Halvane", role: "manager" },
  { email: "agent@demo.test", name: "Nella Fostrum", role: "agent" },
  { email: "agent2@demo.test", name: "Corvin Ashlet", role: "agent" },
  { email: "analyst@demo.test", name: "Iselde Marrow", role: "analyst" },
];

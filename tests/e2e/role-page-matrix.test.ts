import { beforeAll, expect, test } from "vitest";
import { get, sessionCookie } from "./support/http";

// Written out by hand on purpose: this is the product's access policy, checked against the running app.
// 200 = may open, 403 = refused with the roles needed.
const PAGES = ["/projects", "/projects/new", "/decisions", "/work", "/calculator", "/admin/users", "/dev/mail", "/account"] as const;
const MATRIX: Record<string, Record<(typeof PAGES)[number], 200 | 403>> = {
  "admin@demo.test": { "/projects": 200, "/projects/new": 403, "/decisions": 403, "/work": 403, "/calculator": 200, "/admin/users": 200, "/dev/mail": 200, "/account": 200 },
  "planner@demo.test": { "/projects": 200, "/projects/new": 200, "/decisions": 200, "/work": 403, "/calculator": 200, "/admin/users": 403, "/dev/mail": 403, "/account": 200 },
  "manager@demo.test": { "/projects": 200, "/projects/new": 403, "/decisions": 200, "/work": 403, "/calculator": 200, "/admin/users": 403, "/dev/mail": 403, "/account": 200 },
  "agent@demo.test": { "/projects": 403, "/projects/new": 403, "/decisions": 403, "/work": 200, "/calculator": 200, "/admin/users": 403, "/dev/mail": 403, "/account": 200 },
  "analyst@demo.test": { "/projects": 200, "/projects/new": 403, "/decisions": 200, "/work": 403, "/calculator": 200, "/admin/users": 403, "/dev/mail": 403, "/account": 200 },
};

const cookies: Record<string, string> = {};
beforeAll(async () => {
  for (const email of Object.keys(MATRIX)) cookies[email] = await sessionCookie(email);
});

for (const [email, row] of Object.entries(MATRIX)) {
  test(`${email} gets exactly the pages of its role`, async () => {
    const seen: Record<string, number> = {};
    for (const path of PAGES) seen[path] = (await get(path, { cookie: cookies[email]! })).status;
    expect(seen).toEqual(row);
  });
}

test("signed out, every page sends you to sign in", async () => {
  for (const path of PAGES) {
    const res = await get(path);
    expect(res.status, path).toBe(302);
    expect(res.headers.get("location")).toBe(`/sign-in?redirectTo=${encodeURIComponent(path)}`);
  }
});

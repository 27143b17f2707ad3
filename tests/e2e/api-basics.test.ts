import { expect, inject, test } from "vitest";
import { get, postJson, sessionCookie } from "./support/http";
import { waitForMail } from "./support/mail";

async function token(email: string): Promise<string> {
  const res = await postJson("/api/v1/tokens", { email, password: "takeline-demo", label: "e2e" });
  expect(res.status).toBe(201);
  const body = (await res.json()) as { token: string };
  return body.token;
}

test("a token from POST /api/v1/tokens identifies its user on GET /api/v1/me", async () => {
  const t = await token("manager@demo.test");
  const me = await get("/api/v1/me", { authorization: `Bearer ${t}` });
  expect(me.status).toBe(200);
  expect(await me.json()).toEqual({ id: expect.any(Number), email: "manager@demo.test", name: "Bedric Halvane", role: "manager" });
});

test("the session cookie works on the API too", async () => {
  const me = await get("/api/v1/me", { cookie: await sessionCookie("agent2@demo.test") });
  expect(await me.json()).toMatchObject({ email: "agent2@demo.test", role: "agent" });
});

test("wrong credentials, no credentials and an unknown token are 401 in the error envelope", async () => {
  const wrong = await postJson("/api/v1/tokens", { email: "planner@demo.test", password: "nope" });
  expect(wrong.status).toBe(401);
  expect(await wrong.json()).toEqual({ error: { code: "unauthorized", message: expect.any(String) } });
  const none = await get("/api/v1/me");
  expect(none.status).toBe(401);
  const unknown = await get("/api/v1/me", { authorization: "Bearer tl_made-up" });
  expect(unknown.status).toBe(401);
  expect(((await unknown.json()) as { error: { code: string } }).error.code).toBe("unauthorized");
});

test("malformed JSON is 400, invalid fields 422 with details, an oversized body 413", async () => {
  const bad = await postJson("/api/v1/tokens", "{not json");
  expect(bad.status).toBe(400);
  expect(((await bad.json()) as { error: { code: string } }).error.code).toBe("bad_request");
  const invalid = await postJson("/api/v1/tokens", { email: "not-an-email", password: "" });
  expect(invalid.status).toBe(422);
  const body = (await invalid.json()) as { error: { details: { path: string }[] } };
  expect(body.error.details.map((d) => d.path).sort()).toEqual(["email", "password"]);
  const huge = await postJson("/api/v1/tokens", { email: "a@b.test", password: "x".repeat(1_100_000) });
  expect(huge.status).toBe(413);
});

test("only an admin may invite: a planner gets 403 naming the role, the admin 201 and the mail goes out", async () => {
  const planner = await token("planner@demo.test");
  const refused = await postJson("/api/v1/invitations", { email: "ostwin.pell@demo.test", role: "analyst" }, { authorization: `Bearer ${planner}` });
  expect(refused.status).toBe(403);
  expect(await refused.json()).toMatchObject({ error: { code: "forbidden", details: { neededRoles: ["admin"], yourRole: "planner" } } });

  const admin = await token("admin@demo.test");
  const ok = await postJson("/api/v1/invitations", { email: "ostwin.pell@demo.test", role: "analyst" }, { authorization: `Bearer ${admin}` });
  expect(ok.status).toBe(201);
  await waitForMail("ostwin.pell@demo.test", /invited/i);
  const again = await postJson("/api/v1/invitations", { email: "planner@demo.test", role: "analyst" }, { authorization: `Bearer ${admin}` });
  expect(again.status).toBe(409);
});

test("unknown API paths answer 404 in JSON, never HTML", async () => {
  const res = await get("/api/v1/no-such-thing");
  expect(res.status).toBe(404);
  expect(res.headers.get("content-type")).toContain("application/json");
  expect(await res.json()).toMatchObject({ error: { code: "not_found" } });
});

test("a form over its size limit is refused with 413 and a message, and nothing is done", async () => {
  const res = await fetch(`${inject("baseUrl")}/forgot-password`, {
    method: "POST",
    body: new URLSearchParams({ email: "planner@demo.test", filler: "x".repeat(70 * 1024) }),
    redirect: "manual",
  });
  expect(res.status).toBe(413);
  expect(await res.text()).toContain("larger than 64 KB");
  await expect(waitForMail("planner@demo.test", /reset/i, 1500)).rejects.toThrow(/no mail/);
});

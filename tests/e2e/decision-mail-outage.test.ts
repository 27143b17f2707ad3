import { mkdtempSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import Database from "better-sqlite3";
import { afterAll, beforeAll, expect, test } from "vitest";
import { startFakeSmtp, type FakeSmtp } from "~/utils/fake-smtp.server";
import { readCaughtMail } from "~/utils/mail-inbox.server";
import { freePort, startOwnServer, type OwnServer } from "./support/own-server";

// The app runs as in production with SMTP_URL set, but the port it points at has no server until the
// test opens one: a mail server that is down when the manager approves.
let server: OwnServer;
let smtpPort: number;
let smtp: FakeSmtp | undefined;
const mailDir = mkdtempSync(join(tmpdir(), "takeline-outage-mail-"));

beforeAll(async () => {
  smtpPort = await freePort();
  server = await startOwnServer({ SMTP_URL: `smtp://127.0.0.1:${smtpPort}` });
});
afterAll(async () => {
  await smtp?.close();
  await server?.stop();
});

async function call(method: string, path: string, token: string | null, body?: unknown) {
  const res = await fetch(`${server.baseUrl}${path}`, { method, headers: { "content-type": "application/json", ...(token ? { authorization: `Bearer ${token}` } : {}) }, body: body === undefined ? undefined : JSON.stringify(body) });
  return { status: res.status, body: (await res.json()) as Record<string, unknown> };
}

const token = async (email: string) => (await call("POST", "/api/v1/tokens", null, { email, password: "takeline-demo" })).body.token as string;

type OutboxRow = { id: number; to: string; subject: string; status: string; attempts: number; last_error: string | null };
function outbox(): OutboxRow[] {
  const db = new Database(server.databasePath, { readonly: true, fileMustExist: true });
  try {
    return db.prepare("SELECT id, \"to\", subject, status, attempts, last_error FROM mail_outbox ORDER BY id").all() as OutboxRow[];
  } finally {
    db.close();
  }
}

async function until<T>(what: string, probe: () => T | Promise<T>, ok: (v: T) => boolean, timeoutMs: number): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const v = await probe();
    if (ok(v)) return v;
    if (Date.now() > deadline) throw new Error(`${what}: not within ${timeoutMs} ms (last: ${JSON.stringify(v)})`);
    await new Promise((r) => setTimeout(r, 200));
  }
}

test("SMTP down at approval: nothing is lost, every mail arrives once the server is back, each exactly once", async () => {
  const [planner, manager] = [await token("planner@demo.test"), await token("manager@demo.test")];
  const project = ((await call("GET", "/api/v1/projects", planner)).body.projects as { id: number; name: string }[]).find((p) => p.name === "Quillmere Eastern Bypass")!;
  const alternatives = (await call("GET", `/api/v1/projects/${project.id}/alternatives`, planner)).body.alternatives as { id: number; name: string }[];
  const brookside = alternatives.find((a) => a.name === "Brookside line")!;
  const before = outbox().length;

  expect((await call("POST", `/api/v1/alternatives/${brookside.id}/submit`, planner, { comment: "Fewest houses." })).status).toBe(200);
  const decided = await call("POST", `/api/v1/alternatives/${brookside.id}/decision`, manager, { decision: "approve", comment: "Approved; agents, over to you.", split: "even" });
  expect(decided.status).toBe(200);
  expect(decided.body.notified).toBe(3);

  // Queued with the events: the submission to the manager; the decision to the planner; a parcel list to each agent.
  const queued = outbox().slice(before);
  expect(queued.map((m) => m.to).sort()).toEqual(["agent2@demo.test", "agent@demo.test", "manager@demo.test", "planner@demo.test"]);
  // The sender tries while the server is down: every message fails at least once and stays pending.
  const failed = await until("a failed attempt for every message", () => outbox().slice(before), (rows) => rows.every((r) => r.attempts >= 1), 20_000);
  for (const r of failed) {
    expect(r.status).not.toBe("sent");
    expect(r.last_error).toBeTruthy();
  }

  // The mail server comes back on the same port.
  smtp = await startFakeSmtp({ dir: mailDir, port: smtpPort });
  await until("every message sent", () => outbox().slice(before), (rows) => rows.every((r) => r.status === "sent"), 60_000);
  // A few more sender cycles must not send anything again.
  await new Promise((r) => setTimeout(r, 1500));
  const caught = await readCaughtMail(mailDir);
  expect(caught.map((m) => m.to).sort()).toEqual(["agent2@demo.test", "agent@demo.test", "manager@demo.test", "planner@demo.test"]);
  expect(new Set(caught.map((m) => m.messageId)).size).toBe(4);
  const forAgent = caught.find((m) => m.to === "agent@demo.test")!;
  expect(forAgent.subject).toMatch(/^Your parcels: Quillmere Eastern Bypass — \d+ assigned to you$/);
  expect(forAgent.attachments).toEqual([expect.objectContaining({ contentType: "text/csv" })]);
  expect(caught.find((m) => m.to === "planner@demo.test")!.text).toContain("Approved; agents, over to you.");
});

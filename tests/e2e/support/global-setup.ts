import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { createServer } from "node:net";
import type { TestProject } from "vitest/node";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    mailDir: string;
  }
}

function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.once("error", reject);
    srv.listen(0, "127.0.0.1", () => {
      const address = srv.address();
      const port = typeof address === "object" && address ? address.port : 0;
      srv.close(() => resolve(port));
    });
  });
}

async function waitForServer(url: string, child: ChildProcess, log: () => string): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${log()}`);
    try {
      const res = await fetch(`${url}/sign-in`);
      if (res.ok) return;
    } catch {
      // not listening yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`server did not answer within 60 s:\n${log()}`);
}

/** Starts the built app (`build/`) in demo mode on a free port, with its own database and mail folder. */
export default async function setup(project: TestProject) {
  const dir = mkdtempSync(join(tmpdir(), "takeline-e2e-"));
  const port = await freePort();
  const env = {
    ...process.env,
    NODE_ENV: "production",
    TAKELINE_DEMO: "1",
    PORT: String(port),
    DATABASE_URL: join(dir, "e2e.sqlite"),
    MAIL_DIR: join(dir, "mail"),
    SESSION_SECRET: "e2e-session-secret-0123456789abcdef",
    MAIL_POLL_MS: "100",
    TAKELINE_SCRYPT_LOG2N: "14",
  };
  const seeded = spawnSync("npx", ["tsx", "scripts/seed-demo.ts"], { env, encoding: "utf8" });
  if (seeded.status !== 0) throw new Error(`demo seed failed:\n${seeded.stdout}\n${seeded.stderr}`);
  let output = "";
  // The server's own binary, not npx: killing npx would leave the server running.
  const child = spawn(join("node_modules", ".bin", "react-router-serve"), ["./build/server/index.js"], { env, stdio: ["ignore", "pipe", "pipe"] });
  child.stdout?.on("data", (c: Buffer) => (output += c.toString()));
  child.stderr?.on("data", (c: Buffer) => (output += c.toString()));
  const baseUrl = `http://127.0.0.1:${port}`;
  await waitForServer(baseUrl, child, () => output);
  project.provide("baseUrl", baseUrl);
  project.provide("mailDir", env.MAIL_DIR);
  return async () => {
    if (child.exitCode === null) {
      const exited = new Promise((r) => child.once("exit", r));
      child.kill("SIGTERM");
      // A server that does not stop within 10 s is killed, so a test run can never hang here.
      const killer = setTimeout(() => child.kill("SIGKILL"), 10_000);
      await exited;
      clearTimeout(killer);
    }
    rmSync(dir, { recursive: true, force: true });
  };
}

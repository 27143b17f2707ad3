import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { freePort } from "./own-server";

export interface RestartableServer {
  baseUrl: string;
  /** Stops the server process and starts it again on the same database (a new port). */
  restart: () => Promise<void>;
  /** Stops the server and removes its folder. */
  dispose: () => Promise<void>;
}

interface Running {
  child: ChildProcess;
  baseUrl: string;
}

async function launch(env: NodeJS.ProcessEnv): Promise<Running> {
  const port = await freePort();
  let output = "";
  const child = spawn(join("node_modules", ".bin", "react-router-serve"), ["./build/server/index.js"], { env: { ...env, PORT: String(port) }, stdio: ["ignore", "pipe", "pipe"] });
  child.stdout?.on("data", (c: Buffer) => (output += c.toString()));
  child.stderr?.on("data", (c: Buffer) => (output += c.toString()));
  const baseUrl = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${output}`);
    if (Date.now() > deadline) throw new Error(`server did not answer within 60 s:\n${output}`);
    if (await fetch(`${baseUrl}/sign-in`).then((r) => r.ok, () => false)) return { child, baseUrl };
    await new Promise((r) => setTimeout(r, 250));
  }
}

async function halt(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null) return;
  const exited = new Promise((r) => child.once("exit", r));
  child.kill("SIGTERM");
  // A server that does not stop within 10 s is killed, so a test run can never hang here.
  const killer = setTimeout(() => child.kill("SIGKILL"), 10_000);
  await exited;
  clearTimeout(killer);
}

/**
 * A copy of the built app (`build/`) in demo mode with its own database that outlives a restart:
 * for checks that something was stored, not just held in memory. The shared server is left alone.
 */
export async function startRestartableServer(): Promise<RestartableServer> {
  const dir = mkdtempSync(join(tmpdir(), "takeline-restart-"));
  const env = {
    ...process.env,
    NODE_ENV: "production",
    TAKELINE_DEMO: "1",
    DATABASE_URL: join(dir, "restart.sqlite"),
    MAIL_DIR: join(dir, "mail"),
    SESSION_SECRET: "restart-server-session-secret-0123456789",
    MAIL_POLL_MS: "100",
    TAKELINE_SCRYPT_LOG2N: "14",
  };
  const seeded = spawnSync("npx", ["tsx", "scripts/seed-demo.ts"], { env, encoding: "utf8" });
  if (seeded.status !== 0) throw new Error(`demo seed failed:\n${seeded.stdout}\n${seeded.stderr}`);
  let running = await launch(env);
  const server: RestartableServer = {
    baseUrl: running.baseUrl,
    restart: async () => {
      await halt(running.child);
      running = await launch(env);
      server.baseUrl = running.baseUrl;
    },
    dispose: async () => {
      await halt(running.child);
      rmSync(dir, { recursive: true, force: true });
    },
  };
  return server;
}

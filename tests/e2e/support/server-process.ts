import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { createServer } from "node:net";
import { join } from "node:path";

/** A TCP port nothing listens on right now (the OS picks it). */
export function freePort(): Promise<number> {
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

export interface AppServerProcess {
  child: ChildProcess;
  baseUrl: string;
  /** Everything the server printed, for error messages. */
  output: () => string;
}

/** Starts the built app (`build/`) with `env` on `port` and waits (60 s at most) until its sign-in page answers. */
export async function spawnAppServer(env: NodeJS.ProcessEnv, port: number): Promise<AppServerProcess> {
  let output = "";
  const child = spawn(join("node_modules", ".bin", "react-router-serve"), ["./build/server/index.js"], { env: { ...env, PORT: String(port) }, stdio: ["ignore", "pipe", "pipe"] });
  child.stdout?.on("data", (c: Buffer) => (output += c.toString()));
  child.stderr?.on("data", (c: Buffer) => (output += c.toString()));
  const baseUrl = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`server exited early:\n${output}`);
    if (Date.now() > deadline) throw new Error(`server did not answer within 60 s:\n${output}`);
    if (await fetch(`${baseUrl}/sign-in`).then((r) => r.ok, () => false)) return { child, baseUrl, output: () => output };
    await new Promise((r) => setTimeout(r, 250));
  }
}

/** Stops a server: SIGTERM, then SIGKILL after 10 s, so a test run can never hang here. */
export async function haltServer(child: ChildProcess): Promise<void> {
  if (child.exitCode !== null) return;
  const exited = new Promise((r) => child.once("exit", r));
  child.kill("SIGTERM");
  const killer = setTimeout(() => child.kill("SIGKILL"), 10_000);
  await exited;
  clearTimeout(killer);
}

/**
 * The environment of a demo-mode app with its database and mail folder in `dir`, after seeding
 * that database with the demo (`scripts/seed-demo.ts`). `extra` adds to it (e.g. SMTP_URL).
 */
export function seededDemoEnv(dir: string, name: string, extra: Record<string, string> = {}): NodeJS.ProcessEnv {
  const env = {
    ...process.env,
    NODE_ENV: "production",
    TAKELINE_DEMO: "1",
    DATABASE_URL: join(dir, `${name}.sqlite`),
    MAIL_DIR: join(dir, "mail"),
    SESSION_SECRET: `${name}-server-session-secret-0123456789abcdef`,
    MAIL_POLL_MS: "100",
    TAKELINE_SCRYPT_LOG2N: "14",
    ...extra,
  };
  const seeded = spawnSync("npx", ["tsx", "scripts/seed-demo.ts"], { env, encoding: "utf8" });
  if (seeded.status !== 0) throw new Error(`demo seed failed:\n${seeded.stdout}\n${seeded.stderr}`);
  return env;
}

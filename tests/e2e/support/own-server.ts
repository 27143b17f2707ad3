import { spawn, spawnSync, type ChildProcess } from "node:child_process";
import { mkdtempSync, rmSync } from "node:fs";
import { createServer } from "node:net";
import { tmpdir } from "node:os";
import { join } from "node:path";

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

export interface OwnServer {
  baseUrl: string;
  databasePath: string;
  stop: () => Promise<void>;
}

/**
 * A second copy of the built app (`build/`) in demo mode with its own database, for a journey that
 * must control the app's mail server itself: `env` adds to the environment (e.g. SMTP_URL pointing
 * at a port the test opens and closes). The shared server of the run is left alone.
 */
export async function startOwnServer(env: Record<string, string>): Promise<OwnServer> {
  const dir = mkdtempSync(join(tmpdir(), "takeline-own-"));
  const port = await freePort();
  const fullEnv = {
    ...process.env,
    NODE_ENV: "production",
    TAKELINE_DEMO: "1",
    PORT: String(port),
    DATABASE_URL: join(dir, "own.sqlite"),
    MAIL_DIR: join(dir, "mail"),
    SESSION_SECRET: "own-server-session-secret-0123456789",
    MAIL_POLL_MS: "100",
    TAKELINE_SCRYPT_LOG2N: "14",
    ...env,
  };
  const seeded = spawnSync("npx", ["tsx", "scripts/seed-demo.ts"], { env: fullEnv, encoding: "utf8" });
  if (seeded.status !== 0) throw new Error(`demo seed failed:\n${seeded.stdout}\n${seeded.stderr}`);
  let output = "";
  const child: ChildProcess = spawn(join("node_modules", ".bin", "react-router-serve"), ["./build/server/index.js"], { env: fullEnv, stdio: ["ignore", "pipe", "pipe"] });
  child.stdout?.on("data", (c: Buffer) => (output += c.toString()));
  child.stderr?.on("data", (c: Buffer) => (output += c.toString()));
  const baseUrl = `http://127.0.0.1:${port}`;
  const deadline = Date.now() + 60_000;
  for (;;) {
    if (child.exitCode !== null) throw new Error(`own server exited early:\n${output}`);
    if (Date.now() > deadline) throw new Error(`own server did not answer within 60 s:\n${output}`);
    const up = await fetch(`${baseUrl}/sign-in`).then((r) => r.ok, () => false);
    if (up) break;
    await new Promise((r) => setTimeout(r, 250));
  }
  return {
    baseUrl,
    databasePath: fullEnv.DATABASE_URL,
    stop: async () => {
      if (child.exitCode === null) {
        const exited = new Promise((r) => child.once("exit", r));
        child.kill("SIGTERM");
        const killer = setTimeout(() => child.kill("SIGKILL"), 10_000);
        await exited;
        clearTimeout(killer);
      }
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

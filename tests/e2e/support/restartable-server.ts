import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { freePort, haltServer, seededDemoEnv, spawnAppServer } from "./server-process";

export interface RestartableServer {
  baseUrl: string;
  /** Stops the server process and starts it again on the same database (a new port). */
  restart: () => Promise<void>;
  /** Stops the server and removes its folder. */
  dispose: () => Promise<void>;
}

/**
 * A copy of the built app (`build/`) in demo mode with its own database that outlives a restart:
 * for checks that something was stored, not just held in memory. The shared server is left alone.
 */
export async function startRestartableServer(): Promise<RestartableServer> {
  const dir = mkdtempSync(join(tmpdir(), "takeline-restart-"));
  const env = seededDemoEnv(dir, "restart");
  let running = await spawnAppServer(env, await freePort());
  const server: RestartableServer = {
    baseUrl: running.baseUrl,
    restart: async () => {
      await haltServer(running.child);
      running = await spawnAppServer(env, await freePort());
      server.baseUrl = running.baseUrl;
    },
    dispose: async () => {
      await haltServer(running.child);
      rmSync(dir, { recursive: true, force: true });
    },
  };
  return server;
}

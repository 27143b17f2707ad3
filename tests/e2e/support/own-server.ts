import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { freePort, haltServer, seededDemoEnv, spawnAppServer } from "./server-process";

export { freePort };

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
  const fullEnv = seededDemoEnv(dir, "own", env);
  const { child, baseUrl } = await spawnAppServer(fullEnv, await freePort());
  return {
    baseUrl,
    databasePath: fullEnv.DATABASE_URL!,
    stop: async () => {
      await haltServer(child);
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

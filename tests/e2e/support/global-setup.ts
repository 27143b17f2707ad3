import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { freePort, haltServer, seededDemoEnv, spawnAppServer } from "./server-process";
import type { TestProject } from "vitest/node";

declare module "vitest" {
  export interface ProvidedContext {
    baseUrl: string;
    mailDir: string;
  }
}

/** Starts the built app (`build/`) in demo mode on a free port, with its own database and mail folder. */
export default async function setup(project: TestProject) {
  const dir = mkdtempSync(join(tmpdir(), "takeline-e2e-"));
  const env = seededDemoEnv(dir, "e2e");
  // The server's own binary, not npx: killing npx would leave the server running.
  const { child, baseUrl } = await spawnAppServer(env, await freePort());
  project.provide("baseUrl", baseUrl);
  project.provide("mailDir", env.MAIL_DIR!);
  return async () => {
    await haltServer(child);
    rmSync(dir, { recursive: true, force: true });
  };
}

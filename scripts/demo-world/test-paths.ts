/**
 * Where the committed demo-world outputs live, for the tests (resolved from
 * this file, so no machine path is written anywhere).
 */
import { fileURLToPath } from "node:url";
import { join } from "node:path";

export const REPO_ROOT = fileURLToPath(new URL("../..", import.meta.url));
export const DEMO_DIR = join(REPO_ROOT, "data", "demo");
export const TILES_DIR = join(REPO_ROOT, "public", "tiles");
export const demoFile = (name: string): string => join(DEMO_DIR, name);

import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

// End-to-end journeys: one production server for the run, Debian's Chromium driven by playwright-core.
export default defineConfig({
  resolve: { alias: { "~": fileURLToPath(new URL("./app", import.meta.url)) } },
  test: {
    include: ["tests/e2e/**/*.test.ts"],
    globalSetup: ["tests/e2e/support/global-setup.ts"],
    setupFiles: ["tests/setup/fail-on-console-error.ts"],
    testTimeout: 60_000,
    hookTimeout: 120_000,
    // Journeys share one server and its mail folder; running files one by one keeps mail checks exact.
    fileParallelism: false,
  },
});

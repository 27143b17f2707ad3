import { defineConfig } from "vitest/config";
import { fileURLToPath } from "node:url";

// Unit and integration tests sit beside the code; e2e journeys have their own config.
export default defineConfig({
  resolve: { alias: { "~": fileURLToPath(new URL("./app", import.meta.url)) } },
  test: {
    include: ["app/**/*.test.ts", "tests/integration/**/*.test.ts", "scripts/**/*.test.ts"],
    environment: "node",
    setupFiles: ["tests/setup/fail-on-console-error.ts", "tests/setup/temp-database.ts"],
    pool: "forks",
    testTimeout: 20_000,
    env: { TAKELINE_SCRYPT_LOG2N: "14" },
  },
});

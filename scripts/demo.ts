/**
 * `npm run demo`: build, migrate, seed the invented demo scenario, and serve the production build.
 * Idempotent; honours PORT (default 3000), DATABASE_URL and MAIL_DIR.
 */
import { spawn, spawnSync } from "node:child_process";
import { join } from "node:path";

process.env.TAKELINE_DEMO = "1";
process.env.NODE_ENV = "production";
const port = process.env.PORT ?? "3000";

const build = spawnSync("npx", ["react-router", "build"], { stdio: "inherit", env: { ...process.env, NODE_ENV: "production" } });
if (build.status !== 0) process.exit(build.status ?? 1);

const { seedDemo } = await import("../app/models/demo-seed.server");
const seeded = await seedDemo();
console.log(`Demo scenario ready: ${seeded.users} accounts, project #${seeded.projectId}, ${seeded.features} features loaded.`);

// The server's own binary rather than npx, so signals reach it directly.
const server = spawn(join("node_modules", ".bin", "react-router-serve"), ["./build/server/index.js"], {
  stdio: ["ignore", "pipe", "inherit"],
  env: { ...process.env, PORT: port },
});
server.stdout.on("data", (chunk: Buffer) => {
  const text = chunk.toString();
  // react-router-serve prints its own address line; print ours, with the sign-in hint, instead.
  if (text.includes("[react-router-serve]")) {
    console.log(`Takeline demo is running at http://localhost:${port}/ (sign in as planner@demo.test / takeline-demo)`);
  } else process.stdout.write(text);
});
for (const signal of ["SIGINT", "SIGTERM"] as const) process.on(signal, () => server.kill(signal));
server.on("exit", (code) => process.exit(code ?? 0));

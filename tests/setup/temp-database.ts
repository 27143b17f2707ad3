import { mkdtempSync, rmSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { afterAll } from "vitest";

// Each test file gets its own real SQLite file and mail folder: no mocked ORM, no shared state.
const dir = mkdtempSync(join(tmpdir(), "takeline-test-"));
process.env.DATABASE_URL = join(dir, "test.sqlite");
process.env.MAIL_DIR = join(dir, "mail");
const g = globalThis as unknown as { takelineDb?: { sqlite: { close(): void } } };
g.takelineDb?.sqlite.close();
delete g.takelineDb;

afterAll(() => {
  g.takelineDb?.sqlite.close();
  delete g.takelineDb;
  rmSync(dir, { recursive: true, force: true });
});

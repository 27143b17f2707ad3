import Database from "better-sqlite3";
import { drizzle } from "drizzle-orm/better-sqlite3";
import type { BaseSQLiteDatabase } from "drizzle-orm/sqlite-core";
import { migrate } from "drizzle-orm/better-sqlite3/migrator";
import { mkdirSync } from "node:fs";
import { dirname, resolve } from "node:path";
import * as schema from "~/db/schema";
import { env } from "./env.server";

/** The database or a transaction on it: model functions accept either. */
export type Db = BaseSQLiteDatabase<"sync", Database.RunResult, typeof schema>;

const MIGRATIONS_DIR = resolve(process.cwd(), "drizzle");

/** Opens (and migrates) a SQLite database file with the pragmas Takeline relies on. */
export function openDatabase(path: string): { db: Db; sqlite: Database.Database } {
  mkdirSync(dirname(resolve(path)), { recursive: true });
  const sqlite = new Database(path);
  sqlite.pragma("journal_mode = WAL");
  sqlite.pragma("foreign_keys = ON");
  // Two writers (web request + mail sender) must wait for each other rather than fail.
  sqlite.pragma("busy_timeout = 5000");
  sqlite.pragma("synchronous = NORMAL");
  const db = drizzle(sqlite, { schema });
  migrate(db, { migrationsFolder: MIGRATIONS_DIR });
  return { db, sqlite };
}

const globalForDb = globalThis as unknown as { takelineDb?: { db: Db; sqlite: Database.Database } };

/** The process-wide database, opened on first use from DATABASE_URL. */
export function db(): Db {
  globalForDb.takelineDb ??= openDatabase(env().DATABASE_URL);
  return globalForDb.takelineDb.db;
}

import { sql } from "drizzle-orm";
import { integer } from "drizzle-orm/sqlite-core";

/** `created_at`: milliseconds since the epoch, set by SQLite when the row is inserted. */
export const createdAt = () =>
  integer("created_at", { mode: "timestamp_ms" }).notNull().default(sql`(unixepoch('subsec') * 1000)`);

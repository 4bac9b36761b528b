import { drizzle } from "drizzle-orm/node-postgres";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import type pg from "pg";
import { projectPath } from "../paths";

/** Arbitrary constant shared by every Linkleap process that may migrate the same database. */
const MIGRATION_LOCK_KEY = 7_531_902_417;

/**
 * Applies the SQL migrations in drizzle/ once. Several processes may start together
 * (tests, a second server): an advisory lock makes them take turns, and the second
 * finds nothing left to do.
 */
export async function migrateDatabase(pool: pg.Pool): Promise<void> {
  const client = await pool.connect();
  try {
    await client.query("select pg_advisory_lock($1)", [MIGRATION_LOCK_KEY]);
    try {
      await migrate(drizzle(client), { migrationsFolder: projectPath("drizzle") });
    } finally {
      await client.query("select pg_advisory_unlock($1)", [MIGRATION_LOCK_KEY]);
    }
  } finally {
    client.release();
  }
}

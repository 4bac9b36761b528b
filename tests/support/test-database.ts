import { randomBytes } from "node:crypto";
import pg from "pg";
import { inject } from "vitest";
import { connectDatabase, type Database } from "../../server/db/client";

export interface TestDatabase extends Database {
  url: string;
  name: string;
  /** Closes the pool and drops the database. */
  drop(): Promise<void>;
}

/**
 * A database of this test file's own, cloned from the migrated template (fast: a file copy),
 * on the real test cluster that the global setup started.
 */
export async function createTestDatabase(): Promise<TestDatabase> {
  const adminUrl = inject("pgAdminUrl");
  const template = inject("templateDatabase");
  const name = `linkleap_t_${randomBytes(5).toString("hex")}`;
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  try {
    await admin.query(`create database "${name}" template "${template}"`);
  } finally {
    await admin.end();
  }
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  const database = connectDatabase(url.toString());
  return {
    ...database,
    url: url.toString(),
    name,
    async drop() {
      await database.close();
      const a = new pg.Client({ connectionString: adminUrl });
      await a.connect();
      try {
        await a.query(`drop database if exists "${name}" with (force)`);
      } finally {
        await a.end();
      }
    },
  };
}

import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import pg from "pg";
import * as schema from "./schema";

export type Db = NodePgDatabase<typeof schema>;

export interface Database {
  db: Db;
  pool: pg.Pool;
  close(): Promise<void>;
}

/** One pool per process; drizzle and the session store share it. */
export function connectDatabase(url: string, options: { max?: number } = {}): Database {
  const pool = new pg.Pool({ connectionString: url, max: options.max ?? 10 });
  // An idle client that loses its server (restart, network) must not crash the process.
  pool.on("error", (error) => console.error("[db] idle client error:", error.message));
  const db = drizzle(pool, { schema });
  return { db, pool, close: () => pool.end() };
}

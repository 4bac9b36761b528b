/**
 * Once per test run (for the integration and e2e projects): start the test cluster — a
 * private PostgreSQL separate from the demo's — and build a migrated template database that
 * each test file clones into a database of its own. Browser tests also get Debian's chromium
 * and one build of the client.
 */
import { createHash } from "node:crypto";
import { readdirSync, readFileSync } from "node:fs";
import { join } from "node:path";
import pg from "pg";
import type { TestProject } from "vitest/node";
import { connectDatabase } from "../../server/db/client";
import { migrateDatabase } from "../../server/db/migrate";
import { startCluster, stopCluster } from "../../server/devstack/postgres";
import { projectPath } from "../../server/paths";
import { ensureChromium } from "./chromium";
import { buildClientForTests } from "./client-build";
import { TEST_PG_DIR } from "./paths";

declare module "vitest" {
  export interface ProvidedContext {
    pgAdminUrl: string;
    templateDatabase: string;
    /** The client built once for all browser tests (e2e project only). */
    clientDir: string;
  }
}

/** The template's name follows the migrations, so a changed schema gets a fresh template. */
function templateName(): string {
  const dir = projectPath("drizzle");
  const hash = createHash("sha256");
  for (const file of readdirSync(dir).filter((f) => f.endsWith(".sql")).sort()) {
    hash.update(file).update(readFileSync(join(dir, file)));
  }
  return `linkleap_tpl_${hash.digest("hex").slice(0, 12)}`;
}

async function ensureTemplate(adminUrl: string, name: string) {
  const admin = new pg.Client({ connectionString: adminUrl });
  await admin.connect();
  try {
    // Setups of several projects run at once: one builds, the others wait and reuse.
    await admin.query("select pg_advisory_lock(4242001)");
    const { rowCount } = await admin.query("select 1 from pg_database where datname = $1", [name]);
    if (rowCount) return;
    const building = `${name}_building`;
    await admin.query(`drop database if exists "${building}"`);
    await admin.query(`create database "${building}"`);
    const url = new URL(adminUrl);
    url.pathname = `/${building}`;
    const database = connectDatabase(url.toString(), { max: 1 });
    try {
      await migrateDatabase(database.pool);
    } finally {
      await database.close();
    }
    await admin.query(`alter database "${building}" rename to "${name}"`);
  } finally {
    await admin.query("select pg_advisory_unlock(4242001)").catch(() => {});
    await admin.end();
  }
}

export default async function setup(project: TestProject) {
  const port = Number(process.env.LINKLEAP_TEST_PG_PORT ?? 4320);
  const cluster = await startCluster({ dir: TEST_PG_DIR, port, fast: true, log: () => {} });
  const adminUrl = cluster.url("postgres");
  const template = templateName();
  await ensureTemplate(adminUrl, template);
  project.provide("pgAdminUrl", adminUrl);
  project.provide("templateDatabase", template);
  if (project.name === "e2e") {
    await ensureChromium();
    project.provide("clientDir", await buildClientForTests());
  }

  return async () => {
    // Vitest runs every teardown after the last test file of the whole run.
    if (cluster.startedHere) await stopCluster(TEST_PG_DIR);
  };
}

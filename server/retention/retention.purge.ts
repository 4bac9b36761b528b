import { desc, eq, sql } from "drizzle-orm";
import { retentionCutoff, type DeletedCount, type PurgeRun } from "../contracts/retention";
import type { Db } from "../db/client";
import { purgeDeletions, purgeRuns, schools } from "../db/schema";
import type { PhotoStore } from "../bench/photo-store";
import { PUPIL_DATA_TARGETS, removePhotoFiles } from "./retention.targets";

/** Arbitrary constant: only one purge at a time across every Linkleap process on this database. */
export const PURGE_LOCK_KEY = 7_531_902_419;

export type PurgeTrigger = (typeof purgeRuns.$inferInsert)["trigger"];

export interface PurgeResult {
  runId: string | null;
  /** Another process was already purging: nothing was done or recorded. */
  skipped: boolean;
  deletions: { schoolId: string; kind: DeletedCount["kind"]; cutoff: Date; count: number }[];
}

/**
 * Deletes, for every school, the pupil data older than the school's retention period allows,
 * and records the run with a count per school and kind. All or nothing: a failure rolls back
 * every deletion of the run and is recorded as a failed run. Photo files go after the commit.
 */
export async function runPurge(
  db: Db,
  options: { trigger: PurgeTrigger; now?: Date; photos: PhotoStore; log?: (message: string, error?: unknown) => void },
): Promise<PurgeResult> {
  const now = options.now ?? new Date();
  const startedAt = new Date();
  const files: string[] = [];
  try {
    const result = await db.transaction(async (tx): Promise<PurgeResult> => {
      const lock = await tx.execute<{ locked: boolean }>(sql`select pg_try_advisory_xact_lock(${PURGE_LOCK_KEY}) as locked`);
      if (!lock.rows[0]?.locked) return { runId: null, skipped: true, deletions: [] };

      const [run] = await tx
        .insert(purgeRuns)
        .values({ trigger: options.trigger, startedAt, status: "succeeded" })
        .returning({ id: purgeRuns.id });
      const deletions: PurgeResult["deletions"] = [];
      const rows: (typeof purgeDeletions.$inferInsert)[] = [];
      for (const school of await tx.select({ id: schools.id, retention: schools.pupilDataRetention }).from(schools)) {
        const cutoff = retentionCutoff(school.retention, now);
        for (const target of PUPIL_DATA_TARGETS) {
          const count = await target.purgeSchool(tx, school.id, cutoff, files);
          deletions.push({ schoolId: school.id, kind: target.kind, cutoff, count });
          rows.push({ runId: run!.id, schoolId: school.id, kind: target.kind, retention: school.retention, cutoff, deletedCount: count });
        }
      }
      if (rows.length) await tx.insert(purgeDeletions).values(rows);
      await tx.update(purgeRuns).set({ finishedAt: new Date() }).where(eq(purgeRuns.id, run!.id));
      return { runId: run!.id, skipped: false, deletions };
    });
    await removePhotoFiles(options.photos, files, options.log ?? console.error);
    return result;
  } catch (error) {
    await db
      .insert(purgeRuns)
      .values({ trigger: options.trigger, startedAt, finishedAt: new Date(), status: "failed", error: String(error) })
      .catch(() => {});
    throw error;
  }
}

/** The most recent run, with what it deleted for one school. */
export async function lastPurgeRun(db: Db, schoolId: string): Promise<PurgeRun | null> {
  const [run] = await db.select().from(purgeRuns).orderBy(desc(purgeRuns.startedAt)).limit(1);
  if (!run) return null;
  const rows = await db
    .select({ kind: purgeDeletions.kind, count: purgeDeletions.deletedCount, cutoff: purgeDeletions.cutoff })
    .from(purgeDeletions)
    .where(sql`${purgeDeletions.runId} = ${run.id} and ${purgeDeletions.schoolId} = ${schoolId}`);
  return {
    startedAt: run.startedAt.toISOString(),
    finishedAt: run.finishedAt?.toISOString() ?? null,
    status: run.status,
    deleted: rows.map((r) => ({ kind: r.kind, count: r.count })),
    cutoff: rows[0]?.cutoff.toISOString() ?? null,
  };
}

/** When the last successful run started, if there has been one. */
export async function lastSuccessfulPurgeAt(db: Db): Promise<Date | null> {
  const [run] = await db
    .select({ startedAt: purgeRuns.startedAt })
    .from(purgeRuns)
    .where(eq(purgeRuns.status, "succeeded"))
    .orderBy(desc(purgeRuns.startedAt))
    .limit(1);
  return run?.startedAt ?? null;
}

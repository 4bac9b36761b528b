/**
 * The retention purge against real Postgres: it deletes exactly the pupil data past each
 * school's period, keeps the rest, records the run, and really runs on its schedule; and a
 * class's pupil data can be deleted at once.
 */
import { asc, eq, inArray } from "drizzle-orm";
import { beforeAll, describe, expect, it } from "vitest";
import type { ApiErrorBody } from "../../server/contracts/errors";
import { PUPIL_DATA_KINDS, type PupilDataDeletion, type RetentionSettings } from "../../server/contracts/retention";
import type { Db } from "../../server/db/client";
import { auditEvents, classes, purgeDeletions, purgeRuns, rosterEntries, schools } from "../../server/db/schema";
import { createPhotoStore } from "../../server/bench/photo-store";
import { PURGE_LOCK_KEY, runPurge } from "../../server/retention/retention.purge";
import { PEOPLE, seedFixture, type Fixture } from "../support/fixtures";
import { HttpAgent, signIn } from "../support/http-agent";
import { startTestStack, useTestStack } from "../support/test-stack";

const DAY = 24 * 60 * 60 * 1000;
/** The moment the purge is told it is: a Wednesday in March, mid school year. */
const NOW = new Date("2026-03-18T02:30:00Z");
const daysBefore = (days: number) => new Date(NOW.getTime() - days * DAY);

interface Extra {
  /** Archived 120 days before NOW: past 90 days, but within the school year (after 1 September). */
  archived120: string;
  /** Archived 60 days before NOW: within 90 days. */
  archived60: string;
  /** Archived in July 2025: before the last 1 September. */
  archivedLastYear: string;
  /** At the other school, archived 120 days before NOW. */
  otherSchool120: string;
}

async function seed(db: Db): Promise<Fixture & Extra> {
  const f = await seedFixture(db);
  const [classA] = await db.select().from(classes).where(eq(classes.id, f.classA));
  const [elsewhere] = await db.select().from(classes).where(eq(classes.id, f.classElsewhere));
  const addArchived = async (template: typeof classA, name: string, archivedAt: Date, names: string[]) => {
    const [row] = await db
      .insert(classes)
      .values({ ...template!, id: undefined, name, archivedAt })
      .returning({ id: classes.id });
    await db.insert(rosterEntries).values(names.map((displayName, position) => ({ classId: row!.id, displayName, position })));
    return row!.id;
  };
  return {
    ...f,
    archived120: await addArchived(classA, "Old 120", daysBefore(120), ["Ada B.", "Ben C.", "Cal D."]),
    archived60: await addArchived(classA, "Old 60", daysBefore(60), ["Dee E.", "Eve F."]),
    archivedLastYear: await addArchived(classA, "Last year", new Date("2025-07-15T12:00:00Z"), ["Fin G.", "Gus H.", "Hana J.", "Ivy K."]),
    otherSchool120: await addArchived(elsewhere, "Other 120", daysBefore(120), ["Jo L."]),
  };
}

const ctx = useTestStack(seed);
/** Counts per kind when only roster names were there to delete (this file makes no lessons). */
const onlyRosterNames = (count: number) => PUPIL_DATA_KINDS.map((kind) => ({ kind, count: kind === "roster_names" ? count : 0 }));
let admin: HttpAgent;
beforeAll(async () => {
  admin = new HttpAgent(ctx.stack.url);
  await signIn(admin, PEOPLE.admin.email);
});

async function rosterCounts(): Promise<Record<string, number>> {
  const f = ctx.fixture;
  const ids = [f.classA, f.archived120, f.archived60, f.archivedLastYear, f.otherSchool120];
  const rows = await ctx.database.db
    .select({ classId: rosterEntries.classId })
    .from(rosterEntries)
    .where(inArray(rosterEntries.classId, ids));
  const count = (id: string) => rows.filter((r) => r.classId === id).length;
  return {
    current: count(f.classA),
    archived120: count(f.archived120),
    archived60: count(f.archived60),
    archivedLastYear: count(f.archivedLastYear),
    otherSchool120: count(f.otherSchool120),
  };
}

describe("the retention purge", () => {
  it("under the default (end of the school year) deletes only the rosters of classes archived before the last 1 September", async () => {
    const before = await rosterCounts();
    expect(before).toEqual({ current: 3, archived120: 3, archived60: 2, archivedLastYear: 4, otherSchool120: 1 });

    const result = await runPurge(ctx.database.db, { trigger: "manual", now: NOW, photos: createPhotoStore(ctx.stack.uploadsDir) });
    expect(result.skipped).toBe(false);

    expect(await rosterCounts()).toEqual({ ...before, archivedLastYear: 0 });
    const mine = result.deletions.filter((d) => d.schoolId === ctx.fixture.schoolId);
    expect(mine).toEqual(onlyRosterNames(4).map((d) => ({ schoolId: ctx.fixture.schoolId, cutoff: new Date("2025-09-01T00:00:00Z"), ...d })));

    // The run and its counts are recorded, per school.
    const [run] = await ctx.database.db.select().from(purgeRuns).where(eq(purgeRuns.id, result.runId!));
    expect(run).toMatchObject({ trigger: "manual", status: "succeeded" });
    expect(run!.finishedAt).not.toBeNull();
    const counts = await ctx.database.db.select().from(purgeDeletions).where(eq(purgeDeletions.runId, result.runId!));
    expect(counts.filter((c) => c.kind === "roster_names").map((c) => [c.schoolId, c.retention, c.deletedCount]).sort()).toEqual(
      [
        [ctx.fixture.schoolId, "end_of_school_year", 4],
        [(await otherSchoolId()), "end_of_school_year", 0],
      ].sort(),
    );

    // The admin sees when it ran and what went.
    const settings = await admin.json<RetentionSettings>("/api/school/retention");
    expect(settings.body.period).toBe("end_of_school_year");
    expect(settings.body.lastRun).toMatchObject({ status: "succeeded", deleted: onlyRosterNames(4) });
  });

  it("after the admin shortens the period to 90 days, deletes the 120-day-old roster and keeps the 60-day-old one and the other school's", async () => {
    const changed = await admin.json<RetentionSettings>("/api/school/retention", { method: "PUT", json: { period: "days_90" } });
    expect(changed.status).toBe(200);
    expect(changed.body.period).toBe("days_90");
    const [audit] = await ctx.database.db.select().from(auditEvents).where(eq(auditEvents.action, "school.retention_changed"));
    expect(audit).toMatchObject({ actorStaffId: ctx.fixture.staffIds.admin, detail: { from: "end_of_school_year", to: "days_90" } });

    const result = await runPurge(ctx.database.db, { trigger: "manual", now: NOW, photos: createPhotoStore(ctx.stack.uploadsDir) });
    expect(await rosterCounts()).toEqual({ current: 3, archived120: 0, archived60: 2, archivedLastYear: 0, otherSchool120: 1 });
    expect(result.deletions.find((d) => d.schoolId === ctx.fixture.schoolId)?.count).toBe(3);

    // A second run finds nothing more to delete, and says so.
    const again = await runPurge(ctx.database.db, { trigger: "manual", now: NOW, photos: createPhotoStore(ctx.stack.uploadsDir) });
    expect(again.deletions.reduce((n, d) => n + d.count, 0)).toBe(0);
  });

  it("refuses a period that is not one of the choices", async () => {
    const bad = await admin.json<ApiErrorBody>("/api/school/retention", { method: "PUT", json: { period: "forever" } });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields?.period).toBeDefined();
  });

  it("only one purge runs at a time: one started while another holds the lock does nothing", async () => {
    const runsBefore = (await ctx.database.db.select().from(purgeRuns)).length;
    const other = await ctx.database.pool.connect();
    try {
      await other.query("begin");
      await other.query("select pg_advisory_xact_lock($1)", [PURGE_LOCK_KEY]);
      const blocked = await runPurge(ctx.database.db, { trigger: "manual", now: NOW, photos: createPhotoStore(ctx.stack.uploadsDir) });
      expect(blocked).toEqual({ runId: null, skipped: true, deletions: [] });
      expect((await ctx.database.db.select().from(purgeRuns)).length).toBe(runsBefore);
    } finally {
      await other.query("rollback");
      other.release();
    }
    expect((await runPurge(ctx.database.db, { trigger: "manual", now: NOW, photos: createPhotoStore(ctx.stack.uploadsDir) })).skipped).toBe(false);
  });
});

describe("deleting a class's pupil data now", () => {
  it("the class's teacher deletes its roster at once; it is audited with the count", async () => {
    const teacher = new HttpAgent(ctx.stack.url);
    await signIn(teacher, PEOPLE.teacherA.email);
    const { status, body } = await teacher.json<PupilDataDeletion>(`/api/classes/${ctx.fixture.classA}/pupil-data`, { method: "DELETE" });
    expect(status).toBe(200);
    expect(body).toEqual({ classId: ctx.fixture.classA, deleted: onlyRosterNames(3) });
    expect((await rosterCounts()).current).toBe(0);
    const roster = await teacher.json<{ names: unknown[] }>(`/api/classes/${ctx.fixture.classA}/roster`);
    expect(roster.body.names).toEqual([]);
    const audit = await ctx.database.db.select().from(auditEvents).where(eq(auditEvents.action, "class.pupil_data_deleted"));
    expect(audit).toHaveLength(1);
    expect(audit[0]).toMatchObject({ subjectId: ctx.fixture.classA, actorStaffId: ctx.fixture.staffIds.teacherA, detail: { roster_names: 3 } });
  });

  it("the school admin can do it for any class of the school, and the head of department cannot", async () => {
    const head = new HttpAgent(ctx.stack.url);
    await signIn(head, PEOPLE.head.email);
    expect((await head.json(`/api/classes/${ctx.fixture.archived60}/pupil-data`, { method: "DELETE" })).status).toBe(403);
    expect((await rosterCounts()).archived60).toBe(2);

    const { status, body } = await admin.json<PupilDataDeletion>(`/api/classes/${ctx.fixture.archived60}/pupil-data`, { method: "DELETE" });
    expect(status).toBe(200);
    expect(body.deleted).toEqual(onlyRosterNames(2));
    expect((await rosterCounts()).archived60).toBe(0);
    // Not another school's class.
    expect((await admin.json(`/api/classes/${ctx.fixture.otherSchool120}/pupil-data`, { method: "DELETE" })).status).toBe(404);
    expect((await rosterCounts()).otherSchool120).toBe(1);
  });
});

describe("the purge schedule", () => {
  it("runs on its schedule when the server runs one", async () => {
    const stack = await startTestStack(ctx.database, { purgeSchedule: "* * * * * *" });
    try {
      const started = Date.now();
      let scheduled: (typeof purgeRuns.$inferSelect)[] = [];
      while (Date.now() - started < 8_000) {
        scheduled = await ctx.database.db.select().from(purgeRuns).where(eq(purgeRuns.trigger, "schedule")).orderBy(asc(purgeRuns.startedAt));
        if (scheduled.length) break;
        await new Promise((r) => setTimeout(r, 200));
      }
      expect(scheduled.length).toBeGreaterThan(0);
      expect(scheduled[0]!.status).toBe("succeeded");
      const agent = new HttpAgent(stack.url);
      await signIn(agent, PEOPLE.admin.email);
      const settings = await agent.json<RetentionSettings>("/api/school/retention");
      expect(new Date(settings.body.nextRunAt!).getTime()).toBeGreaterThan(Date.now() - 1000);
    } finally {
      await stack.close();
    }
  });
});

async function otherSchoolId(): Promise<string> {
  const [row] = await ctx.database.db.select({ id: schools.id }).from(schools).where(eq(schools.name, "Southmere College"));
  return row!.id;
}

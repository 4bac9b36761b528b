import { and, eq, gte, isNull, lt, sql } from "drizzle-orm";
import type { Db } from "../db/client";
import { classes, departments, lessonParticipants, lessons, schools, staff, trials, weeklyDigestSends } from "../db/schema";
import type { Mailer } from "../mail/mailer";
import { addDays, mondayOf } from "../contracts/department-overview";
import { isoDayIn } from "../contracts/school";
import { weeklyDigestMail, type DigestRow } from "./digest.mail";

/** The week before the one `now` falls in, Monday to Monday, as calendar days in the school's time zone. */
export function reportedWeek(now: Date, timeZone: string): { startDay: string; endDay: string } {
  const thisMonday = mondayOf(isoDayIn(now, timeZone));
  return { startDay: addDays(thisMonday, -7), endDay: thisMonday };
}

/** The instants the school's days start at (Postgres's tz database, as the overview uses). */
async function midnightsIn(db: Db, timeZone: string, startDay: string, endDay: string): Promise<{ start: Date; end: Date }> {
  // As epoch milliseconds: raw rows carry timestamps as text.
  const ms = (day: string) => sql`(extract(epoch from (${day}::timestamp at time zone ${timeZone})) * 1000)::float8`;
  const result = await db.execute<{ start: number; end: number }>(sql`select ${ms(startDay)} as "start", ${ms(endDay)} as "end"`);
  const row = result.rows[0]!;
  return { start: new Date(row.start), end: new Date(row.end) };
}

/** Lessons in one department in [start, end), per teacher and class: counts only, never pupils. */
export async function departmentWeek(db: Db, departmentId: string, start: Date, end: Date): Promise<DigestRow[]> {
  const trialsRun = db
    .select({ lessonId: trials.lessonId, count: sql<number>`count(*)::int`.as("trials_run") })
    .from(trials)
    .where(sql`${trials.ranAt} is not null`)
    .groupBy(trials.lessonId)
    .as("trials_run");
  const pupils = db
    .select({ lessonId: lessonParticipants.lessonId, count: sql<number>`count(*)::int`.as("pupils") })
    .from(lessonParticipants)
    .groupBy(lessonParticipants.lessonId)
    .as("pupils");
  const rows = await db
    .select({
      teacherName: staff.displayName,
      className: classes.name,
      lessons: sql<number>`count(${lessons.id})::int`,
      trialsRun: sql<number>`coalesce(sum(${trialsRun.count}), 0)::int`,
      pupils: sql<number>`coalesce(sum(${pupils.count}), 0)::int`,
    })
    .from(lessons)
    .innerJoin(classes, eq(classes.id, lessons.classId))
    .innerJoin(staff, eq(staff.id, lessons.teacherId))
    .leftJoin(trialsRun, eq(trialsRun.lessonId, lessons.id))
    .leftJoin(pupils, eq(pupils.lessonId, lessons.id))
    .where(and(eq(classes.departmentId, departmentId), gte(lessons.startedAt, start), lt(lessons.startedAt, end)))
    .groupBy(staff.displayName, classes.name)
    .orderBy(staff.displayName, classes.name);
  return rows;
}

export interface DigestRunResult {
  sent: number;
  /** Already sent (or found quiet) for this week by an earlier run. */
  skipped: number;
  failed: number;
  /** Heads whose department ran no lessons that week: no mail (holidays would otherwise fill inboxes). */
  quiet: number;
}

/**
 * Sends last week's digest to every head of department who has not had it yet. The row in
 * weekly_digest_sends is claimed first and released if the mail server refuses the message, so
 * a later run tries again and nobody gets two. A week without lessons is claimed but not mailed.
 */
export async function sendWeeklyDigests(
  db: Db,
  deps: { mailer: Pick<Mailer, "send">; publicUrl: string; now?: Date; log?: (message: string, error?: unknown) => void },
): Promise<DigestRunResult> {
  const now = deps.now ?? new Date();
  const heads = await db
    .select({
      id: staff.id,
      email: staff.email,
      displayName: staff.displayName,
      departmentId: staff.departmentId,
      departmentName: departments.name,
      schoolName: schools.name,
      timeZone: schools.timeZone,
    })
    .from(staff)
    .innerJoin(departments, eq(departments.id, staff.departmentId))
    .innerJoin(schools, eq(schools.id, staff.schoolId))
    .where(and(eq(staff.role, "head_of_department"), isNull(staff.removedAt)));

  const result: DigestRunResult = { sent: 0, skipped: 0, failed: 0, quiet: 0 };
  for (const head of heads) {
    const { startDay, endDay } = reportedWeek(now, head.timeZone);
    const { start, end } = await midnightsIn(db, head.timeZone, startDay, endDay);
    const claimed = await db
      .insert(weeklyDigestSends)
      .values({ staffId: head.id, weekStart: start })
      .onConflictDoNothing()
      .returning({ id: weeklyDigestSends.id });
    if (claimed.length === 0) {
      result.skipped++;
      continue;
    }
    try {
      const rows = await departmentWeek(db, head.departmentId!, start, end);
      if (rows.length === 0) {
        result.quiet++;
        continue;
      }
      await deps.mailer.send(
        weeklyDigestMail({
          to: head.email,
          headName: head.displayName,
          departmentName: head.departmentName,
          schoolName: head.schoolName,
          weekStart: startDay,
          rows,
          overviewUrl: `${deps.publicUrl}/department`,
        }),
      );
      result.sent++;
    } catch (error) {
      await db.delete(weeklyDigestSends).where(eq(weeklyDigestSends.id, claimed[0]!.id));
      result.failed++;
      deps.log?.(`[digest] could not send the weekly digest to staff ${head.id}`, error);
    }
  }
  return result;
}

import { and, asc, desc, eq, gte, isNull, sql } from "drizzle-orm";
import type { Db } from "../db/client";
import { classes, lessonPlans, lessons, plannedLessons } from "../db/schema";

type Reader = Pick<Db, "select">;

/** Planned lessons not yet started, from a little before now (a lesson running late still shows). */
export function upcomingOfTeacher(db: Reader, teacherId: string, since: Date, limit: number) {
  return db
    .select({
      id: plannedLessons.id,
      classId: plannedLessons.classId,
      className: classes.name,
      planId: plannedLessons.planId,
      planTitle: lessonPlans.title,
      trialCount: sql<number | null>`jsonb_array_length(${lessonPlans.trials})`,
      plannedFor: plannedLessons.plannedFor,
    })
    .from(plannedLessons)
    .innerJoin(classes, eq(classes.id, plannedLessons.classId))
    .leftJoin(lessonPlans, eq(lessonPlans.id, plannedLessons.planId))
    .where(
      and(
        eq(plannedLessons.teacherId, teacherId),
        isNull(plannedLessons.lessonId),
        isNull(classes.archivedAt),
        gte(plannedLessons.plannedFor, since),
      ),
    )
    .orderBy(asc(plannedLessons.plannedFor), asc(plannedLessons.id))
    .limit(limit);
}

export async function findPlanned(db: Reader, id: string) {
  const [row] = await db.select().from(plannedLessons).where(eq(plannedLessons.id, id));
  return row;
}

/** The teacher's latest lessons across their classes. */
export function recentOfTeacher(db: Reader, teacherId: string, limit: number) {
  return db
    .select({
      id: lessons.id,
      classId: lessons.classId,
      className: classes.name,
      code: lessons.code,
      status: lessons.status,
      planTitle: lessons.planTitle,
      startedAt: lessons.startedAt,
      trialsRun: sql<number>`(select count(*)::int from trials t where t.lesson_id = ${lessons.id} and t.ran_at is not null)`,
      participantCount: sql<number>`(select count(*)::int from lesson_participants lp where lp.lesson_id = ${lessons.id})`,
    })
    .from(lessons)
    .innerJoin(classes, eq(classes.id, lessons.classId))
    .where(eq(lessons.teacherId, teacherId))
    .orderBy(desc(lessons.startedAt), desc(lessons.id))
    .limit(limit);
}

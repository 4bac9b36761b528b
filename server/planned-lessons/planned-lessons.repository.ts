import { and, asc, desc, eq, gte, isNull, or, sql } from "drizzle-orm";
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

/** A plan the teacher may use: their own, or one shared in their department. */
export async function findUsablePlan(db: Reader, planId: string, actor: { id: string; schoolId: string; departmentId: string | null }) {
  const sharedHere = actor.departmentId
    ? and(eq(lessonPlans.shared, true), eq(lessonPlans.departmentId, actor.departmentId))
    : sql`false`;
  const [row] = await db
    .select({ id: lessonPlans.id, title: lessonPlans.title })
    .from(lessonPlans)
    .where(and(eq(lessonPlans.id, planId), eq(lessonPlans.schoolId, actor.schoolId), or(eq(lessonPlans.ownerId, actor.id), sharedHere)));
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

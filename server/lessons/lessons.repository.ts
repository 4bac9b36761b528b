import { and, asc, count, desc, eq, sql } from "drizzle-orm";
import type { Db } from "../db/client";
import { classes, explanations, lessonParticipants, lessons, predictions, rosterEntries, trials } from "../db/schema";
import type { LessonBundle } from "./lessons.views";

type Reader = Pick<Db, "select">;
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];

/** A lesson with what access checks need: its class's school and department. */
export async function findLessonWithClass(db: Reader, lessonId: string) {
  const [row] = await db
    .select({
      lesson: lessons,
      className: classes.name,
      schoolId: classes.schoolId,
      departmentId: classes.departmentId,
    })
    .from(lessons)
    .innerJoin(classes, eq(classes.id, lessons.classId))
    .where(eq(lessons.id, lessonId));
  return row;
}

export async function findTrial(db: Reader, trialId: string) {
  const [row] = await db.select().from(trials).where(eq(trials.id, trialId));
  return row;
}

/** The open lesson with this code (codes are unique among open lessons). */
export async function findOpenLessonByCode(db: Reader, code: string) {
  const [row] = await db
    .select({ lesson: lessons, className: classes.name })
    .from(lessons)
    .innerJoin(classes, eq(classes.id, lessons.classId))
    .where(and(eq(lessons.code, code), eq(lessons.status, "open")));
  return row;
}

/** The most recent lesson that used this code, open or not (to tell "ended" from "never existed"). */
export async function findLatestLessonByCode(db: Reader, code: string) {
  const [row] = await db.select().from(lessons).where(eq(lessons.code, code)).orderBy(desc(lessons.startedAt)).limit(1);
  return row;
}

export async function loadLessonBundle(db: Reader, lessonId: string): Promise<LessonBundle | undefined> {
  const head = await findLessonWithClass(db, lessonId);
  if (!head) return undefined;
  const [participantRows, trialRows, predictionRows, explanationRows] = await Promise.all([
    db
      .select({ id: lessonParticipants.id, displayName: lessonParticipants.displayName })
      .from(lessonParticipants)
      .where(eq(lessonParticipants.lessonId, lessonId))
      .orderBy(asc(lessonParticipants.joinedAt), asc(lessonParticipants.displayName)),
    db.select().from(trials).where(eq(trials.lessonId, lessonId)).orderBy(asc(trials.position)),
    db
      .select({ p: predictions })
      .from(predictions)
      .innerJoin(trials, eq(trials.id, predictions.trialId))
      .where(eq(trials.lessonId, lessonId))
      .orderBy(asc(predictions.createdAt), asc(predictions.id)),
    db
      .select({ e: explanations })
      .from(explanations)
      .innerJoin(trials, eq(trials.id, explanations.trialId))
      .where(eq(trials.lessonId, lessonId))
      .orderBy(asc(explanations.createdAt), asc(explanations.id)),
  ]);
  return {
    lesson: head.lesson,
    className: head.className,
    schoolId: head.schoolId,
    participants: participantRows,
    trials: trialRows,
    predictions: predictionRows.map((r) => r.p),
    explanations: explanationRows.map((r) => r.e),
  };
}

export async function countParticipants(db: Reader, lessonId: string): Promise<number> {
  const [row] = await db.select({ n: count() }).from(lessonParticipants).where(eq(lessonParticipants.lessonId, lessonId));
  return row?.n ?? 0;
}

export async function countAnswers(db: Reader, trialId: string, round: 1 | 2): Promise<number> {
  const [row] = await db
    .select({ n: count() })
    .from(predictions)
    .where(and(eq(predictions.trialId, trialId), eq(predictions.round, round)));
  return row?.n ?? 0;
}

/** The class's roster with, for each name, whether someone in this lesson already picked it. */
export async function rosterForLesson(db: Reader, classId: string, lessonId: string) {
  return db
    .select({
      id: rosterEntries.id,
      displayName: rosterEntries.displayName,
      // Spelled out: in a one-table select drizzle leaves columns unqualified, and inside the
      // sub-select they would name the participant's columns instead.
      taken: sql<boolean>`exists (select 1 from lesson_participants lp where lp.lesson_id = ${lessonId} and (lp.roster_entry_id = roster_entries.id or lower(lp.display_name) = lower(roster_entries.display_name)))`,
    })
    .from(rosterEntries)
    .where(eq(rosterEntries.classId, classId))
    .orderBy(asc(rosterEntries.position));
}

export async function lessonsOfClass(db: Reader, classId: string) {
  return db
    .select({
      id: lessons.id,
      code: lessons.code,
      status: lessons.status,
      startedAt: lessons.startedAt,
      endedAt: lessons.endedAt,
      trialCount: sql<number>`(select count(*)::int from trials t where t.lesson_id = lessons.id)`,
      trialsRun: sql<number>`(select count(*)::int from trials t where t.lesson_id = lessons.id and t.ran_at is not null)`,
      participantCount: sql<number>`(select count(*)::int from lesson_participants lp where lp.lesson_id = lessons.id)`,
      planTitle: lessons.planTitle,
    })
    .from(lessons)
    .where(eq(lessons.classId, classId))
    .orderBy(desc(lessons.startedAt), desc(lessons.id));
}

export async function openLessonsOfTeacher(db: Reader, teacherId: string) {
  return db
    .select({
      id: lessons.id,
      code: lessons.code,
      classId: lessons.classId,
      className: classes.name,
      startedAt: lessons.startedAt,
    })
    .from(lessons)
    .innerJoin(classes, eq(classes.id, lessons.classId))
    .where(and(eq(lessons.teacherId, teacherId), eq(lessons.status, "open")))
    .orderBy(desc(lessons.startedAt));
}

export async function nextTrialPosition(db: Reader, lessonId: string): Promise<{ next: number; count: number }> {
  const [row] = await db
    .select({ max: sql<number>`coalesce(max(${trials.position}), 0)::int`, n: count() })
    .from(trials)
    .where(eq(trials.lessonId, lessonId));
  return { next: (row?.max ?? 0) + 1, count: row?.n ?? 0 };
}

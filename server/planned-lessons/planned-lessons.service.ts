import { and, eq, isNull } from "drizzle-orm";
import type { z } from "zod";
import type { PlannedLessonItem, RecentLessonItem, planLessonInputSchema } from "../contracts/planned-lessons";
import type { Db } from "../db/client";
import { plannedLessons } from "../db/schema";
import { classForActor } from "../classes/classes.access";
import { AppError, notFound } from "../http/app-error";
import type { Actor } from "../staff/staff.repository";
import { planForStart } from "../lesson-plans/lesson-plans.access";
import * as repo from "./planned-lessons.repository";

/** A lesson planned for 9:00 still shows at 10:30, in case the class started late. */
const STILL_UPCOMING_FOR_MS = 3 * 3600_000;
const UPCOMING_LIMIT = 12;
const RECENT_LIMIT = 6;

const plannedNotFound = () => notFound("That planned lesson");

export async function upcoming(db: Db, actor: Actor, now = new Date()): Promise<PlannedLessonItem[]> {
  const rows = await repo.upcomingOfTeacher(db, actor.id, new Date(now.getTime() - STILL_UPCOMING_FOR_MS), UPCOMING_LIMIT);
  return rows.map((r) => ({ ...r, plannedFor: r.plannedFor.toISOString() }));
}

export async function planLesson(db: Db, actor: Actor, input: z.output<typeof planLessonInputSchema>): Promise<PlannedLessonItem> {
  const cls = await classForActor(db, actor, input.classId, "write");
  if (cls.archivedAt) throw new AppError("bad_request", "This class is archived: restore it to plan a lesson with it.");
  const plan = input.planId
    ? await planForStart(db, actor, input.planId).catch((error: unknown) => {
        // A plan the teacher cannot see is a mistake in the form, not a missing page.
        if (!(error instanceof AppError && error.code === "not_found")) throw error;
        throw new AppError("validation_failed", "Some of the details need correcting.", {
          planId: ["That plan was not found among yours or your department's."],
        });
      })
    : null;
  const [row] = await db
    .insert(plannedLessons)
    .values({ classId: cls.id, teacherId: actor.id, planId: plan?.id ?? null, plannedFor: input.plannedFor })
    .returning();
  return {
    id: row!.id,
    classId: cls.id,
    className: cls.name,
    planId: plan?.id ?? null,
    planTitle: plan?.title ?? null,
    trialCount: plan ? plan.trials.length : null,
    plannedFor: row!.plannedFor.toISOString(),
  };
}

/** The teacher's own planned lesson, not yet started (anyone else's is "not found"). */
export async function ownPlanned(db: Db, actor: Actor, id: string) {
  const row = await repo.findPlanned(db, id);
  if (!row || row.teacherId !== actor.id) throw plannedNotFound();
  return row;
}

export async function removePlanned(db: Db, actor: Actor, id: string): Promise<void> {
  await ownPlanned(db, actor, id);
  await db.delete(plannedLessons).where(eq(plannedLessons.id, id));
}

/** Links the live lesson started from a planned one, so it leaves the list of what comes next. */
export async function markStarted(db: Db, id: string, lessonId: string): Promise<void> {
  await db.update(plannedLessons).set({ lessonId }).where(and(eq(plannedLessons.id, id), isNull(plannedLessons.lessonId)));
}

export async function recent(db: Db, actor: Actor): Promise<RecentLessonItem[]> {
  const rows = await repo.recentOfTeacher(db, actor.id, RECENT_LIMIT);
  return rows.map((r) => ({ ...r, startedAt: r.startedAt.toISOString() }));
}

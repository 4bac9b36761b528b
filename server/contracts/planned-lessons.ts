import { z } from "zod";

/**
 * Lessons in the teacher's diary: a class, a time and optionally a plan, so home can show what
 * comes next and start it in one click.
 */

/** How far ahead a lesson can be put in the diary (a school year and a bit). */
export const PLANNED_LESSON_MAX_DAYS_AHEAD = 400;

export const planLessonInputSchema = z.object({
  classId: z.uuid({ error: "Pick a class." }),
  planId: z.uuid({ error: "Pick one of the plans, or none." }).nullable().default(null),
  plannedFor: z.iso
    .datetime({ offset: true, error: "Give the lesson's date and time." })
    .transform((s) => new Date(s))
    .refine((d) => d.getTime() > Date.now() - 24 * 3600_000, "That time has passed: pick a time from today on.")
    .refine(
      (d) => d.getTime() < Date.now() + PLANNED_LESSON_MAX_DAYS_AHEAD * 24 * 3600_000,
      `Pick a time within ${PLANNED_LESSON_MAX_DAYS_AHEAD} days.`,
    ),
});
export type PlanLessonInput = z.input<typeof planLessonInputSchema>;

export interface PlannedLessonItem {
  id: string;
  classId: string;
  className: string;
  planId: string | null;
  /** Null when no plan was picked, or when the plan has since been deleted. */
  planTitle: string | null;
  trialCount: number | null;
  plannedFor: string;
}

/** One of the teacher's recent lessons, across their classes, newest first. */
export interface RecentLessonItem {
  id: string;
  classId: string;
  className: string;
  code: string;
  status: "open" | "ended";
  planTitle: string | null;
  startedAt: string;
  /** Trials with a recorded run. */
  trialsRun: number;
  participantCount: number;
}

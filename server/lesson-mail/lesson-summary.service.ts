import { eq } from "drizzle-orm";
import { median } from "simple-statistics";
import { QUESTION_QUANTITIES, RIG_NAMES } from "../contracts/lesson-questions";
import type { Db } from "../db/client";
import { schools, staff } from "../db/schema";
import * as repo from "../lessons/lessons.repository";
import { teacherLesson } from "../lessons/lessons.views";
import type { Mailer } from "../mail/mailer";
import { lessonSummaryMail, type SummaryTrial } from "./lesson-summary.mail";

/**
 * Sends the lesson's teacher a summary once the lesson has ended. Built from the teacher's own
 * view of the lesson, then reduced to class totals: no pupil's name or answer leaves in it.
 */
export async function sendLessonSummary(db: Db, deps: { mailer: Pick<Mailer, "send">; publicUrl: string }, lessonId: string): Promise<boolean> {
  const bundle = await repo.loadLessonBundle(db, lessonId);
  if (!bundle || bundle.lesson.status !== "ended" || !bundle.lesson.endedAt) return false;
  const [teacher] = await db
    .select({ email: staff.email, displayName: staff.displayName, removedAt: staff.removedAt, timeZone: schools.timeZone })
    .from(staff)
    .innerJoin(schools, eq(schools.id, staff.schoolId))
    .where(eq(staff.id, bundle.lesson.teacherId));
  if (!teacher || teacher.removedAt) return false;

  const view = teacherLesson(bundle, new Set(), deps.publicUrl);
  const trials: SummaryTrial[] = view.trials.map((trial) => {
    const first = trial.predictions.filter((p) => p.round === 1);
    const tallyValues = trial.tally[1]?.values ?? [];
    const values = [...first.flatMap((p) => (p.value === null ? [] : [p.value])), ...tallyValues];
    const tallyCount = (trial.tally[1]?.counts ?? []).reduce((a, b) => a + b, 0) + tallyValues.length;
    const quantity = QUESTION_QUANTITIES[trial.rig].find((q) => q.key === trial.question.quantity);
    return {
      position: trial.position,
      rigName: RIG_NAMES[trial.rig],
      prompt: trial.question.prompt || quantity?.label || "",
      unit: trial.question.unit,
      answerCount: first.length + tallyCount,
      medianAnswer: trial.question.kind === "number" && values.length ? median(values) : null,
      result: trial.result?.value ?? null,
      theory: trial.theory?.value ?? null,
    };
  });
  await deps.mailer.send(
    lessonSummaryMail({
      to: teacher.email,
      teacherName: teacher.displayName,
      className: bundle.className,
      startedAt: bundle.lesson.startedAt,
      endedAt: bundle.lesson.endedAt,
      timeZone: teacher.timeZone,
      participantCount: bundle.participants.length,
      trials,
      reviewUrl: `${deps.publicUrl}/lessons/${lessonId}/review`,
    }),
  );
  return true;
}

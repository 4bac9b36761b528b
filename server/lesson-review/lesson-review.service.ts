import { quantileSorted } from "simple-statistics";
import type { RigId } from "../../sim";
import { classForActor } from "../classes/classes.access";
import { RIG_NAMES, quantityOf } from "../contracts/lesson-questions";
import { closenessOf, type LessonReview, type ReviewPupil, type ReviewTrial, type RoundSummary } from "../contracts/lesson-review";
import { ROUNDS, type Round } from "../contracts/lesson-rules";
import type { Db } from "../db/client";
import { forbidden, notFound } from "../http/app-error";
import { findLessonWithClass, loadLessonBundle } from "../lessons/lessons.repository";
import { resultOf, shownParamsOf, theoryOf, type LessonBundle, type TrialRow } from "../lessons/lessons.views";
import { theoryInQuestionUnit } from "../lessons/setup-theory";
import type { Actor } from "../staff/staff.repository";

const lessonNotFound = () => notFound("That lesson");

/**
 * The lesson's own teacher only: the review carries pupils' names and every answer. Like ending
 * a lesson: someone who may read the class (its head of department) is told no (403); anyone
 * else, another school included, learns nothing (404). Admins are stopped at the route guard.
 */
export async function lessonBundleForOwner(db: Db, actor: Actor, lessonId: string): Promise<LessonBundle> {
  const head = await findLessonWithClass(db, lessonId);
  if (!head || head.schoolId !== actor.schoolId) throw lessonNotFound();
  if (head.lesson.teacherId !== actor.id) {
    await classForActor(db, actor, head.lesson.classId, "read").catch(() => {
      throw lessonNotFound();
    });
    throw forbidden("Only the lesson's teacher can review it.");
  }
  const bundle = await loadLessonBundle(db, lessonId);
  if (!bundle) throw lessonNotFound();
  return bundle;
}

/**
 * Median, quartiles (R-7 linear interpolation, as simple-statistics' quantileSorted and the
 * board's summary figures: Hyndman & Fan, The American Statistician 50(4), 1996) and the count
 * within 10 % of the result, over every number answer of a round: pupils' own and a show of hands.
 */
export function summariseRound(round: Round, values: number[], choices: number[] | null, result: number | null): RoundSummary {
  const sorted = values.filter(Number.isFinite).sort((a, b) => a - b);
  const n = sorted.length;
  const lower = n ? quantileSorted(sorted, 0.25) : null;
  const upper = n ? quantileSorted(sorted, 0.75) : null;
  return {
    round,
    count: choices ? choices.reduce((a, b) => a + b, 0) : n,
    median: n ? quantileSorted(sorted, 0.5) : null,
    lowerQuartile: lower,
    upperQuartile: upper,
    spread: lower !== null && upper !== null ? upper - lower : null,
    min: n ? sorted[0]! : null,
    max: n ? sorted[n - 1]! : null,
    within10: result === null || choices ? null : sorted.filter((v) => closenessOf(v, result)?.within10).length,
    choiceCounts: choices,
  };
}

function summariesOf(trial: TrialRow, rows: LessonBundle["predictions"], result: number | null): Record<Round, RoundSummary> {
  const question = trial.question;
  const out = {} as Record<Round, RoundSummary>;
  for (const round of ROUNDS) {
    const mine = rows.filter((p) => p.round === round);
    const tally = round === 1 ? trial.tallyFirst : trial.tallySecond;
    if (question.kind === "choice") {
      const counts = question.choices.map((_, i) => mine.filter((p) => p.choice === i).length + (tally?.counts?.[i] ?? 0));
      out[round] = summariseRound(round, [], counts, result);
    } else {
      const values = [...mine.flatMap((p) => (p.value === null ? [] : [p.value])), ...(tally?.values ?? [])];
      out[round] = summariseRound(round, values, null, result);
    }
  }
  return out;
}

function reviewTrial(trial: TrialRow, bundle: LessonBundle, names: Map<string, string>): ReviewTrial {
  const rig = trial.rig as RigId;
  const result = resultOf(trial);
  // A trial not yet run has no stored theory: work it out from its set-up, as the board shows it.
  const theory = trial.ranAt ? theoryOf(trial) : theoryInQuestionUnit({ rig, params: trial.params, question: trial.question });
  const question = trial.question;
  const rows = bundle.predictions.filter((p) => p.trialId === trial.id);
  return {
    id: trial.id,
    position: trial.position,
    rig,
    rigLabel: RIG_NAMES[rig],
    quantityLabel: quantityOf(rig, question.quantity)?.label ?? question.quantity,
    shownParams: shownParamsOf(rig, trial.params),
    question,
    ranAt: trial.ranAt?.toISOString() ?? null,
    result,
    theory,
    predictions: rows.map((p) => ({
      id: p.id,
      participantId: p.participantId,
      pupil: names.get(p.participantId) ?? "",
      round: p.round,
      value: p.value,
      choice: p.choice,
      choiceLabel: question.kind === "choice" && p.choice !== null ? (question.choices[p.choice]?.label ?? null) : null,
      reason: p.reason,
      closeness: p.value !== null && result ? closenessOf(p.value, result.value) : null,
      submittedAt: p.updatedAt.toISOString(),
    })),
    explanations: bundle.explanations
      .filter((e) => e.trialId === trial.id)
      .map((e) => ({
        id: e.id,
        participantId: e.participantId,
        pupil: names.get(e.participantId) ?? "",
        text: e.text,
        shown: e.shownAt !== null,
        submittedAt: e.createdAt.toISOString(),
      })),
    tally: { 1: trial.tallyFirst ?? null, 2: trial.tallySecond ?? null },
    summary: summariesOf(trial, rows, result?.value ?? null),
  };
}

/** Everything about one lesson for its teacher: per trial and per pupil. */
export function buildReview(bundle: LessonBundle): LessonReview {
  const { lesson } = bundle;
  const names = new Map(bundle.participants.map((p) => [p.id, p.displayName]));
  const trials = bundle.trials.map((t) => reviewTrial(t, bundle, names));
  const pupils: ReviewPupil[] = bundle.participants.map((p) => {
    const predictions = trials.flatMap((t) =>
      t.predictions
        .filter((x) => x.participantId === p.id)
        .map((x) => ({ trialId: t.id, position: t.position, round: x.round, value: x.value, choice: x.choice, closeness: x.closeness })),
    );
    const compared = predictions.filter((x) => x.closeness !== null);
    return {
      participantId: p.id,
      displayName: p.displayName,
      predictions,
      predictionCount: predictions.length,
      explanationCount: bundle.explanations.filter((e) => e.participantId === p.id).length,
      comparedCount: compared.length,
      within10Count: compared.filter((x) => x.closeness!.within10).length,
    };
  });
  return {
    lesson: {
      id: lesson.id,
      classId: lesson.classId,
      className: bundle.className,
      code: lesson.code,
      status: lesson.status,
      startedAt: lesson.startedAt.toISOString(),
      endedAt: lesson.endedAt?.toISOString() ?? null,
      planTitle: lesson.planTitle ?? null,
    },
    participants: bundle.participants.map((p) => ({ id: p.id, displayName: p.displayName })),
    trials,
    pupils,
  };
}

export async function reviewForActor(db: Db, actor: Actor, lessonId: string): Promise<LessonReview> {
  return buildReview(await lessonBundleForOwner(db, actor, lessonId));
}

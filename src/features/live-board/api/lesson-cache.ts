import type { TeacherExplanation, TeacherLesson, TeacherPrediction, TeacherTrial } from "@contracts/lessons";
import type { Round } from "@contracts/lesson-rules";

/**
 * The teacher view as the board keeps it: the server's TeacherLesson plus the joined count from
 * `participants:counted` (null until the first count arrives; then it wins over the roster list).
 * Every merge returns a new object and leaves the old one alone (TanStack Query compares by reference).
 */
export interface LiveTeacherLesson extends TeacherLesson {
  joinedCount: number | null;
}

/** Joined pupils: the latest count from the server, else those online in the last full view. */
export const joinedCountOf = (lesson: LiveTeacherLesson) =>
  lesson.joinedCount ?? lesson.participants.filter((p) => p.online).length;

/** A full view replaces what we had; the joined count comes from the new view. */
export const replaceLesson = (next: TeacherLesson): LiveTeacherLesson => ({ ...next, joinedCount: null });

function updateTrial(lesson: LiveTeacherLesson, trialId: string, change: (trial: TeacherTrial) => TeacherTrial): LiveTeacherLesson {
  const index = lesson.trials.findIndex((t) => t.id === trialId);
  // A broadcast about a trial we have not seen yet: the full view that names it is on its way.
  if (index < 0) return lesson;
  const trials = lesson.trials.slice();
  trials[index] = change(lesson.trials[index]!);
  return { ...lesson, trials };
}

function upsertById<T extends { id: string }>(list: readonly T[], item: T): T[] {
  const index = list.findIndex((x) => x.id === item.id);
  if (index < 0) return [...list, item];
  const next = list.slice();
  next[index] = item;
  return next;
}

export const mergePrediction = (lesson: LiveTeacherLesson, payload: { trialId: string; prediction: TeacherPrediction }) =>
  updateTrial(lesson, payload.trialId, (trial) => ({ ...trial, predictions: upsertById(trial.predictions, payload.prediction) }));

export const mergeExplanation = (lesson: LiveTeacherLesson, payload: { trialId: string; explanation: TeacherExplanation }) =>
  updateTrial(lesson, payload.trialId, (trial) => ({ ...trial, explanations: upsertById(trial.explanations, payload.explanation) }));

export const mergeAnswersCounted = (lesson: LiveTeacherLesson, payload: { trialId: string; round: Round; count: number }) =>
  updateTrial(lesson, payload.trialId, (trial) => ({ ...trial, answered: { ...trial.answered, [payload.round]: payload.count } }));

export const mergeParticipantsCounted = (lesson: LiveTeacherLesson, payload: { lessonId: string; count: number }) =>
  payload.lessonId === lesson.id ? { ...lesson, joinedCount: payload.count } : lesson;

/** The trial everybody sees (the lesson's current one). */
export const currentTrialOf = (lesson: TeacherLesson): TeacherTrial | null =>
  lesson.trials.find((t) => t.id === lesson.currentTrialId) ?? null;

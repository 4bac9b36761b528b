import type { z } from "zod";
import { LINK_SHAPE_LABELS, RIGS, numberMetaOf, type LinkShape, type RigId } from "../../sim";
import { perSiOf, type Round } from "../contracts/lesson-rules";
import { RIG_NAMES, quantityOf } from "../contracts/lesson-questions";
import type {
  PublicLesson,
  PublicTrial,
  ShownParam,
  ShownValue,
  TeacherExplanation,
  TeacherLesson,
  TeacherPrediction,
  TeacherTrial,
} from "../contracts/lessons";
import type { explanations, lessonParticipants, lessons, predictions, trials } from "../db/schema";

export type LessonRow = typeof lessons.$inferSelect;
export type TrialRow = typeof trials.$inferSelect;
export type PredictionRow = typeof predictions.$inferSelect;
export type ExplanationRow = typeof explanations.$inferSelect;
export type ParticipantRow = Pick<typeof lessonParticipants.$inferSelect, "id" | "displayName">;

/** Everything about one lesson, loaded at once; the views pick from it. */
export interface LessonBundle {
  lesson: LessonRow;
  className: string;
  schoolId: string;
  participants: ParticipantRow[];
  trials: TrialRow[];
  predictions: PredictionRow[];
  explanations: ExplanationRow[];
}

/** Phases after the run has been shown: answers may be public from here on. */
const PAST_PREDICT = new Set(["observe", "explain", "revote"]);

function shapeOf(schema: z.ZodType): Record<string, z.ZodType> | null {
  const shape = (schema as unknown as { shape?: Record<string, z.ZodType> }).shape;
  return shape ?? null;
}

/**
 * The set-up as people read it: numbered parameters with label and unit, the link shape in
 * words. The time step is the simulation's business and is left out; α and β are shown since
 * the theory line uses them.
 */
export function shownParamsOf(rig: RigId, params: Record<string, unknown>): ShownParam[] {
  const shape = shapeOf(RIGS[rig].schema);
  if (!shape) return [];
  const shown: ShownParam[] = [];
  for (const [key, field] of Object.entries(shape)) {
    if (key === "dt") continue;
    const value = params[key];
    if (key === "linkShape" && typeof value === "string") {
      shown.push({ key, label: "Link shape", unit: "", value: LINK_SHAPE_LABELS[value as LinkShape] ?? value });
      continue;
    }
    const meta = numberMetaOf(field);
    if (meta && typeof value === "number") shown.push({ key, label: meta.label, unit: meta.unit, value });
  }
  return shown;
}

function inQuestionUnit(trial: TrialRow, si: number | undefined, uncertainty: number | null): ShownValue | null {
  if (si === undefined || !Number.isFinite(si)) return null;
  const quantity = quantityOf(trial.rig as RigId, trial.question.quantity);
  if (!quantity) return null;
  const per = perSiOf(quantity.siUnit, trial.question.unit);
  if (per === null) return null;
  return { value: si * per, uncertainty: uncertainty === null ? null : uncertainty * per, unit: trial.question.unit };
}

/** The measured result in the question's unit (null before a run). */
export function resultOf(trial: TrialRow): ShownValue | null {
  const settled = trial.measured?.[trial.question.quantity];
  return settled ? inQuestionUnit(trial, settled.value, settled.uncertainty) : null;
}

/** The closed-form value in the question's unit (null where the theory gives none). */
export function theoryOf(trial: TrialRow): ShownValue | null {
  return trial.theory ? inQuestionUnit(trial, trial.theory[trial.question.quantity], null) : null;
}

function answeredOf(trialId: string, rows: PredictionRow[]): Record<Round, number> {
  const answered: Record<Round, number> = { 1: 0, 2: 0 };
  for (const p of rows) if (p.trialId === trialId) answered[p.round] += 1;
  return answered;
}

/** Answers without names: devices' answers, then a show of hands expanded into anonymous answers. */
function anonymousAnswers(trial: TrialRow, rows: PredictionRow[]): PublicTrial["answers"] {
  if (!PAST_PREDICT.has(trial.phase)) return null;
  const answers: NonNullable<PublicTrial["answers"]> = rows
    .filter((p) => p.trialId === trial.id)
    .map((p) => ({ round: p.round, value: p.value, choice: p.choice }));
  const tallies: [Round, TrialRow["tallyFirst"]][] = [
    [1, trial.tallyFirst],
    [2, trial.tallySecond],
  ];
  for (const [round, tally] of tallies) {
    if (!tally) continue;
    tally.counts?.forEach((count, choice) => {
      for (let i = 0; i < count; i++) answers.push({ round, value: null, choice });
    });
    for (const value of tally.values ?? []) answers.push({ round, value, choice: null });
  }
  return answers;
}

function baseTrial(trial: TrialRow, bundle: LessonBundle) {
  const rig = trial.rig as RigId;
  return {
    id: trial.id,
    position: trial.position,
    rig,
    rigLabel: RIG_NAMES[rig],
    rigSummary: RIGS[rig].summary,
    params: trial.params,
    shownParams: shownParamsOf(rig, trial.params),
    question: trial.question,
    phase: trial.phase,
    answered: answeredOf(trial.id, bundle.predictions),
    result: resultOf(trial),
    theory: trial.ranAt ? theoryOf(trial) : null,
    notes: RIGS[rig].notes ?? [],
  };
}

export function publicTrial(trial: TrialRow, bundle: LessonBundle): PublicTrial {
  return {
    ...baseTrial(trial, bundle),
    answers: anonymousAnswers(trial, bundle.predictions),
    shownExplanations: bundle.explanations
      .filter((e) => e.trialId === trial.id && e.shownAt !== null)
      .map((e) => ({ id: e.id, text: e.text })),
  };
}

/** What everyone in the lesson (pupils, board) may see: no names, no ids of pupils. */
export function publicLesson(bundle: LessonBundle): PublicLesson {
  const { lesson } = bundle;
  const current = bundle.trials.find((t) => t.id === lesson.currentTrialId) ?? null;
  return {
    id: lesson.id,
    code: lesson.code,
    className: bundle.className,
    status: lesson.status,
    joinedCount: bundle.participants.length,
    trialCount: bundle.trials.length,
    trial: current ? publicTrial(current, bundle) : null,
  };
}

export function teacherPrediction(row: PredictionRow, participantName: string): TeacherPrediction {
  return {
    id: row.id,
    participantId: row.participantId,
    participantName,
    round: row.round,
    value: row.value,
    choice: row.choice,
    reason: row.reason,
    createdAt: row.updatedAt.toISOString(),
  };
}

export function teacherExplanation(row: ExplanationRow, participantName: string): TeacherExplanation {
  return {
    id: row.id,
    participantId: row.participantId,
    participantName,
    text: row.text,
    shown: row.shownAt !== null,
    createdAt: row.createdAt.toISOString(),
  };
}

function teacherTrial(trial: TrialRow, bundle: LessonBundle, names: Map<string, string>): TeacherTrial {
  return {
    ...baseTrial(trial, bundle),
    seed: trial.seed,
    measured: trial.measured ?? null,
    theoryValues: trial.theory ?? null,
    predictions: bundle.predictions
      .filter((p) => p.trialId === trial.id)
      .map((p) => teacherPrediction(p, names.get(p.participantId) ?? "")),
    explanations: bundle.explanations
      .filter((e) => e.trialId === trial.id)
      .map((e) => teacherExplanation(e, names.get(e.participantId) ?? "")),
    tally: { 1: trial.tallyFirst ?? null, 2: trial.tallySecond ?? null },
    ranAt: trial.ranAt?.toISOString() ?? null,
  };
}

/** The lesson's teacher's view: everything, with names. `online` holds participants with a connected device. */
export function teacherLesson(bundle: LessonBundle, online: ReadonlySet<string>, publicUrl: string): TeacherLesson {
  const { lesson } = bundle;
  const names = new Map(bundle.participants.map((p) => [p.id, p.displayName]));
  return {
    id: lesson.id,
    code: lesson.code,
    classId: lesson.classId,
    className: bundle.className,
    status: lesson.status,
    showNames: lesson.showNames,
    planTitle: lesson.planTitle ?? null,
    startedAt: lesson.startedAt.toISOString(),
    endedAt: lesson.endedAt?.toISOString() ?? null,
    currentTrialId: lesson.currentTrialId,
    participants: bundle.participants.map((p) => ({ id: p.id, displayName: p.displayName, online: online.has(p.id) })),
    trials: bundle.trials.map((t) => teacherTrial(t, bundle, names)),
    joinUrl: `${publicUrl}/join/${lesson.code}`,
  };
}

import type { TeacherLesson, TeacherTrial } from "@contracts/lessons";
import { perSiOf } from "@contracts/lesson-rules";

/** One answer as the graphs take it: never a name. */
export interface AnonymousAnswer {
  round: 1 | 2;
  value: number | null;
  choice: number | null;
}

/** Every answer of a trial without names: the pupils' own and what a show of hands gave. */
export function anonymousAnswers(trial: { predictions: readonly AnonymousAnswer[]; tally: TeacherTrial["tally"] }): AnonymousAnswer[] {
  const answers: AnonymousAnswer[] = trial.predictions.map((p) => ({ round: p.round, value: p.value, choice: p.choice }));
  for (const round of [1, 2] as const) {
    const tally = trial.tally[round];
    if (!tally) continue;
    for (const value of tally.values ?? []) answers.push({ round, value, choice: null });
    tally.counts?.forEach((count, choice) => {
      for (let i = 0; i < count; i++) answers.push({ round, value: null, choice });
    });
  }
  return answers;
}

/** A fountain trial on the lesson's series graph: pot height (m), predictions and result in `unit`. */
export interface SeriesPoint {
  potHeight: number;
  predictions: number[];
  result: number | null;
}

/**
 * The lesson's fountain trials that asked for the rise, in one unit (each trial may have asked in
 * its own): what the series graph plots against pot height. Trials not yet run still show their predictions.
 */
export function fountainSeries(lesson: Pick<TeacherLesson, "trials">, unit: string): SeriesPoint[] {
  const perMetre = perSiOf("m", unit);
  if (perMetre === null) return [];
  return lesson.trials.flatMap((trial) => {
    if (trial.rig !== "fountain" || trial.question.kind !== "number" || trial.question.quantity !== "rise") return [];
    const asked = perSiOf("m", trial.question.unit);
    const potHeight = Number(trial.params.potHeight);
    if (asked === null || !Number.isFinite(potHeight)) return [];
    const toUnit = (v: number) => (v / asked) * perMetre;
    const predictions = anonymousAnswers(trial).flatMap((a) => (a.round === 1 && a.value !== null ? [toUnit(a.value)] : []));
    const rise = trial.measured?.rise?.value;
    return [{ potHeight, predictions, result: rise === undefined ? null : rise * perMetre }];
  });
}

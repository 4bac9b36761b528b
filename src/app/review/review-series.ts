import { perSiOf } from "@contracts/lesson-rules";
import type { LessonReview, ReviewTrial } from "@contracts/lesson-review";
import type { FountainSeriesTrial } from "@/features/lesson-graph/components/fountain-series-graph";
import { anonymousAnswers } from "../lesson/lesson-answers";

export const isFountainRise = (t: ReviewTrial) => t.rig === "fountain" && t.question.kind === "number" && t.question.quantity === "rise";
export const paramOf = (t: ReviewTrial, key: string) => {
  const value = t.shownParams.find((p) => p.key === key)?.value;
  return typeof value === "number" ? value : Number.NaN;
};

/**
 * The lesson's fountain trials in one unit (each may have asked in its own): pot height, the
 * class's answers before the run (no names) and the result, as the board's series graph takes them.
 */
export function seriesOf(review: LessonReview): { unit: string; trials: FountainSeriesTrial[] } {
  const fountain = review.trials.filter(isFountainRise);
  const unit = fountain[0]?.question.unit ?? "cm";
  const perMetre = perSiOf("m", unit);
  if (perMetre === null) return { unit, trials: [] };
  const trials = fountain.flatMap((t) => {
    const asked = perSiOf("m", t.question.unit);
    const potHeight = paramOf(t, "potHeight");
    if (asked === null || !Number.isFinite(potHeight)) return [];
    const toUnit = (v: number) => (v / asked) * perMetre;
    const predictions = anonymousAnswers(t).flatMap((a) => (a.round === 1 && a.value !== null ? [toUnit(a.value)] : []));
    return [{ potHeight, predictions, result: t.result ? toUnit(t.result.value) : null }];
  });
  return { unit, trials };
}


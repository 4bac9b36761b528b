import { useQuery } from "@tanstack/react-query";
import { perSiOf } from "@contracts/lesson-rules";
import type { LessonReview, ReviewTrial } from "@contracts/lesson-review";
import { benchRunsQueryOptions } from "@/features/bench/api/get-bench-runs";
import { FountainSeriesGraph } from "@/features/lesson-graph/components/fountain-series-graph";
import { TrialGraph } from "@/features/lesson-graph/components/trial-graph";
import { anonymousAnswers } from "../lesson/lesson-answers";
import { isFountainRise, paramOf, seriesOf } from "./review-series";

/**
 * The comparison graph of one reviewed trial, composed here because features never import one
 * another: the graph gets the answers without names (pupils' own and any show of hands).
 */
export function reviewGraph(trial: ReviewTrial) {
  return (
    <TrialGraph
      question={trial.question}
      quantityLabel={trial.quantityLabel}
      answers={anonymousAnswers(trial)}
      result={trial.result}
      theory={trial.theory}
      theme="light"
    />
  );
}

/** Across a lesson with two or more fountain trials: rise against pot height, with the class's real runs and the theory line. */
export function ReviewSeriesGraph({ review }: { review: LessonReview }) {
  const { unit, trials } = seriesOf(review);
  const enough = trials.length > 1;
  const bench = useQuery({ ...benchRunsQueryOptions(review.lesson.classId), enabled: enough });
  if (!enough) return null;
  const perMetre = perSiOf("m", unit) ?? 1;
  const last = review.trials.filter(isFountainRise).at(-1)!;
  const alpha = paramOf(last, "theoryAlpha");
  const beta = paramOf(last, "theoryBeta");
  return (
    <FountainSeriesGraph
      trials={trials}
      unit={unit}
      theory={Number.isFinite(alpha) && Number.isFinite(beta) ? { alpha, beta } : null}
      bench={(bench.data ?? []).map((r) => ({ potHeight: r.potHeightM, rise: r.riseM * perMetre }))}
      theme="light"
    />
  );
}

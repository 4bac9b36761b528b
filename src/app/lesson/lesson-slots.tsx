import type { ReactNode } from "react";
import { QUESTION_QUANTITIES } from "@contracts/lesson-questions";
import { perSiOf, ROUND_PHASE } from "@contracts/lesson-rules";
import { useQuery } from "@tanstack/react-query";
import { benchRunsQueryOptions } from "@/features/bench/api/get-bench-runs";
import { FountainSeriesGraph } from "@/features/lesson-graph/components/fountain-series-graph";
import { TallyForm } from "@/features/lesson-graph/components/tally-form";
import { TrialGraph } from "@/features/lesson-graph/components/trial-graph";
import type { SlotContext } from "@/features/live-board/components/board-view";
import { anonymousAnswers, fountainSeries } from "./lesson-answers";

/** Where the graphs are drawn: the projector (dark, large) or the remote (light). */
type Where = "board" | "light";

/**
 * The board's comparison graph, once the run is under way: this trial's answers (no names) with
 * the simulated result and the theory; and for the fountain, every trial of the lesson with the
 * class's real runs against the theory line.
 */
export function graphPanelFor(where: Where) {
  return function GraphPanel(context: SlotContext): ReactNode {
    return <LessonGraphs {...context} where={where} />;
  };
}

function LessonGraphs({ lesson, trial, where }: SlotContext & { where: Where }) {
  const isFountainRise = trial.rig === "fountain" && trial.question.quantity === "rise" && trial.question.kind === "number";
  // The class's real runs join the fountain graph, beside the simulation and the theory.
  const bench = useQuery({ ...benchRunsQueryOptions(lesson.classId), enabled: isFountainRise });
  if (trial.phase === "setup" || trial.phase === "predict") return null;
  const quantity = QUESTION_QUANTITIES[trial.rig].find((q) => q.key === trial.question.quantity);
  const unit = trial.question.unit;
  const perMetre = perSiOf("m", unit);
  const realRuns = isFountainRise && perMetre !== null ? (bench.data ?? []).map((r) => ({ potHeight: r.potHeightM, rise: r.riseM * perMetre })) : [];
  const series = isFountainRise ? fountainSeries(lesson, unit) : [];
  const alpha = Number(trial.params.theoryAlpha);
  const beta = Number(trial.params.theoryBeta);
  return (
    <div className="grid gap-6">
      <TrialGraph
        question={trial.question}
        quantityLabel={quantity?.label ?? trial.question.quantity}
        answers={anonymousAnswers(trial)}
        result={trial.result}
        theory={trial.theory}
        theme={where}
      />
      {series.length > 1 || realRuns.length > 0 ? (
        <FountainSeriesGraph
          trials={series}
          unit={unit}
          theory={Number.isFinite(alpha) && Number.isFinite(beta) ? { alpha, beta } : null}
          bench={realRuns}
          theme={where}
        />
      ) : null}
    </div>
  );
}

/**
 * The show-of-hands form, while answers are being taken (predict, or the re-vote): for rooms
 * where pupils have no devices. Saving replaces that round's tally.
 */
export function TallyPanel({ trial, send }: SlotContext): ReactNode {
  const round = trial.phase === ROUND_PHASE[2] ? 2 : trial.phase === ROUND_PHASE[1] ? 1 : null;
  if (round === null) return null;
  return (
    <details className="rounded-control border border-line bg-surface px-4 py-3">
      <summary className="min-h-touch cursor-pointer py-2 font-bold">No pupil devices? Type in a show of hands</summary>
      <TallyForm
        key={`${trial.id}-${round}`}
        question={trial.question}
        round={round}
        initial={trial.tally[round]}
        onSubmit={async (tally) => {
          await send("trial:tally", { trialId: trial.id, round, counts: tally.counts, values: tally.values });
        }}
      />
    </details>
  );
}

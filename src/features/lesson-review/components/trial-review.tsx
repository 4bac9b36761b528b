import type { ReactNode } from "react";
import type { ReviewTrial } from "@contracts/lesson-review";
import { CALIBRATED_PILE_NOTE } from "@sim/theory";
import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { Section } from "@/components/ui/section";
import { withUnit } from "../utils/review-table";
import { PredictionsTable } from "./predictions-table";

/** The set-up as a definition list: "Height of the pot above the floor 1 m". */
export function TrialParams({ trial }: { trial: ReviewTrial }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
      {trial.shownParams.map((p) => (
        <div key={p.key} className="contents">
          <dt className="text-ink-muted">{p.label}</dt>
          <dd className="font-mono">{typeof p.value === "number" ? withUnit(p.value, p.unit) : p.value}</dd>
        </div>
      ))}
    </dl>
  );
}

/** Result and theory in the question's unit, in words beside the numbers. */
export function ResultFigures({ trial }: { trial: ReviewTrial }) {
  return (
    <dl className="grid grid-cols-[auto_1fr] gap-x-4 gap-y-1 text-lg">
      <dt className="font-bold">Simulated result</dt>
      <dd className="font-mono">
        {trial.result
          ? `${withUnit(trial.result.value, trial.result.unit)}${trial.result.uncertainty !== null ? ` ± ${withUnit(trial.result.uncertainty, trial.result.unit)}` : ""}`
          : "not run"}
      </dd>
      <dt className="font-bold">Theory</dt>
      <dd className="font-mono">{trial.theory ? withUnit(trial.theory.value, trial.theory.unit) : "—"}</dd>
    </dl>
  );
}

/** One trial of the review: set-up, result and theory, the comparison graph (passed in), every prediction and explanation. */
export function TrialReview({ trial, graph }: { trial: ReviewTrial; graph: ReactNode }) {
  const shown = trial.explanations.filter((e) => e.shown).length;
  return (
    <Section
      title={`Trial ${trial.position}: ${trial.rigLabel}`}
      description={
        <>
          <span className="block text-lg text-ink">{trial.question.prompt}</span>
          {trial.quantityLabel}
          {trial.question.unit ? `, in ${trial.question.unit}` : ""}
        </>
      }
    >
      <div className="grid gap-6 [&>*]:min-w-0">
        <div className="grid gap-6 md:grid-cols-2 [&>*]:min-w-0">
          <div>
            <h3 className="mb-2 font-bold">Set-up</h3>
            <TrialParams trial={trial} />
          </div>
          <div>
            <h3 className="mb-2 font-bold">Result</h3>
            <ResultFigures trial={trial} />
            {trial.rig === "fountain" && trial.result ? <p className="mt-2 text-sm text-ink-muted">{CALIBRATED_PILE_NOTE}</p> : null}
          </div>
        </div>
        {trial.predictions.length > 0 || trial.tally[1] || trial.tally[2] ? <div className="relative overflow-hidden">{graph}</div> : null}
        <div>
          <h3 className="mb-2 text-lg font-bold">Predictions</h3>
          {trial.tally[1] || trial.tally[2] ? (
            <p className="mb-2 text-ink-muted">A show of hands was also taken: it is counted in the graph and the totals, without names.</p>
          ) : null}
          {trial.predictions.length === 0 ? (
            <EmptyState title="No predictions from pupils’ devices in this trial." />
          ) : (
            <PredictionsTable trial={trial} />
          )}
        </div>
        <div>
          <h3 className="mb-2 text-lg font-bold">
            Explanations{" "}
            <span className="font-normal text-ink-muted">
              ({trial.explanations.length}, {shown} shown on the board)
            </span>
          </h3>
          {trial.explanations.length === 0 ? (
            <p className="text-ink-muted">No explanations in this trial.</p>
          ) : (
            <ul className="grid gap-2" data-testid="explanations">
              {trial.explanations.map((e) => (
                <li key={e.id} className="rounded-control border border-line px-3 py-2">
                  <p className="flex flex-wrap items-center gap-2 font-bold">
                    {e.pupil}
                    {e.shown ? <Badge tone="accent">Shown on the board, without the name</Badge> : null}
                  </p>
                  <p className="[overflow-wrap:anywhere]">{e.text}</p>
                </li>
              ))}
            </ul>
          )}
        </div>
      </div>
    </Section>
  );
}

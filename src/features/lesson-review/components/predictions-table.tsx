import { useMemo, useState } from "react";
import type { ReviewTrial } from "@contracts/lesson-review";
import { SelectField, TextField } from "@/components/ui/field";
import {
  filterPredictions,
  formatCloseness,
  nextSort,
  predictionSortValue,
  sortRows,
  withUnit,
  type PredictionColumn,
  type RoundFilter,
  type SortState,
} from "../utils/review-table";
import { SortableHeader } from "./sortable-header";

const ROUND_WORDS = { 1: "Before the run", 2: "Re-vote" } as const;

/** Every pupil's prediction for one trial, with names (the teacher's review only): sortable by any column, filterable by name and round. */
export function PredictionsTable({ trial }: { trial: ReviewTrial }) {
  const [sort, setSort] = useState<SortState<PredictionColumn> | null>(null);
  const [search, setSearch] = useState("");
  const [round, setRound] = useState<RoundFilter>("all");
  const hasRevote = trial.predictions.some((p) => p.round === 2);
  const unit = trial.question.unit;

  const rows = useMemo(() => {
    const kept = filterPredictions(trial.predictions, search, round);
    return sort ? sortRows(kept, (r) => predictionSortValue(r, sort.key), sort.direction) : kept;
  }, [trial.predictions, search, round, sort]);

  const onSort = (column: PredictionColumn) => setSort((s) => nextSort(s, column));
  const header = (column: PredictionColumn, label: string) => <SortableHeader column={column} label={label} sort={sort} onSort={onSort} />;

  return (
    <div className="grid gap-3 [&>*]:min-w-0">
      <div className="flex flex-wrap items-end gap-3">
        <TextField
          label={`Find a pupil in trial ${trial.position}`}
          type="search"
          value={search}
          onChange={(e) => setSearch(e.target.value)}
          wrapperClassName="w-full sm:w-64"
        />
        {hasRevote ? (
          <SelectField label={`Round (trial ${trial.position})`} value={round} onChange={(e) => setRound(e.target.value as RoundFilter)} wrapperClassName="w-full sm:w-48">
            <option value="all">Both rounds</option>
            <option value="1">Before the run</option>
            <option value="2">Re-vote</option>
          </SelectField>
        ) : null}
        <p role="status" className="pb-3 text-sm text-ink-muted">
          Showing {rows.length} of {trial.predictions.length} prediction{trial.predictions.length === 1 ? "" : "s"}
        </p>
      </div>
      <div className="overflow-x-auto rounded-control border border-line">
        <table className="w-full min-w-[40rem] text-left" data-testid="predictions-table">
          <caption className="sr-only">
            Predictions for trial {trial.position}, with each pupil’s name. Column headers sort the table.
          </caption>
          <thead className="bg-sunken text-sm">
            <tr>
              {header("pupil", "Pupil")}
              {header("round", "Round")}
              {header("answer", unit ? `Answer (${unit})` : "Answer")}
              {header("closeness", "How close")}
              {header("reason", "Reason")}
            </tr>
          </thead>
          <tbody>
            {rows.length === 0 ? (
              <tr>
                <td colSpan={5} className="px-3 py-4 text-center text-ink-muted">
                  No predictions match.
                </td>
              </tr>
            ) : (
              rows.map((p) => {
                const close = formatCloseness(p.closeness);
                return (
                  <tr key={p.id} className="border-t border-line align-top">
                    <td className="px-3 py-2 font-bold [overflow-wrap:anywhere]">{p.pupil}</td>
                    <td className="whitespace-nowrap px-3 py-2">{ROUND_WORDS[p.round]}</td>
                    <td className="whitespace-nowrap px-3 py-2 font-mono">
                      {p.value !== null ? withUnit(p.value, unit) : (p.choiceLabel ?? "—")}
                    </td>
                    <td className="whitespace-nowrap px-3 py-2">
                      {close ? (
                        <span className={p.closeness?.within10 ? "font-bold text-ok" : undefined}>
                          {p.closeness?.within10 ? <span aria-hidden="true">✓ </span> : null}
                          {close}
                        </span>
                      ) : (
                        <span className="text-ink-muted">—</span>
                      )}
                    </td>
                    <td className="min-w-48 px-3 py-2 [overflow-wrap:anywhere]">{p.reason || <span className="text-ink-muted">—</span>}</td>
                  </tr>
                );
              })
            )}
          </tbody>
        </table>
      </div>
    </div>
  );
}

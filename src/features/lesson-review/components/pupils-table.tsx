import { useMemo, useState } from "react";
import type { LessonReview, ReviewPupil } from "@contracts/lesson-review";
import { formatCloseness, nextSort, sortRows, withUnit, type SortState } from "../utils/review-table";
import { SortableHeader } from "./sortable-header";

type PupilColumn = "pupil" | "within";

/** Pupils down, trials across: each pupil's answers in every trial and how close each was. */
export function PupilsTable({ review }: { review: LessonReview }) {
  const [sort, setSort] = useState<SortState<PupilColumn> | null>({ key: "pupil", direction: "ascending" });
  const rows = useMemo(() => {
    if (!sort) return review.pupils;
    const valueOf = (p: ReviewPupil) => (sort.key === "pupil" ? p.displayName : p.comparedCount ? p.within10Count / p.comparedCount : null);
    return sortRows(review.pupils, valueOf, sort.direction);
  }, [review.pupils, sort]);
  const onSort = (column: PupilColumn) => setSort((s) => nextSort(s, column));

  return (
    <div className="overflow-x-auto rounded-control border border-line">
      <table className="w-full text-left" data-testid="pupils-table">
        <caption className="sr-only">Each pupil’s predictions across the lesson, trial by trial, with how close each was to the result.</caption>
        <thead className="bg-sunken text-sm">
          <tr>
            <SortableHeader column="pupil" label="Pupil" sort={sort} onSort={onSort} />
            {review.trials.map((t) => (
              <th key={t.id} scope="col" className="px-3 py-2 align-bottom">
                Trial {t.position}
                <span className="block font-normal text-ink-muted">
                  {t.result ? `result ${withUnit(t.result.value, t.result.unit)}` : "not run"}
                </span>
              </th>
            ))}
            <SortableHeader column="within" label="Within 10 %" sort={sort} onSort={onSort} />
          </tr>
        </thead>
        <tbody>
          {rows.map((p) => (
            <tr key={p.participantId} className="border-t border-line align-top">
              <th scope="row" className="px-3 py-2 text-left font-bold [overflow-wrap:anywhere]">
                {p.displayName}
              </th>
              {review.trials.map((t) => {
                const mine = p.predictions.filter((x) => x.trialId === t.id);
                return (
                  <td key={t.id} className="px-3 py-2">
                    {mine.length === 0 ? (
                      <span className="text-ink-muted">no answer</span>
                    ) : (
                      <ul className="grid gap-1">
                        {mine.map((x) => {
                          const label = t.question.kind === "choice" && x.choice !== null ? (t.question.choices[x.choice]?.label ?? "?") : null;
                          const close = formatCloseness(x.closeness);
                          return (
                            <li key={x.round}>
                              <span className="text-sm text-ink-muted">{x.round === 1 ? "Before: " : "Re-vote: "}</span>
                              <span className="font-mono">{x.value !== null ? withUnit(x.value, t.question.unit) : label}</span>
                              {close ? (
                                <span className={x.closeness?.within10 ? "block text-sm font-bold text-ok" : "block text-sm"}>
                                  {x.closeness?.within10 ? <span aria-hidden="true">✓ </span> : null}
                                  {close}
                                </span>
                              ) : null}
                            </li>
                          );
                        })}
                      </ul>
                    )}
                  </td>
                );
              })}
              <td className="whitespace-nowrap px-3 py-2">
                {p.comparedCount ? `${p.within10Count} of ${p.comparedCount}` : "—"}
                <span className="block text-sm text-ink-muted">
                  {p.explanationCount} explanation{p.explanationCount === 1 ? "" : "s"}
                </span>
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}

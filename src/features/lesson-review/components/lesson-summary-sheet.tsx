import type { ReactNode } from "react";
import type { LessonReview, ReviewTrial, RoundSummary } from "@contracts/lesson-review";
import { formatReviewDate } from "../utils/review-date";
import { formatNumber, withUnit } from "../utils/review-table";

/** Parameters worth a line on paper: the rest of the set-up is in the review and the results export. */
const PRINTED_PARAMS = new Set(["linkShape", "potHeight", "span", "heightDifference", "chainLength", "speed", "liftHeight", "lambda"]);

function RoundFigures({ s, unit, label, hasResult }: { s: RoundSummary; unit: string; label: string; hasResult: boolean }) {
  if (s.count === 0) return null;
  const parts = [`${s.count} answer${s.count === 1 ? "" : "s"}`];
  if (s.median !== null) parts.push(`median ${withUnit(s.median, unit)}`);
  if (s.lowerQuartile !== null && s.upperQuartile !== null && s.spread !== null) {
    parts.push(`middle half ${formatNumber(s.lowerQuartile)}–${withUnit(s.upperQuartile, unit)} (spread ${withUnit(s.spread, unit)})`);
  }
  if (hasResult && s.within10 !== null && s.count > 0) parts.push(`${s.within10} of ${s.count} within 10 %`);
  return (
    <p>
      <strong>{label}:</strong> {parts.join(" · ")}
    </p>
  );
}

function ChoiceFigures({ trial }: { trial: ReviewTrial }) {
  if (trial.question.kind !== "choice") return null;
  const choices = trial.question.choices;
  return (
    <table className="w-full text-left text-[0.85em]">
      <thead>
        <tr>
          <th scope="col">Choice</th>
          <th scope="col">Before</th>
          {trial.summary[2].count > 0 ? <th scope="col">Re-vote</th> : null}
        </tr>
      </thead>
      <tbody>
        {choices.map((c, i) => (
          <tr key={i}>
            <th scope="row" className="font-normal">{c.label}</th>
            <td>{trial.summary[1].choiceCounts?.[i] ?? 0}</td>
            {trial.summary[2].count > 0 ? <td>{trial.summary[2].choiceCounts?.[i] ?? 0}</td> : null}
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/**
 * One printed page about a lesson, for the department file or the wall: class totals only.
 * It never names a pupil (it may be printed and left lying around): no predictions table, no
 * per-pupil view, and only the explanations the teacher showed on the board, without names.
 */
export function LessonSummarySheet({ review, renderGraph }: { review: LessonReview; renderGraph: (trial: ReviewTrial) => ReactNode }) {
  const { lesson } = review;
  return (
    <article className="grid gap-3 text-[0.8rem] leading-snug" data-testid="lesson-summary">
      <header className="border-b-2 border-ink pb-2">
        <p className="text-sm font-bold text-ink-muted">Linkleap · lesson summary</p>
        <h1 className="text-2xl font-bold">
          {lesson.className} · {formatReviewDate(lesson.startedAt)}
        </h1>
        <p>
          {lesson.planTitle ? `Plan: ${lesson.planTitle} · ` : ""}
          {review.trials.length} trial{review.trials.length === 1 ? "" : "s"} · {review.participants.length} pupil
          {review.participants.length === 1 ? "" : "s"} took part
        </p>
      </header>
      {review.trials.map((t) => {
        const unit = t.question.unit;
        const shown = t.explanations.filter((e) => e.shown);
        const params = t.shownParams.filter((p) => PRINTED_PARAMS.has(p.key));
        return (
          <section key={t.id} className="grid grid-cols-[3fr_2fr] gap-3 break-inside-avoid border-b border-line pb-2" aria-label={`Trial ${t.position}`}>
            {/* Graph only: its own caption of figures is hidden here, the figures are beside it. */}
            <div className="relative overflow-hidden [&_[data-testid=trial-graph-summary]]:hidden [&_[data-testid=trial-graph]>div:first-child]:h-52">{renderGraph(t)}</div>
            <div className="grid content-start gap-1">
              <h2 className="text-base font-bold">
                Trial {t.position}: {t.rigLabel}
              </h2>
              <p className="italic">{t.question.prompt}</p>
              <p className="text-ink-muted">
                {params.map((p) => `${p.label} ${typeof p.value === "number" ? withUnit(p.value, p.unit) : p.value}`).join(" · ")}
              </p>
              <p>
                <strong>Result:</strong> {t.result ? withUnit(t.result.value, t.result.unit) : "not run"} · <strong>Theory:</strong>{" "}
                {t.theory ? withUnit(t.theory.value, t.theory.unit) : "—"}
              </p>
              {t.question.kind === "number" ? (
                <>
                  <RoundFigures s={t.summary[1]} unit={unit} label="Before the run" hasResult={t.result !== null} />
                  <RoundFigures s={t.summary[2]} unit={unit} label="Re-vote" hasResult={t.result !== null} />
                </>
              ) : (
                <ChoiceFigures trial={t} />
              )}
              {shown.length > 0 ? (
                <div>
                  <p className="font-bold">Explanations shown to the class:</p>
                  <ul className="list-disc pl-4">
                    {shown.map((e) => (
                      <li key={e.id}>{e.text}</li>
                    ))}
                  </ul>
                </div>
              ) : null}
            </div>
          </section>
        );
      })}
      <footer className="text-[0.75em] text-ink-muted">
        Medians and middle halves (25th to 75th percentile) count every answer, from devices and shows of hands. “Within 10 %”: an answer no
        further from the simulated result than a tenth of it. Simulated heights come from a calibrated model of the pile.
      </footer>
    </article>
  );
}

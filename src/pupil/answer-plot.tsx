/**
 * The class's answers, without names, beside the result and the theory. Marks differ by shape,
 * line style and label, never by colour alone: class answers are dots, the pupil's own answer a
 * labelled diamond, the result a solid line, the theory a dashed line.
 */
import type { PublicTrial } from "@contracts/lessons";
import type { Round } from "@contracts/lesson-rules";
import { cx } from "@/lib/cx";
import { choiceOfValue, formatNumber, plotDomain, stackDots, withUnit } from "./pupil-format";

type OwnAnswer = { value: number | null; choice: number | null } | null;

const W = 260;
const DOT = 7;
const SIDE = 10;
/** A ring of card colour round each label, so lines passing behind never cut through the words. */
const HALO = { paintOrder: "stroke", strokeWidth: 3, strokeLinejoin: "round" } as const;

/** Label anchored so it stays inside the strip. */
function anchorAt(x: number): "start" | "middle" | "end" {
  if (x < W * 0.25) return "start";
  if (x > W * 0.75) return "end";
  return "middle";
}

function NumberStrip({ values, own, result, theory, unit, title }: {
  values: number[];
  own: number | null;
  result: number;
  theory: number | null;
  unit: string;
  title: string;
}) {
  const domain = plotDomain([...values, result, ...(theory !== null ? [theory] : []), ...(own !== null ? [own] : [])]);
  const inner = W - 2 * SIDE;
  const xOf = (v: number) => SIDE + ((v - domain.min) / (domain.max - domain.min)) * inner;
  const dots = stackDots(values, domain, inner, DOT);
  const levels = Math.min(12, Math.max(1, ...dots.map((d) => d.level + 1)));
  const step = levels > 8 ? 5 : DOT; // very tall columns squeeze a little rather than grow without end
  const top = 22;
  const axisY = top + levels * step + 4;
  const tickY = axisY + 16;
  const ownY = axisY + 30;
  const theoryY = axisY + (own !== null ? 58 : 36);
  const height = theoryY + (theory !== null ? 8 : -10);
  const description =
    `${title}: ${values.length} answers from ${withUnit(Math.min(...values), unit)} to ${withUnit(Math.max(...values), unit)}. ` +
    `Result ${withUnit(result, unit)} (solid line)` +
    (theory !== null ? `, theory ${withUnit(theory, unit)} (dashed line)` : "") +
    (own !== null ? `, your prediction ${withUnit(own, unit)} (diamond).` : ".");
  const rx = xOf(result);
  return (
    <figure className="mt-4">
      <figcaption className="font-bold">{title}</figcaption>
      <svg viewBox={`0 0 ${W} ${height}`} className="mt-1 w-full max-w-[26rem]" role="img" aria-label={description} data-testid="answer-plot">
        {/* axis and ticks */}
        <line x1={SIDE} x2={W - SIDE} y1={axisY} y2={axisY} className="stroke-line-strong" strokeWidth={1.5} />
        {domain.ticks.map((t) => (
          <g key={t}>
            <line x1={xOf(t)} x2={xOf(t)} y1={axisY} y2={axisY + 4} className="stroke-line-strong" />
            <text x={xOf(t)} y={tickY} textAnchor="middle" className="fill-ink-muted stroke-surface" {...HALO} fontSize={10}>
              {formatNumber(t)}
            </text>
          </g>
        ))}
        {unit ? (
          <text x={W - SIDE} y={tickY + 11} textAnchor="end" className="fill-ink-muted" fontSize={9}>
            {unit}
          </text>
        ) : null}
        {/* class answers: dots stacked above the axis */}
        {dots.map((d, i) => (
          <circle key={i} cx={SIDE + d.x} cy={axisY - 4 - Math.min(d.level, levels - 1) * step} r={3.2} className="fill-accent" />
        ))}
        {/* result: solid line, labelled above */}
        <line x1={rx} x2={rx} y1={top - 6} y2={axisY} className="stroke-ink" strokeWidth={2} />
        <text x={rx} y={11} textAnchor={anchorAt(rx)} className="fill-ink stroke-surface" {...HALO} fontSize={12} fontWeight={700}>
          Result {withUnit(result, unit)}
        </text>
        {/* theory: dashed line, labelled below */}
        {theory !== null ? (
          <>
            <line x1={xOf(theory)} x2={xOf(theory)} y1={top - 6} y2={theoryY - 10} className="stroke-ink" strokeWidth={1.5} strokeDasharray="4 3" />
            <text x={xOf(theory)} y={theoryY} textAnchor={anchorAt(xOf(theory))} className="fill-ink stroke-surface" {...HALO} fontSize={12}>
              Theory {withUnit(theory, unit)}
            </text>
          </>
        ) : null}
        {/* own answer: a diamond below the axis, pointing at the value, labelled */}
        {own !== null ? (
          <g>
            <path
              d={`M ${xOf(own)} ${ownY - 9} l 6 6 l -6 6 l -6 -6 Z`}
              className="fill-surface stroke-ink"
              strokeWidth={2}
            />
            <text
              x={xOf(own) + (anchorAt(xOf(own)) === "end" ? -10 : 10)}
              y={ownY + 1}
              textAnchor={anchorAt(xOf(own)) === "end" ? "end" : "start"}
              className="fill-ink stroke-surface"
              {...HALO}
              fontSize={12}
              fontWeight={700}
            >
              You {withUnit(own, unit)}
            </text>
          </g>
        ) : null}
      </svg>
      <p className="mt-1 flex flex-wrap gap-x-4 text-sm text-ink-muted" aria-hidden="true">
        <span>● class answers</span>
        <span>◆ your prediction</span>
        <span>│ result (solid)</span>
        {theory !== null ? <span>┆ theory (dashed)</span> : null}
      </p>
    </figure>
  );
}

function ChoiceBars({ trial, answers, own, title }: {
  trial: PublicTrial & { question: { kind: "choice" } };
  answers: { choice: number | null }[];
  own: number | null;
  title: string;
}) {
  const choices = trial.question.choices;
  const counts = choices.map((_, i) => answers.filter((a) => a.choice === i).length);
  const most = Math.max(1, ...counts);
  const resultChoice = trial.result ? choiceOfValue(choices, trial.result.value) : null;
  const theoryChoice = trial.theory ? choiceOfValue(choices, trial.theory.value) : null;
  return (
    <figure className="mt-4" data-testid="answer-plot">
      <figcaption className="font-bold">{title}</figcaption>
      <ul className="mt-2 flex flex-col gap-3">
        {choices.map((choice, i) => (
          <li key={i}>
            <div className="flex flex-wrap items-baseline gap-x-2">
              <span className={cx(own === i && "font-bold")}>{choice.label}</span>
              <span className="text-ink-muted">
                {counts[i]} {counts[i] === 1 ? "answer" : "answers"}
              </span>
              {own === i ? <span className="font-bold">◆ your answer</span> : null}
              {resultChoice === i ? <span className="font-bold">│ result</span> : null}
              {theoryChoice === i ? <span>┆ theory</span> : null}
            </div>
            <svg viewBox="0 0 100 6" preserveAspectRatio="none" className="mt-1 h-2 w-full" aria-hidden="true">
              <rect x={0} y={0} width={100} height={6} className="fill-sunken" />
              <rect x={0} y={0} width={(100 * counts[i]!) / most} height={6} className="fill-accent" />
            </svg>
          </li>
        ))}
      </ul>
    </figure>
  );
}

export function AnswerPlot({ trial, own }: { trial: PublicTrial; own: Record<Round, OwnAnswer> }) {
  const answers = trial.answers ?? [];
  const rounds = ([1, 2] as const).filter((r) => answers.some((a) => a.round === r));
  const titleOf = (r: Round) => (rounds.length > 1 ? (r === 1 ? "Class answers before discussion" : "Class answers after discussion") : "Class answers");
  return (
    <>
      {rounds.map((round) => {
        const these = answers.filter((a) => a.round === round);
        if (trial.question.kind === "choice") {
          return (
            <ChoiceBars
              key={round}
              trial={trial as PublicTrial & { question: { kind: "choice" } }}
              answers={these}
              own={own[round]?.choice ?? null}
              title={titleOf(round)}
            />
          );
        }
        if (!trial.result) return null;
        const values = these.map((a) => a.value).filter((v): v is number => v !== null && Number.isFinite(v));
        if (values.length === 0) return null;
        return (
          <NumberStrip
            key={round}
            values={values}
            own={own[round]?.value ?? null}
            result={trial.result.value}
            theory={trial.theory?.value ?? null}
            unit={trial.question.unit}
            title={titleOf(round)}
          />
        );
      })}
    </>
  );
}

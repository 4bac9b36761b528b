import { useId, useMemo, useRef } from "react";
import {
  BarController,
  BarElement,
  CategoryScale,
  Chart as ChartJS,
  Legend,
  LinearScale,
  LineElement,
  PointElement,
  ScatterController,
  Tooltip,
  type ChartData,
  type ChartOptions,
  type Plugin,
} from "chart.js";
import { Bar, Scatter } from "react-chartjs-2";
import type { Question, ShownValue } from "@contracts/lessons";
import { cx } from "@/lib/cx";
import { useViewportHeight } from "../hooks/use-viewport-height";
import {
  DASH,
  formatShare,
  formatValue,
  GRAPH_COLOURS,
  GRAPH_FONT_FAMILY,
  graphFontSize,
  jitter,
  MARKERS,
  markerRadius,
  type GraphTheme,
} from "../utils/graph-style";
import { drawnMarkers } from "../utils/drawn-markers";
import { choiceHoldingResult, countChoices, summariseAnswers, type PredictionSummary } from "../utils/prediction-summary";

ChartJS.register(ScatterController, BarController, LinearScale, CategoryScale, PointElement, LineElement, BarElement, Tooltip, Legend);

/** One answer without any name: the component has no way to show who gave it. */
export interface GraphAnswer {
  round: 1 | 2;
  value: number | null;
  choice: number | null;
}

export interface TrialGraphProps {
  question: Question;
  /** The quantity asked, in words ("Rise of the chain above the rim"). */
  quantityLabel: string;
  answers: GraphAnswer[];
  result: ShownValue | null;
  theory: ShownValue | null;
  /** Real measurements of the same quantity, in the question's unit. */
  bench?: number[];
  theme: GraphTheme;
}

const ROUND_WORDS = { 1: "Before the run", 2: "Re-vote" } as const;

interface LineLabel {
  x: number;
  text: string;
  colour: string;
  at: "top" | "bottom";
}

/** Names the result and theory lines on the chart itself, beside the line (top or bottom of the plot). */
function lineLabelsPlugin(labels: { current: LineLabel[] }, font: { current: number }): Plugin<"scatter"> {
  return {
    id: "lessonGraphLineLabels",
    afterDatasetsDraw(chart) {
      const { ctx, chartArea, scales } = chart;
      const x = scales.x;
      if (!x) return;
      ctx.save();
      ctx.font = `bold ${font.current}px ${GRAPH_FONT_FAMILY}`;
      for (const label of labels.current) {
        const px = x.getPixelForValue(label.x);
        if (px < chartArea.left || px > chartArea.right) continue;
        const width = ctx.measureText(label.text).width;
        // Keep the words inside the plot: to the right of the line unless that runs off the edge.
        const right = px + 8 + width <= chartArea.right;
        ctx.textAlign = right ? "left" : "right";
        ctx.textBaseline = label.at === "top" ? "top" : "bottom";
        ctx.fillStyle = label.colour;
        ctx.fillText(label.text, right ? px + 8 : px - 8, label.at === "top" ? chartArea.top + 4 : chartArea.bottom - 4);
      }
      ctx.restore();
    },
  };
}

/** Diagonal hatching, so the bar that holds the result is marked by a pattern as well as words. */
function hatch(colour: string, background: string): CanvasPattern | string {
  if (typeof document === "undefined") return colour;
  const tile = document.createElement("canvas");
  tile.width = tile.height = 12;
  const g = tile.getContext("2d");
  if (!g) return colour;
  g.fillStyle = background;
  g.fillRect(0, 0, 12, 12);
  g.strokeStyle = colour;
  g.lineWidth = 3;
  g.beginPath();
  g.moveTo(-3, 3);
  g.lineTo(3, -3);
  g.moveTo(0, 12);
  g.lineTo(12, 0);
  g.moveTo(9, 15);
  g.lineTo(15, 9);
  g.stroke();
  return g.createPattern(tile, "repeat") ?? colour;
}

function fontOptions(size: number) {
  return { family: GRAPH_FONT_FAMILY, size };
}

function axisLabel(quantityLabel: string, unit: string) {
  return unit ? `${quantityLabel} (${unit})` : quantityLabel;
}

/**
 * The comparison graph of one trial: every answer (never a name), the simulated result and the
 * theory value; for a number question a strip of points per round, for a choice question bars of
 * counts. Below it the summary figures, and a table of the same numbers for screen readers.
 */
export function TrialGraph(props: TrialGraphProps) {
  const viewportHeight = useViewportHeight();
  const fontSize = graphFontSize(props.theme, viewportHeight);
  const summaryId = useId();
  const board = props.theme === "board";
  return (
    <figure
      className={cx("grid gap-3", board ? "text-[max(1.25rem,3vh)] leading-snug" : "text-base")}
      data-theme={board ? "board" : undefined}
      data-testid="trial-graph"
    >
      <div className={cx("relative w-full", board ? "h-[60vh] min-h-80" : "h-80")}>
        {props.question.kind === "choice" ? (
          <ChoiceChart {...props} question={props.question} fontSize={fontSize} summaryId={summaryId} />
        ) : (
          <NumberChart {...props} fontSize={fontSize} summaryId={summaryId} />
        )}
      </div>
      {props.question.kind === "choice" ? (
        <ChoiceSummary {...props} question={props.question} summaryId={summaryId} />
      ) : (
        <NumberSummary {...props} summaryId={summaryId} />
      )}
    </figure>
  );
}

interface ChartPartProps extends TrialGraphProps {
  fontSize: number;
  summaryId: string;
}

function valuesOf(answers: GraphAnswer[], round: 1 | 2): number[] {
  return answers.flatMap((a) => (a.round === round && a.value !== null && Number.isFinite(a.value) ? [a.value] : []));
}

function NumberChart({ question, quantityLabel, answers, result, theory, bench = [], theme, fontSize, summaryId }: ChartPartProps) {
  const colours = GRAPH_COLOURS[theme];
  const radius = markerRadius(theme, fontSize);
  const unit = question.unit;
  const round1 = valuesOf(answers, 1);
  const round2 = valuesOf(answers, 2);
  const benchValues = bench.filter(Number.isFinite);

  // Rows from the top: round 1, then the re-vote and the real runs if there are any.
  const rows = [
    { key: "round1" as const, label: ROUND_WORDS[1], values: round1 },
    ...(round2.length > 0 ? [{ key: "round2" as const, label: ROUND_WORDS[2], values: round2 }] : []),
    ...(benchValues.length > 0 ? [{ key: "bench" as const, label: "Real runs", values: benchValues }] : []),
  ];
  const rowY = (i: number) => rows.length - 1 - i;

  const everything = [...round1, ...round2, ...benchValues, ...(result ? [result.value] : []), ...(theory ? [theory.value] : [])];
  const lo = everything.length ? Math.min(...everything) : 0;
  const hi = everything.length ? Math.max(...everything) : 1;
  const pad = Math.max((hi - lo) * 0.08, Math.abs(hi) * 0.05, 1e-6);
  const xMin = lo >= 0 ? Math.max(0, lo - pad) : lo - pad;
  const xMax = hi + pad;

  const labels = useRef<LineLabel[]>([]);
  labels.current = [
    ...(result ? [{ x: result.value, text: `Result ${formatValue(result.value, unit)}`, colour: colours.result, at: "top" as const }] : []),
    ...(theory ? [{ x: theory.value, text: `Theory ${formatValue(theory.value, unit)}`, colour: colours.theory, at: "bottom" as const }] : []),
  ];
  const font = useRef(fontSize);
  font.current = fontSize;
  const plugins = useMemo(() => [drawnMarkers as Plugin<"scatter">, lineLabelsPlugin(labels, font)], []);

  const key = JSON.stringify([answers, result, theory, bench, theme, fontSize, unit]);
  const data = useMemo<ChartData<"scatter">>(() => {
    const marker = (k: "round1" | "round2" | "bench") => (k === "bench" ? colours.bench : k === "round1" ? colours.round1 : colours.round2);
    const legendFor = {
      round1: `Predictions before the run (${MARKERS.round1.words})`,
      round2: `Re-vote after discussion (${MARKERS.round2.words})`,
      bench: `Real runs (${MARKERS.bench.words})`,
    };
    const line = (x: number) => [
      { x, y: -0.5 },
      { x, y: rows.length - 0.5 },
    ];
    return {
      datasets: [
        ...rows.map((row, i) => ({
          label: legendFor[row.key],
          data: row.values.map((v, j) => ({ x: v, y: rowY(i) + jitter(j) * 0.6 })),
          pointStyle: MARKERS[row.key].style,
          // A triangle looks smaller than a circle of the same radius.
          pointRadius: row.key === "bench" ? Math.round(radius * 1.4) : radius,
          pointHoverRadius: radius + 2,
          backgroundColor: marker(row.key),
          borderColor: colours.paper,
          borderWidth: 1.5,
        })),
        ...(result
          ? [
              {
                label: `Simulated result ${formatValue(result.value, unit)} (solid line)`,
                data: line(result.value),
                showLine: true,
                borderColor: colours.result,
                backgroundColor: colours.result,
                borderWidth: theme === "board" ? 5 : 3,
                borderDash: DASH.result,
                pointRadius: 0,
                pointHitRadius: 0,
                pointStyle: "line" as const,
              },
            ]
          : []),
        ...(theory
          ? [
              {
                label: `Theory ${formatValue(theory.value, unit)} (dashed line)`,
                data: line(theory.value),
                showLine: true,
                borderColor: colours.theory,
                backgroundColor: colours.theory,
                borderWidth: theme === "board" ? 4 : 2,
                borderDash: DASH.theory,
                pointRadius: 0,
                pointHitRadius: 0,
                pointStyle: "dash" as const,
              },
            ]
          : []),
      ],
    };
    // `key` holds every input (the arrays are rebuilt on each render).
  }, [key]);

  const options = useMemo<ChartOptions<"scatter">>(
    () => ({
      animation: false,
      maintainAspectRatio: false,
      color: colours.ink,
      scales: {
        x: {
          min: xMin,
          max: xMax,
          title: { display: true, text: axisLabel(quantityLabel, unit), color: colours.ink, font: fontOptions(fontSize) },
          ticks: { color: colours.ink, font: fontOptions(fontSize) },
          grid: { color: colours.grid },
        },
        y: {
          min: -0.5,
          max: rows.length - 0.5,
          afterBuildTicks: (axis) => {
            axis.ticks = rows.map((_, i) => ({ value: rowY(i) }));
          },
          ticks: {
            color: colours.ink,
            font: fontOptions(fontSize),
            callback: (value) => rows[rows.length - 1 - Number(value)]?.label ?? "",
          },
          grid: { color: colours.grid },
        },
      },
      plugins: {
        legend: {
          position: "bottom",
          labels: { usePointStyle: true, color: colours.ink, font: fontOptions(fontSize), padding: Math.round(fontSize * 0.6) },
        },
        tooltip: {
          titleFont: fontOptions(fontSize),
          bodyFont: fontOptions(fontSize),
          callbacks: { label: (item) => formatValue(item.parsed.x ?? Number.NaN, unit) },
        },
      },
    }),
    [key, xMin, xMax],
  );

  return (
    <Scatter
      data={data}
      options={options}
      plugins={plugins}
      role="img"
      aria-label={`Graph of the class's answers: ${axisLabel(quantityLabel, unit)}, with the simulated result and the theory. The figures follow the graph.`}
      aria-describedby={summaryId}
      data-testid="trial-graph-canvas"
    />
  );
}

function ChoiceChart({
  question,
  quantityLabel,
  answers,
  result,
  theory,
  theme,
  fontSize,
  summaryId,
}: ChartPartProps & { question: Extract<Question, { kind: "choice" }> }) {
  const colours = GRAPH_COLOURS[theme];
  const n = question.choices.length;
  const counts1 = countChoices(answers.flatMap((a) => (a.round === 1 && a.choice !== null ? [a.choice] : [])), n).counts;
  const round2 = answers.filter((a) => a.round === 2 && a.choice !== null);
  const counts2 = countChoices(round2.map((a) => a.choice!), n).counts;
  const resultChoice = choiceHoldingResult(question.choices, result?.value ?? null);
  const theoryChoice = choiceHoldingResult(question.choices, theory?.value ?? null);

  const key = JSON.stringify([answers, result, theory, theme, fontSize, question]);
  const data = useMemo<ChartData<"bar">>(() => {
    const labels = question.choices.map((c, i) => {
      const marks = [i === resultChoice ? "result" : null, i === theoryChoice ? "theory" : null].filter(Boolean);
      return marks.length ? [c.label, `▲ ${marks.join(" and ")}`] : c.label;
    });
    const resultFill = hatch(colours.result, colours.round1);
    return {
      labels: labels as unknown as string[],
      datasets: [
        {
          label: `Before the run (filled bars${resultChoice !== null ? "; hatched: the choice that holds the result" : ""})`,
          data: counts1,
          backgroundColor: counts1.map((_, i) => (i === resultChoice ? resultFill : colours.round1)),
          borderColor: colours.round1,
          borderWidth: 2,
        },
        ...(round2.length > 0
          ? [
              {
                label: "Re-vote after discussion (outlined bars)",
                data: counts2,
                backgroundColor: "transparent",
                borderColor: colours.round2,
                borderWidth: theme === "board" ? 5 : 3,
              },
            ]
          : []),
      ],
    };
  }, [key]);

  const options = useMemo<ChartOptions<"bar">>(
    () => ({
      animation: false,
      maintainAspectRatio: false,
      color: colours.ink,
      scales: {
        x: {
          title: { display: true, text: axisLabel(quantityLabel, question.unit), color: colours.ink, font: fontOptions(fontSize) },
          ticks: { color: colours.ink, font: fontOptions(fontSize) },
          grid: { color: colours.grid },
        },
        y: {
          beginAtZero: true,
          title: { display: true, text: "Answers", color: colours.ink, font: fontOptions(fontSize) },
          ticks: { color: colours.ink, font: fontOptions(fontSize), precision: 0 },
          grid: { color: colours.grid },
        },
      },
      plugins: {
        legend: {
          position: "bottom",
          labels: { color: colours.ink, font: fontOptions(fontSize), padding: Math.round(fontSize * 0.6) },
        },
        tooltip: { titleFont: fontOptions(fontSize), bodyFont: fontOptions(fontSize) },
      },
    }),
    [key],
  );

  return (
    <Bar
      data={data}
      options={options}
      plugins={[drawnMarkers as Plugin<"bar">]}
      role="img"
      aria-label={`Bar chart of how many chose each answer to: ${question.prompt}. The figures follow the graph.`}
      aria-describedby={summaryId}
      data-testid="trial-graph-canvas"
    />
  );
}

function summaryParts(s: PredictionSummary, unit: string, hasResult: boolean): string[] {
  if (s.count === 0) return ["no answers"];
  return [
    `median ${formatValue(s.median!, unit)}`,
    `spread (interquartile range, the middle half of the answers) ${formatValue(s.spread!, unit)}`,
    ...(hasResult ? [`within 10 % of the result: ${s.countWithin10} of ${s.count} (${formatShare(s.shareWithin10!)})`] : []),
    `${s.count} ${s.count === 1 ? "answer" : "answers"}`,
  ];
}

function NumberSummary({ question, answers, result, theory, bench = [], summaryId }: TrialGraphProps & { summaryId: string }) {
  const unit = question.unit;
  const rounds = ([1, 2] as const).filter((r) => r === 1 || valuesOf(answers, 2).length > 0);
  const summaries = rounds.map((r) => ({ round: r, values: valuesOf(answers, r), s: summariseAnswers(valuesOf(answers, r), result?.value ?? null) }));
  return (
    <>
      <figcaption id={summaryId} className="grid gap-1" data-testid="trial-graph-summary">
        <p>
          {result ? (
            <>
              Simulated result: <strong>{formatValue(result.value, unit)}</strong>
              {result.uncertainty ? ` (± ${formatValue(result.uncertainty, unit)})` : null}.{" "}
            </>
          ) : (
            "No simulated result yet. "
          )}
          {theory ? (
            <>
              Theory: <strong>{formatValue(theory.value, unit)}</strong>.
            </>
          ) : null}
        </p>
        {summaries.map(({ round, s }) => (
          <p key={round} data-testid={`trial-graph-summary-round-${round}`}>
            <strong>{ROUND_WORDS[round]}:</strong> {summaryParts(s, unit, result !== null).join(" · ")}.
          </p>
        ))}
      </figcaption>
      <table className="sr-only">
        <caption>Every answer, smallest first, without names</caption>
        <thead>
          <tr>
            <th scope="col">Series</th>
            <th scope="col">Values ({unit || "no unit"})</th>
          </tr>
        </thead>
        <tbody>
          {summaries.map(({ round, values }) => (
            <tr key={round}>
              <th scope="row">{ROUND_WORDS[round]}</th>
              <td>{[...values].sort((a, b) => a - b).map((v) => formatValue(v, "")).join(", ") || "none"}</td>
            </tr>
          ))}
          {bench.length > 0 ? (
            <tr>
              <th scope="row">Real runs</th>
              <td>{bench.map((v) => formatValue(v, "")).join(", ")}</td>
            </tr>
          ) : null}
        </tbody>
      </table>
    </>
  );
}

function ChoiceSummary({ question, answers, result, theory, summaryId }: TrialGraphProps & { question: Extract<Question, { kind: "choice" }>; summaryId: string }) {
  const n = question.choices.length;
  const resultChoice = choiceHoldingResult(question.choices, result?.value ?? null);
  const theoryChoice = choiceHoldingResult(question.choices, theory?.value ?? null);
  const rounds = ([1, 2] as const).filter((r) => r === 1 || answers.some((a) => a.round === 2 && a.choice !== null));
  const perRound = rounds.map((round) => {
    const counts = countChoices(answers.flatMap((a) => (a.round === round && a.choice !== null ? [a.choice] : [])), n).counts;
    return { round, counts, total: counts.reduce((a, b) => a + b, 0) };
  });
  const nameOf = (i: number) => question.choices[i]?.label ?? "";
  return (
    <>
      <figcaption id={summaryId} className="grid gap-1" data-testid="trial-graph-summary">
        <p>
          {result ? <>Simulated result: <strong>{formatValue(result.value, question.unit)}</strong>{resultChoice !== null ? <>, in the choice “{nameOf(resultChoice)}”</> : ", in none of the choices"}. </> : "No simulated result yet. "}
          {theory ? <>Theory: <strong>{formatValue(theory.value, question.unit)}</strong>{theoryChoice !== null ? <>, in “{nameOf(theoryChoice)}”</> : null}.</> : null}
        </p>
        {perRound.map(({ round, counts, total }) => (
          <p key={round} data-testid={`trial-graph-summary-round-${round}`}>
            <strong>{ROUND_WORDS[round]}:</strong> {total} {total === 1 ? "answer" : "answers"}
            {total > 0 && resultChoice !== null ? ` · ${counts[resultChoice]} of ${total} (${formatShare(counts[resultChoice]! / total)}) chose the one that holds the result` : ""}.
          </p>
        ))}
      </figcaption>
      <table className="sr-only">
        <caption>Answers per choice, without names</caption>
        <thead>
          <tr>
            <th scope="col">Choice</th>
            {perRound.map(({ round }) => (
              <th key={round} scope="col">
                {ROUND_WORDS[round]}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {question.choices.map((c, i) => (
            <tr key={i}>
              <th scope="row">
                {c.label}
                {i === resultChoice ? " (holds the result)" : ""}
              </th>
              {perRound.map(({ round, counts }) => (
                <td key={round}>{counts[i]}</td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </>
  );
}

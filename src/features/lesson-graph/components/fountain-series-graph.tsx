import { useId, useMemo } from "react";
import {
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
import { Scatter } from "react-chartjs-2";
import { perSiOf } from "@contracts/lesson-rules";
import { fountainSteady } from "@sim/theory";
import { cx } from "@/lib/cx";
import { useViewportHeight } from "../hooks/use-viewport-height";
import { DASH, formatValue, GRAPH_COLOURS, GRAPH_FONT_FAMILY, graphFontSize, jitter, MARKERS, markerRadius, type GraphTheme } from "../utils/graph-style";
import { drawnMarkers } from "../utils/drawn-markers";
import { summariseAnswers } from "../utils/prediction-summary";

ChartJS.register(ScatterController, LinearScale, PointElement, LineElement, Tooltip, Legend);

/** One fountain trial of the lesson: its pot height and what was predicted and simulated. */
export interface FountainSeriesTrial {
  /** Pot height h1 (top of the pile above the floor), m. */
  potHeight: number;
  /** The class's predictions before the run (round 1), in `unit`; no names. */
  predictions: number[];
  /** The simulated rise above the rim, in `unit`; null before the run. */
  result: number | null;
}

export interface FountainSeriesGraphProps {
  trials: FountainSeriesTrial[];
  /** Unit of the rise (a length unit: "cm", "m" or "mm"); cm by default. */
  unit?: string;
  /** Pot push α and floor pull β for the theory line; null draws no theory line. */
  theory: { alpha: number; beta: number } | null;
  /** The class's real runs: pot height in m, rise in `unit`. */
  bench?: { potHeight: number; rise: number }[];
  theme: GraphTheme;
}

/**
 * Rise above the rim against pot height across the lesson's fountain trials: the class's
 * predictions, the simulated results, the real runs and the published steady theory
 * h2 = α/(1 − α − β)·h1 (Biggins & Warner, Proc. R. Soc. A 470: 20130689, 2014), which
 * fountainSteady in sim/theory computes.
 */
export function FountainSeriesGraph({ trials, unit = "cm", theory, bench = [], theme }: FountainSeriesGraphProps) {
  const viewportHeight = useViewportHeight();
  const fontSize = graphFontSize(theme, viewportHeight);
  const radius = markerRadius(theme, fontSize);
  const colours = GRAPH_COLOURS[theme];
  const board = theme === "board";
  const descriptionId = useId();
  const perMetre = perSiOf("m", unit);

  const xMax = Math.max(1, ...trials.map((t) => t.potHeight), ...bench.map((b) => b.potHeight)) * 1.1;
  const theoryLine = useMemo(() => {
    if (!theory || perMetre === null) return null;
    try {
      const steady = fountainSteady({ potHeight: xMax, alpha: theory.alpha, beta: theory.beta });
      return { ratio: steady.riseRatio, end: steady.rise * perMetre };
    } catch {
      // α and β that the theory refuses (α + β ≥ 1, negative): no line rather than a wrong one.
      return null;
    }
  }, [theory, perMetre, xMax]);

  const key = JSON.stringify([trials, unit, theory, bench, theme, fontSize]);
  const data = useMemo<ChartData<"scatter">>(() => {
    // Predictions are spread sideways by up to ±1.5 % of the axis so equal answers do not hide each other.
    const spreadX = xMax * 0.03;
    return {
      datasets: [
        ...(theoryLine && theory
          ? [
              {
                // Short, so it fits a legend line on the board; the summary below gives the formula.
                label: `Theory ${theoryLine.ratio.toFixed(3)} × h1 (dashed)`,
                data: [
                  { x: 0, y: 0 },
                  { x: xMax, y: theoryLine.end },
                ],
                showLine: true,
                borderDash: DASH.theory,
                borderColor: colours.theory,
                backgroundColor: colours.theory,
                borderWidth: board ? 4 : 2,
                pointRadius: 0,
                pointHitRadius: 0,
                pointStyle: "dash" as const,
              },
            ]
          : []),
        {
          label: `Predictions (small ${MARKERS.round1.words})`,
          data: trials.flatMap((t) => t.predictions.filter(Number.isFinite).map((v, j) => ({ x: t.potHeight + jitter(j) * spreadX, y: v }))),
          pointStyle: MARKERS.round1.style,
          pointRadius: Math.max(3, Math.round(radius * 0.6)),
          backgroundColor: colours.round1,
          borderColor: colours.paper,
          borderWidth: 1,
        },
        {
          label: `Simulated results (large ${MARKERS.result.words})`,
          data: trials.flatMap((t) => (t.result !== null && Number.isFinite(t.result) ? [{ x: t.potHeight, y: t.result }] : [])),
          pointStyle: MARKERS.result.style,
          pointRadius: Math.round(radius * 1.4),
          backgroundColor: colours.result,
          borderColor: colours.ink,
          borderWidth: 2,
        },
        ...(bench.length > 0
          ? [
              {
                label: `Real runs (${MARKERS.bench.words})`,
                data: bench.map((b) => ({ x: b.potHeight, y: b.rise })),
                pointStyle: MARKERS.bench.style,
                pointRadius: radius,
                backgroundColor: colours.bench,
                borderColor: colours.ink,
                borderWidth: 1.5,
              },
            ]
          : []),
      ],
    };
  }, [key, theoryLine]); // `key` holds every input (the arrays are rebuilt on each render).

  const options = useMemo<ChartOptions<"scatter">>(() => {
    const font = { family: GRAPH_FONT_FAMILY, size: fontSize };
    return {
      animation: false,
      maintainAspectRatio: false,
      color: colours.ink,
      scales: {
        x: {
          min: 0,
          max: Number(xMax.toFixed(2)),
          title: { display: true, text: "Pot height h1 (m)", color: colours.ink, font },
          ticks: { color: colours.ink, font },
          grid: { color: colours.grid },
        },
        y: {
          min: 0,
          title: { display: true, text: `Rise above the rim h2 (${unit})`, color: colours.ink, font },
          ticks: { color: colours.ink, font },
          grid: { color: colours.grid },
        },
      },
      plugins: {
        legend: { position: "bottom", labels: { usePointStyle: true, color: colours.ink, font, padding: Math.round(fontSize * 0.6) } },
        tooltip: {
          titleFont: font,
          bodyFont: font,
          callbacks: { label: (item) => `h1 ${formatValue(item.parsed.x ?? Number.NaN, "m")}, h2 ${formatValue(item.parsed.y ?? Number.NaN, unit)}` },
        },
      },
    };
  }, [key, xMax]);

  const described = trials.map((t) => ({ ...t, median: summariseAnswers(t.predictions, null).median }));
  return (
    <figure className={cx("grid gap-3", board ? "text-[max(1.25rem,3vh)] leading-snug" : "text-base")} data-testid="fountain-series-graph">
      <div className={cx("relative w-full", board ? "h-[60vh] min-h-80" : "h-80")}>
        <Scatter
          data={data}
          options={options}
          plugins={[drawnMarkers as Plugin<"scatter">]}
          role="img"
          aria-label="Graph of rise above the rim against pot height across this lesson's fountain trials. The same numbers are in the table that follows."
          aria-describedby={descriptionId}
          data-testid="fountain-series-canvas"
        />
      </div>
      <figcaption id={descriptionId}>
        {trials.length} fountain {trials.length === 1 ? "trial" : "trials"}
        {theoryLine && theory
          ? `; dashed line: the steady theory, rise h2 = ${formatValue(theoryLine.ratio, "")} × pot height h1 (α = ${theory.alpha}, β = ${theory.beta})`
          : ""}
        {bench.length > 0 ? `; ${bench.length} real ${bench.length === 1 ? "run" : "runs"}` : ""}.
      </figcaption>
      <table className="sr-only">
        <caption>Fountain trials of this lesson, without names</caption>
        <thead>
          <tr>
            <th scope="col">Pot height (m)</th>
            <th scope="col">Predictions</th>
            <th scope="col">Median prediction ({unit})</th>
            <th scope="col">Simulated result ({unit})</th>
            <th scope="col">Theory ({unit})</th>
          </tr>
        </thead>
        <tbody>
          {described.map((t, i) => (
            <tr key={i}>
              <td>{formatValue(t.potHeight, "")}</td>
              <td>{t.predictions.length}</td>
              <td>{t.median === null ? "none" : formatValue(t.median, "")}</td>
              <td>{t.result === null ? "not run" : formatValue(t.result, "")}</td>
              <td>{theoryLine ? formatValue(theoryLine.ratio * t.potHeight * (perMetre ?? 1), "") : "none"}</td>
            </tr>
          ))}
        </tbody>
      </table>
    </figure>
  );
}

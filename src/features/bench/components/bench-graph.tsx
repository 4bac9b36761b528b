import { useMemo } from "react";
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
import type { BenchRun, BenchSource } from "@contracts/bench";
import { fountainSteady, TYPICAL_ALPHA, TYPICAL_BETA } from "@sim/theory";

ChartJS.register(ScatterController, LinearScale, PointElement, LineElement, Tooltip, Legend);

/** Shape and colour per source: the shape and the legend's words carry it, never the colour alone. */
export const SOURCE_STYLE: Record<BenchSource, { label: string; shape: "circle" | "rect" | "triangle"; colour: string }> = {
  typed: { label: "Typed in (circles)", shape: "circle", colour: "#1f5fbf" },
  csv: { label: "From a CSV file (squares)", shape: "rect", colour: "#8a4b00" },
  photo: { label: "Measured on a photo (triangles)", shape: "triangle", colour: "#5b2a86" },
};

/** The published steady theory h2 = α/(1 − α − β)·h1 (Biggins & Warner, Proc. R. Soc. A 470: 20130689, 2014). */
export const THEORY_RATIO = fountainSteady({ potHeight: 1, alpha: TYPICAL_ALPHA, beta: TYPICAL_BETA }).riseRatio;

/** Writes each drawn marker's canvas position on the canvas element, so a browser test can look there. */
const markerPositions: Plugin<"scatter"> = {
  id: "markerPositions",
  afterRender(chart) {
    const positions = chart.data.datasets.flatMap((_, i) =>
      i === 0 ? [] : chart.getDatasetMeta(i).data.map((el) => [Math.round(el.x), Math.round(el.y)]),
    );
    chart.canvas.dataset.markers = JSON.stringify(positions);
  },
};

export function BenchGraph({ runs }: { runs: BenchRun[] }) {
  const maxPot = Math.max(1.5, ...runs.map((r) => r.potHeightM)) * 1.1;
  const data = useMemo<ChartData<"scatter">>(
    () => ({
      datasets: [
        {
          label: `Theory, α = ${TYPICAL_ALPHA}, β = ${TYPICAL_BETA} (dashed line)`,
          type: "scatter",
          data: [
            { x: 0, y: 0 },
            { x: maxPot, y: THEORY_RATIO * maxPot },
          ],
          showLine: true,
          borderDash: [8, 6],
          borderColor: "#3b3b3b",
          borderWidth: 2,
          pointRadius: 0,
          pointHitRadius: 0,
        },
        ...(Object.keys(SOURCE_STYLE) as BenchSource[]).map((source) => ({
          label: SOURCE_STYLE[source].label,
          data: runs.filter((r) => r.source === source).map((r) => ({ x: r.potHeightM, y: r.riseM })),
          pointStyle: SOURCE_STYLE[source].shape,
          pointRadius: 8,
          pointHoverRadius: 10,
          backgroundColor: SOURCE_STYLE[source].colour,
          borderColor: "#000000",
          borderWidth: 1,
        })),
      ],
    }),
    [runs, maxPot],
  );
  const options = useMemo<ChartOptions<"scatter">>(
    () => ({
      animation: false,
      maintainAspectRatio: false,
      scales: {
        x: { min: 0, max: Number(maxPot.toFixed(2)), title: { display: true, text: "Pot height h1 (m)" } },
        y: { min: 0, title: { display: true, text: "Rise above the rim h2 (m)" } },
      },
      plugins: {
        legend: { position: "bottom", labels: { usePointStyle: true } },
        tooltip: { callbacks: { label: (item) => `h1 ${item.parsed.x} m, h2 ${item.parsed.y} m` } },
      },
    }),
    [maxPot],
  );
  return (
    <div className="relative h-80 w-full">
      <Scatter
        data={data}
        options={options}
        plugins={[markerPositions]}
        role="img"
        aria-label={`Graph of rise against pot height: ${runs.length} real ${runs.length === 1 ? "run" : "runs"} and the theory line. The same numbers are in the table.`}
        data-testid="bench-graph"
      />
    </div>
  );
}

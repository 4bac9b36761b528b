import { useMemo } from "react";
import {
  BarController,
  BarElement,
  CategoryScale,
  Chart as ChartJS,
  Legend,
  LinearScale,
  LineController,
  LineElement,
  PointElement,
  Tooltip,
  type ChartData,
  type ChartOptions,
} from "chart.js";
import { Bar, Line } from "react-chartjs-2";
import type { DepartmentOverview, WeeklySeries } from "@contracts/department-overview";
import { RIG_NAMES } from "@contracts/lesson-questions";
import { formatDay } from "../utils/overview-range";

ChartJS.register(BarController, BarElement, LineController, LineElement, PointElement, CategoryScale, LinearScale, Tooltip, Legend);

/**
 * Series colours, far apart in hue and lightness; with more series than colours they repeat, so
 * the legend, the tooltip and the table below each chart carry the names, never the colour alone.
 */
const PALETTE = ["#0B5C8E", "#B5482E", "#1E7F6E", "#B07A00", "#6A3FA0", "#4B5262", "#2E86C1", "#8E3B5C", "#5A7F1E", "#C26A00"];
const FONT = { family: "'Atkinson Hyperlegible Next', system-ui, sans-serif", size: 14 };

const commonOptions = {
  responsive: true,
  maintainAspectRatio: false,
  animation: false,
  plugins: { legend: { position: "bottom", labels: { font: FONT, boxWidth: 14 } }, tooltip: { bodyFont: FONT, titleFont: FONT } },
} as const;

/** Lessons per week, one stacked bar per week, one colour per teacher or class. */
export function LessonsPerWeekChart({ weeks, series, groupLabel }: { weeks: string[]; series: WeeklySeries[]; groupLabel: string }) {
  const data = useMemo<ChartData<"bar">>(
    () => ({
      labels: weeks.map((w) => formatDay(w)),
      datasets: series.map((s, i) => ({
        label: s.name,
        data: s.perWeek,
        backgroundColor: PALETTE[i % PALETTE.length],
        borderColor: "#FFFFFF",
        borderWidth: 1,
        stack: "lessons",
      })),
    }),
    [weeks, series],
  );
  const options = useMemo<ChartOptions<"bar">>(
    () => ({
      ...commonOptions,
      scales: {
        x: { stacked: true, title: { display: true, text: "Week starting (Monday)", font: FONT }, ticks: { font: FONT } },
        y: { stacked: true, beginAtZero: true, ticks: { precision: 0, font: FONT }, title: { display: true, text: "Lessons", font: FONT } },
      },
    }),
    [],
  );
  return (
    <div className="relative h-80 w-full" data-testid="lessons-chart">
      <Bar data={data} options={options} aria-label={`Bar chart of lessons per week by ${groupLabel}; the same numbers are in the table below.`} role="img" />
    </div>
  );
}

/** Trials run on each rig, one horizontal bar each. */
export function TrialsByRigChart({ rigs }: { rigs: DepartmentOverview["trialsByRig"] }) {
  const data = useMemo<ChartData<"bar">>(
    () => ({
      labels: rigs.map((r) => RIG_NAMES[r.rig as keyof typeof RIG_NAMES] ?? r.rig),
      datasets: [{ label: "Trials run", data: rigs.map((r) => r.trialsRun), backgroundColor: PALETTE[0] }],
    }),
    [rigs],
  );
  const options = useMemo<ChartOptions<"bar">>(
    () => ({
      ...commonOptions,
      indexAxis: "y",
      plugins: { ...commonOptions.plugins, legend: { display: false } },
      scales: {
        x: { beginAtZero: true, ticks: { precision: 0, font: FONT }, title: { display: true, text: "Trials run", font: FONT } },
        y: { ticks: { font: FONT } },
      },
    }),
    [],
  );
  return (
    <div className="relative h-56 w-full" data-testid="rigs-chart">
      <Bar data={data} options={options} aria-label="Bar chart of trials run on each rig; the same numbers are in the table beside it." role="img" />
    </div>
  );
}

/**
 * How close the class predictions were, per week: the share within 10 % (solid line, round
 * points) and the median relative error (dashed line, square points), both in per cent. Weeks
 * without comparable trials leave a gap.
 */
export function ClosenessChart({ closeness }: { closeness: DepartmentOverview["closeness"] }) {
  const data = useMemo<ChartData<"line">>(
    () => ({
      labels: closeness.map((c) => formatDay(c.week)),
      datasets: [
        {
          label: "Predictions within 10 % of the result (%, solid line)",
          data: closeness.map((c) => (c.shareWithin10 === null ? null : Math.round(c.shareWithin10 * 1000) / 10)),
          borderColor: PALETTE[2],
          backgroundColor: PALETTE[2],
          pointStyle: "circle",
          pointRadius: 4,
          spanGaps: false,
        },
        {
          label: "Median error of the class (%, dashed line)",
          data: closeness.map((c) => (c.medianRelativeError === null ? null : Math.round(c.medianRelativeError * 1000) / 10)),
          borderColor: PALETTE[1],
          backgroundColor: PALETTE[1],
          borderDash: [8, 5],
          pointStyle: "rect",
          pointRadius: 5,
          spanGaps: false,
        },
      ],
    }),
    [closeness],
  );
  const options = useMemo<ChartOptions<"line">>(
    () => ({
      ...commonOptions,
      plugins: { ...commonOptions.plugins, legend: { ...commonOptions.plugins.legend, labels: { ...commonOptions.plugins.legend.labels, usePointStyle: true } } },
      scales: {
        x: { title: { display: true, text: "Week starting (Monday)", font: FONT }, ticks: { font: FONT } },
        y: { beginAtZero: true, title: { display: true, text: "Per cent", font: FONT }, ticks: { font: FONT } },
      },
    }),
    [],
  );
  return (
    <div className="relative h-72 w-full" data-testid="closeness-chart">
      <Line data={data} options={options} aria-label="Line chart of how close class predictions were to results, per week; the same numbers are in the table below." role="img" />
    </div>
  );
}

/** Small pure helpers for the pupil page: the code in the address, numbers as shown, the answer plot. */
import { isLessonCode, normaliseLessonCode } from "@contracts/lesson-rules";

/** "/join/ab3k7p" → "AB3K7P"; null for "/join" or something that is not a lesson code. */
export function codeFromPath(pathname: string): string | null {
  const match = /^\/join\/([^/?#]+)\/?$/.exec(pathname);
  if (!match?.[1]) return null;
  let raw: string;
  try {
    raw = decodeURIComponent(match[1]);
  } catch {
    return null;
  }
  const code = normaliseLessonCode(raw);
  return isLessonCode(code) ? code : null;
}

/** Three significant figures, no trailing zeros, a point as decimal mark: "14.2", "0.667", "1200". */
export function formatNumber(value: number): string {
  if (!Number.isFinite(value)) return "–";
  if (value === 0) return "0";
  const rounded = Number(value.toPrecision(3));
  return Math.abs(rounded) >= 1e6 || Math.abs(rounded) < 1e-3 ? rounded.toExponential(2) : String(rounded);
}

export const withUnit = (value: number, unit: string) => (unit ? `${formatNumber(value)} ${unit}` : formatNumber(value));

/** An uncertainty to one significant figure, as results are usually quoted (common practice). */
export function formatUncertainty(value: number): string {
  if (!Number.isFinite(value)) return "–";
  if (value === 0) return "0";
  return String(Number(value.toPrecision(1)));
}

/** Ticks at 1, 2 or 5 × a power of ten, covering [min, max]. */
export function niceTicks(min: number, max: number, target = 5): number[] {
  if (!(max > min)) return [min];
  const raw = (max - min) / Math.max(1, target);
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const ticks: number[] = [];
  for (let t = Math.ceil(min / step) * step; t <= max + step * 1e-9; t += step) ticks.push(Number(t.toPrecision(12)));
  return ticks;
}

export interface PlotDomain {
  min: number;
  max: number;
  ticks: number[];
}

/** A range that shows every answer, the result and the theory, with a little room at both ends. */
export function plotDomain(values: number[]): PlotDomain {
  const finite = values.filter(Number.isFinite);
  if (finite.length === 0) return { min: 0, max: 1, ticks: [0, 1] };
  let min = Math.min(...finite);
  let max = Math.max(...finite);
  if (max === min) {
    const pad = Math.abs(min) * 0.1 || 1;
    min -= pad;
    max += pad;
  }
  const pad = (max - min) * 0.06;
  const ticks = niceTicks(min - pad, max + pad);
  return { min: Math.min(min - pad, ticks[0]!), max: Math.max(max + pad, ticks.at(-1)!), ticks };
}

/**
 * Dots for answers on a strip of `width` px: equal or close values (within one dot) stack upwards,
 * so a crowd at one value reads as a column. Returns x (px) and a stack level (0 = on the axis).
 */
export function stackDots(values: number[], domain: PlotDomain, width: number, dot: number): { x: number; level: number }[] {
  const span = domain.max - domain.min || 1;
  const xs = values.map((v) => ((v - domain.min) / span) * width).sort((a, b) => a - b);
  const columns: { x: number; count: number }[] = [];
  const dots: { x: number; level: number }[] = [];
  for (const x of xs) {
    const column = columns.at(-1);
    if (column && x - column.x < dot) {
      dots.push({ x: column.x, level: column.count });
      column.count += 1;
    } else {
      columns.push({ x, count: 1 });
      dots.push({ x, level: 0 });
    }
  }
  return dots;
}

/** Which choice a value falls in (a choice's min/max in the question's unit), if the ranges say. */
export function choiceOfValue(choices: readonly { min: number | null; max: number | null }[], value: number): number | null {
  const index = choices.findIndex((c) => (c.min === null || value >= c.min) && (c.max === null || value < c.max));
  if (index < 0) return null;
  const c = choices[index]!;
  // A choice with neither bound says nothing about values.
  return c.min === null && c.max === null ? null : index;
}

/**
 * How the lesson graphs look in each theme. chart.js draws on a canvas and cannot read the
 * Tailwind classes, so the colours are the project's role tokens (tailwind.config.ts `themes`;
 * "light" is the `work` theme), copied here and checked against it by a unit test.
 * Every series also has its own marker shape or dash pattern, and its legend text names it:
 * the colour is never the only way to tell two series apart.
 */
export type GraphTheme = "board" | "light";

export interface GraphColours {
  ink: string;
  inkMuted: string;
  grid: string;
  paper: string;
  round1: string;
  round2: string;
  result: string;
  theory: string;
  bench: string;
}

export const GRAPH_COLOURS: Record<GraphTheme, GraphColours> = {
  light: {
    ink: "#1A1F29",
    inkMuted: "#4B5262",
    grid: "#D8D3C8",
    paper: "#FFFFFF",
    round1: "#0B5C8E",
    round2: "#7A4E00",
    result: "#A8321C",
    theory: "#1A1F29",
    bench: "#0D6B52",
  },
  board: {
    ink: "#F4F1E8",
    inkMuted: "#B9C0CD",
    grid: "#2C3850",
    paper: "#182134",
    round1: "#7CC3F2",
    round2: "#F2C35B",
    result: "#FF9B7A",
    theory: "#F4F1E8",
    bench: "#5CD1AC",
  },
};

/** Marker shapes (chart.js point styles) and the words the legend uses for them. */
export const MARKERS = {
  round1: { style: "circle", words: "circles" },
  round2: { style: "rect", words: "squares" },
  bench: { style: "triangle", words: "triangles" },
  result: { style: "rectRot", words: "diamonds" },
} as const;

/** Dash patterns (px on, px off): the result is a solid line, the theory a dashed one. */
export const DASH = { result: [] as number[], theory: [14, 8] };

export const GRAPH_FONT_FAMILY = '"Atkinson Hyperlegible Next", system-ui, sans-serif';

/**
 * Font size in CSS px. On the board, 3 % of the viewport height (the brief's "text at least 3 %
 * of screen height", so it reads from the back row), never below 20 px; in the light theme the
 * page's own small-print size.
 */
export function graphFontSize(theme: GraphTheme, viewportHeight: number): number {
  return theme === "board" ? Math.max(20, Math.ceil(0.03 * viewportHeight)) : 14;
}

/** Marker radius in CSS px: large enough to see on a projector, smaller on a laptop. */
export function markerRadius(theme: GraphTheme, fontSize: number): number {
  return theme === "board" ? Math.round(fontSize * 0.4) : 6;
}

/** A value to three significant figures with its unit ("13.6 cm", "0.136"), as the board shows values. */
export function formatValue(value: number, unit: string): string {
  const text = Number.isFinite(value) ? String(Number(value.toPrecision(3))) : "—";
  return unit ? `${text} ${unit}` : text;
}

/** A share as a whole percentage ("67 %"). */
export function formatShare(share: number): string {
  return `${Math.round(share * 100)} %`;
}

/**
 * A spread of markers around 0 in (−0.5, 0.5) that is the same on every render (golden-ratio
 * steps, not random), so the board does not shuffle the points when it redraws.
 */
export function jitter(index: number): number {
  return ((index * 0.6180339887498949) % 1) - 0.5;
}

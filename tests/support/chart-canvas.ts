import type { Locator } from "playwright-core";

/** What the lesson graphs record on their canvas (`data-drawn`): each dataset's label and points, canvas CSS px. */
export type DrawnSets = { label: string; points: [number, number][] }[];

/** Each dataset a chart drew, and whether the canvas is painted (not transparent) at each of its points. */
export async function drawnOnCanvas(canvas: Locator) {
  return canvas.evaluate((el) => {
    const c = el as HTMLCanvasElement;
    const sets = JSON.parse(c.dataset.drawn ?? "[]") as { label: string; points: [number, number][] }[];
    const g = c.getContext("2d")!;
    const dpr = c.width / c.clientWidth;
    return sets.map((s) => ({
      label: s.label,
      points: s.points.map(([x, y]) => ({ x, y, painted: g.getImageData(Math.round(x * dpr), Math.round(y * dpr), 1, 1).data[3]! > 0 })),
    }));
  });
}

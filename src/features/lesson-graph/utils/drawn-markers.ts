import type { Plugin } from "chart.js";

/**
 * Writes what each dataset drew (canvas CSS px) on the canvas element as `data-drawn`, so a
 * browser test can check the canvas is painted where the points are (tests/support/chart-canvas.ts).
 */
export const drawnMarkers: Plugin = {
  id: "lessonGraphDrawn",
  afterRender(chart) {
    const drawn = chart.data.datasets.map((ds, i) => ({
      label: ds.label ?? "",
      points: chart.getDatasetMeta(i).data.map((el) => [Math.round(el.x), Math.round(el.y)]),
    }));
    chart.canvas.dataset.drawn = JSON.stringify(drawn);
  },
};

/** Room around the drawing, px: the left side holds the height labels. */
export interface Margins {
  left: number;
  right: number;
  top: number;
  bottom: number;
}

export interface StageFit {
  /** Pixels per metre (the same both ways, so nothing is stretched). */
  scale: number;
  /** Screen x of a scene x (m). */
  x: (metres: number) => number;
  /** Screen y of a scene height (m, y up): the screen's y runs down. */
  y: (metres: number) => number;
}

/**
 * Fits a scene's view [xMin, yMin, xMax, yMax] (m, y up) into a stage of width × height px,
 * keeping the aspect ratio and centring the spare room.
 */
export function fitView(view: readonly [number, number, number, number], width: number, height: number, margins: Margins): StageFit {
  const [xMin, yMin, xMax, yMax] = view;
  const spanX = Math.max(xMax - xMin, 1e-6);
  const spanY = Math.max(yMax - yMin, 1e-6);
  const room = { w: Math.max(1, width - margins.left - margins.right), h: Math.max(1, height - margins.top - margins.bottom) };
  const scale = Math.min(room.w / spanX, room.h / spanY);
  const left = margins.left + (room.w - spanX * scale) / 2;
  const top = margins.top + (room.h - spanY * scale) / 2;
  return {
    scale,
    x: (m) => left + (m - xMin) * scale,
    y: (m) => top + (yMax - m) * scale,
  };
}

/** The highest drawn point of a frame (m), or null when nothing is drawn. */
export function highestPoint(frame: Float32Array): number | null {
  let top = Number.NEGATIVE_INFINITY;
  for (let i = 1; i < frame.length; i += 3) {
    const y = frame[i]!;
    if (y > top) top = y; // NaN compares false: hidden elements are skipped
  }
  return Number.isFinite(top) ? top : null;
}

/** A height for a label: "1.05 m", or "35 cm" below a metre. */
export function formatHeight(metres: number): string {
  if (metres === 0) return "0 m";
  const cm = Math.round(metres * 100);
  if (Math.abs(cm) < 100) return `${cm} cm`;
  return `${metres.toFixed(2)} m`;
}

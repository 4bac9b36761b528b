import { describe, expect, it } from "vitest";
import { themes } from "../../../../tailwind.config";
import { formatShare, formatValue, GRAPH_COLOURS, graphFontSize, jitter } from "./graph-style";

describe("lesson graph style", () => {
  it("uses the project's own colour tokens in both themes", () => {
    const pairs = [
      ["light", "work"],
      ["board", "board"],
    ] as const;
    for (const [graph, tokens] of pairs) {
      const t = themes[tokens];
      const c = GRAPH_COLOURS[graph];
      expect([c.ink, c.inkMuted, c.grid, c.paper]).toEqual([t.ink, t["ink-muted"], t.line, t.surface]);
      expect([c.round1, c.round2, c.result, c.theory, c.bench]).toEqual([t.accent, t.warn, t.danger, t.ink, t.ok]);
    }
  });

  it("board text is at least 3 % of the screen height", () => {
    expect(graphFontSize("board", 1080)).toBeGreaterThanOrEqual(0.03 * 1080);
    expect(graphFontSize("board", 768)).toBeGreaterThanOrEqual(0.03 * 768);
    expect(graphFontSize("board", 400)).toBe(20);
  });

  it("formats values to three significant figures with the unit", () => {
    expect(formatValue(13.6364, "cm")).toBe("13.6 cm");
    expect(formatValue(0.13636, "")).toBe("0.136");
    expect(formatValue(1250, "mm")).toBe("1250 mm");
    expect(formatShare(2 / 3)).toBe("67 %");
  });

  it("spreads markers the same way every time, within ±0.5", () => {
    const a = Array.from({ length: 30 }, (_, i) => jitter(i));
    expect(a).toEqual(Array.from({ length: 30 }, (_, i) => jitter(i)));
    expect(Math.max(...a)).toBeLessThan(0.5);
    expect(Math.min(...a)).toBeGreaterThanOrEqual(-0.5);
    expect(new Set(a.map((v) => v.toFixed(6))).size).toBe(30);
  });
});

import { describe, expect, it } from "vitest";
import { STANDARD_G } from "./constants";
import { foldedChainAccel, foldedChainSpeedSquared } from "./folded";
import { significantFiguresIn } from "./sig-figs";

const g = STANDARD_G;

describe("folded (U) chain, energy-conserving (Calkin & March, Am. J. Phys. 57, 154, 1989)", () => {
  it.each([
    // physics-reference §2; Tomaszewski, Pieranski & Géminard, Am. J. Phys. 74, 776 (2006) [volume from memory]
    { ratio: 0.25, printed: "1.389" },
    { ratio: 0.5, printed: "2.5" },
    { ratio: 0.75, printed: "8.5" },
  ])("free end accelerates at a/g = $printed at x/L = $ratio", ({ ratio, printed }) => {
    const L = 1.4;
    const accelRatio = foldedChainAccel({ length: L, fallen: ratio * L }) / g;
    expect(accelRatio.toPrecision(significantFiguresIn(printed))).toBe(printed);
  });

  it("acceleration is half the slope of v² against x (checked numerically)", () => {
    const L = 2;
    const h = 1e-6;
    for (const x of [0.1, 0.5, 1, 1.5]) {
      const slope = (foldedChainSpeedSquared({ length: L, fallen: x + h }) - foldedChainSpeedSquared({ length: L, fallen: x - h })) / (2 * h);
      expect(foldedChainAccel({ length: L, fallen: x }) / (slope / 2)).toBeCloseTo(1, 7);
    }
  });

  it("the free end outruns a freely falling body: v² > 2gx for x > 0 [paper]", () => {
    for (const x of [0.01, 0.3, 0.9]) {
      expect(foldedChainSpeedSquared({ length: 1, fallen: x })).toBeGreaterThan(2 * g * x);
    }
    expect(foldedChainSpeedSquared({ length: 1, fallen: 0 })).toBe(0);
    expect(foldedChainAccel({ length: 1, fallen: 0 })).toBeCloseTo(g, 14);
  });

  it("refuses x outside [0, L)", () => {
    expect(() => foldedChainSpeedSquared({ length: 1, fallen: 1 })).toThrow(/fallen/);
    expect(() => foldedChainAccel({ length: 1, fallen: -0.1 })).toThrow(/fallen/);
  });
});

import { describe, expect, it } from "vitest";
import { STANDARD_G } from "./constants";
import { FALLING_CHAIN_READING_RATIO, fallingChainScaleReading } from "./scale";

const g = STANDARD_G;

describe("chain falling onto a scale ([textbook]; Hamm & Géminard, Am. J. Phys. 78, 828, 2010)", () => {
  it("reads three times the weight already on the pan while the chain falls", () => {
    expect(FALLING_CHAIN_READING_RATIO).toBe(3);
    const lambda = 0.2;
    for (const x of [0.1, 0.5, 0.99]) {
      expect(fallingChainScaleReading({ lambda, length: 1, fallen: x }) / (lambda * g * x)).toBeCloseTo(3, 12);
    }
  });

  it("agrees with a global momentum balance computed numerically", () => {
    // Independent of the flux argument: the top falls freely, x = gt²/2, v = gt. The part still in the
    // air has downward momentum P = λ(L − x)v and the landed part none, so for the whole chain
    // λgL − F_pan = dP/dt. dP/dt is taken by central differences.
    const lambda = 0.15;
    const L = 1.2;
    const P = (t: number) => lambda * (L - (g * t * t) / 2) * g * t;
    const tEnd = Math.sqrt((2 * L) / g);
    const h = 1e-6;
    for (const t of [0.2 * tEnd, 0.5 * tEnd, 0.8 * tEnd]) {
      const dPdt = (P(t + h) - P(t - h)) / (2 * h);
      const x = (g * t * t) / 2;
      expect(fallingChainScaleReading({ lambda, length: L, fallen: x })).toBeCloseTo(lambda * g * L - dPdt, 6);
    }
  });

  it("drops to the chain's weight once the last link has landed", () => {
    expect(fallingChainScaleReading({ lambda: 0.2, length: 1, fallen: 1 })).toBeCloseTo(0.2 * g, 12);
    expect(fallingChainScaleReading({ lambda: 0.2, length: 1, fallen: 3 })).toBeCloseTo(0.2 * g, 12);
  });

  it("refuses negative lengths", () => {
    expect(() => fallingChainScaleReading({ lambda: 0.2, length: 1, fallen: -0.1 })).toThrow(/fallen/);
    expect(() => fallingChainScaleReading({ lambda: 0.2, length: 0, fallen: 0 })).toThrow(/length/);
  });
});

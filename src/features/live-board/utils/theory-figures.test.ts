import { describe, expect, it } from "vitest";
import { fountainTheoryFor } from "./theory-figures";

describe("the fountain theory panel's figures", () => {
  it("with α = 0.12, β = 0 gives h2/h1 = α/(1 − α − β) = 0.136 (Biggins & Warner, Proc. R. Soc. A 470: 20130689, 2014)", () => {
    const { theory } = fountainTheoryFor({ potHeight: 1 });
    expect(theory!.riseRatio).toBeCloseTo(0.12 / 0.88, 6);
    expect(theory!.rise).toBeCloseTo(0.12 / 0.88, 6);
    // Every watt released is lost at the two ends in the steady state (same paper, energy budget).
    const b = theory!.budget!;
    expect(b.lostAtPile + b.lostAtFloor).toBeCloseTo(b.released, 9);
  });

  it("gives ideal uniform rods an α bound of 1/3 only when they are thin (the rod-kick bound), and balls none", () => {
    // a = b = L/2, k² = (L² + t²)/12: for thin rods the bound approaches 1/3 (same paper).
    const thin = fountainTheoryFor({ linkShape: "rod", aspectRatio: 10 }).theory!.idealAlpha;
    expect(thin).toBeGreaterThan(0.3);
    expect(thin).toBeLessThan(1 / 3);
    expect(fountainTheoryFor({ linkShape: "ball" }).theory!.idealAlpha).toBe(0);
  });

  it("says why when a value is outside its range, and gives the budget up to the edges (α 0.5, β 0.4)", () => {
    expect(fountainTheoryFor({ theoryAlpha: 0.55 }).problem).toMatch(/outside their ranges/);
    expect(fountainTheoryFor({ potHeight: 50 }).problem).toMatch(/outside their ranges/);
    const edge = fountainTheoryFor({ theoryAlpha: 0.5, theoryBeta: 0.4 });
    expect(edge.problem ?? null).toBeNull();
    expect(edge.theory!.budget).not.toBeNull();
  });
});

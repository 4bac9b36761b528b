import { describe, expect, it } from "vitest";
import { STANDARD_G } from "./constants";
import {
  TYPICAL_ALPHA,
  TYPICAL_BETA,
  fountainEnergyBudget,
  fountainSteady,
  noFloorGrowth,
  tiltedPotShape,
} from "./fountain";

const g = STANDARD_G;

describe("steady chain fountain (Biggins & Warner, Proc. R. Soc. A 470: 20130689, 2014)", () => {
  it("obeys the moving-string invariant: T − λgz is the same at floor, pot and crest", () => {
    // [derived, standard moving-string result] checked on the outputs, not on the formulas.
    const lambda = 0.05;
    const h1 = 0.8;
    const f = fountainSteady({ potHeight: h1, alpha: 0.2, beta: 0.1, lambda });
    const atFloor = f.tensionFloor - lambda * g * 0;
    const atPot = f.tensionPot - lambda * g * h1;
    const atCrest = f.tensionCrest - lambda * g * (h1 + f.rise);
    expect(atPot).toBeCloseTo(atFloor, 12);
    expect(atCrest).toBeCloseTo(atFloor, 12);
  });

  it("balances momentum at the pot: tension above the pile plus the pile's push equals λv² (physics-reference §4)", () => {
    const lambda = 0.03;
    const f = fountainSteady({ potHeight: 1.3, alpha: 0.12, beta: 0, lambda });
    expect(f.tensionPot + f.potPush).toBeCloseTo(lambda * f.speed ** 2, 12);
    expect(f.tensionCrest / (lambda * f.speed ** 2)).toBeCloseTo(1, 12);
  });

  it("gives g·h2 = α·v² for any pot height, and h2 proportional to h1 [paper]", () => {
    for (const h1 of [0.3, 1, 2.5]) {
      const f = fountainSteady({ potHeight: h1, alpha: 0.15, beta: 0.05 });
      expect(g * f.rise).toBeCloseTo(0.15 * f.speed ** 2, 12);
      expect(f.rise / h1).toBeCloseTo(f.riseRatio, 12);
    }
  });

  it("without a push there is no fountain and v = √(g·h1) (physics-reference §1, [derived])", () => {
    const f = fountainSteady({ potHeight: 1.7, alpha: 0, beta: 0 });
    expect(f.rise).toBe(0);
    expect(f.speed).toBeCloseTo(Math.sqrt(g * 1.7), 12);
  });

  it("gives tensions per unit λ when λ is omitted (N per kg/m)", () => {
    const perUnit = fountainSteady({ potHeight: 1, alpha: 0.12, beta: 0 });
    const withLambda = fountainSteady({ potHeight: 1, alpha: 0.12, beta: 0, lambda: 0.04 });
    expect(perUnit.tensionCrest).toBeCloseTo(perUnit.speed ** 2, 12);
    expect(withLambda.tensionPot).toBeCloseTo(0.04 * perUnit.tensionPot, 12);
  });

  it("uses the examiners' fit as the typical push: α = 0.12, β = 0, so h2/h1 is of order 0.1", () => {
    // Singapore Physics Olympiad Training, examiner's report, 2018 selection test, problem 1;
    // "real chains give h2/h1 of order 0.1" is [memory] in the reference, hence the loose bound.
    expect(TYPICAL_ALPHA).toBe(0.12);
    expect(TYPICAL_BETA).toBe(0);
    const ratio = fountainSteady({ potHeight: 1, alpha: TYPICAL_ALPHA, beta: TYPICAL_BETA }).riseRatio;
    expect(ratio).toBeGreaterThan(0.05);
    expect(ratio).toBeLessThan(0.2);
  });

  it.each([
    [{ potHeight: 1, alpha: -0.1, beta: 0 }, /alpha/],
    [{ potHeight: 1, alpha: 0.1, beta: -0.01 }, /beta/],
    [{ potHeight: 1, alpha: 0.6, beta: 0.4 }, /alpha \+ beta/],
    [{ potHeight: 0, alpha: 0.1, beta: 0 }, /potHeight/],
    [{ potHeight: 1, alpha: Number.NaN, beta: 0 }, /alpha/],
    [{ potHeight: 1, alpha: 0.1, beta: 0, lambda: 0 }, /lambda/],
    [{ potHeight: 1, alpha: 0.1, beta: 0, g: -9.81 }, /g must/],
  ])("refuses %o with a RangeError naming the parameter", (input, message) => {
    expect(() => fountainSteady(input)).toThrow(RangeError);
    expect(() => fountainSteady(input)).toThrow(message);
  });
});

describe("fountain energy budget [derived from Biggins & Warner 2014]", () => {
  it.each([
    { alpha: 0.12, beta: 0 },
    { alpha: 0.12, beta: 0.12 },
    { alpha: 1 / 3, beta: 0 },
    { alpha: 0.05, beta: 0.3 },
  ])("losses at pile and floor add up to the released power (α = $alpha, β = $beta)", ({ alpha, beta }) => {
    const lambda = 0.02;
    const h1 = 1.2;
    const e = fountainEnergyBudget({ potHeight: h1, alpha, beta, lambda });
    // Released power computed independently from the steady speed: mass λv per second falls h1.
    const v = fountainSteady({ potHeight: h1, alpha, beta }).speed;
    expect(e.released).toBeCloseTo(lambda * v * g * h1, 12);
    expect((e.lostAtPile + e.lostAtFloor) / e.released).toBeCloseTo(1, 12);
    expect(e.kineticFlux).toBeCloseTo(0.5 * lambda * v ** 3, 12);
  });

  it("with no push, half the power is lost at pick-up and half at the floor (physics-reference §1, [derived])", () => {
    const e = fountainEnergyBudget({ potHeight: 1, alpha: 0, beta: 0, lambda: 0.02 });
    expect(e.lostAtPile).toBeCloseTo(e.lostAtFloor, 12);
    expect(e.lostAtPile / e.released).toBeCloseTo(0.5, 12);
    expect(e.kineticFlux).toBeCloseTo(e.lostAtPile, 12);
  });

  it("refuses a push that would make the pile or floor a source of energy", () => {
    expect(() => fountainEnergyBudget({ potHeight: 1, alpha: 0.6, beta: 0, lambda: 0.02 })).toThrow(/alpha/);
    expect(() => fountainEnergyBudget({ potHeight: 1, alpha: 0, beta: 0.55, lambda: 0.02 })).toThrow(/beta/);
    expect(() => fountainEnergyBudget({ potHeight: 1, alpha: 0.1, beta: 0, lambda: -1 })).toThrow(/lambda/);
  });
});

describe("fountain without a floor (Biggins, EPL 106, 44001, 2014, [derived])", () => {
  it("satisfies the quasi-steady momentum balance it was derived from", () => {
    // λz·a = λgz − (1 − α)λv² with v² = 2az, and g·h2 = α·v² (see fountain.ts).
    for (const alpha of [0, 0.12, 1 / 3]) {
      const { accelRatio, riseRatio } = noFloorGrowth(alpha);
      const z = 2;
      const a = accelRatio * g;
      const v2 = 2 * a * z;
      expect(a * z).toBeCloseTo(g * z - (1 - alpha) * v2, 10);
      expect(riseRatio * z * g).toBeCloseTo(alpha * v2, 10);
    }
  });

  it("falls at g/3 with no push, like Cayley's inelastic heap", () => {
    // α = 0: every link is picked up inelastically from rest, the same algebra as a chain falling
    // from a heap over an edge (Cayley 1857 [memory]: a = g/3).
    expect(noFloorGrowth(0).accelRatio).toBeCloseTo(1 / 3, 15);
    expect(noFloorGrowth(0).riseRatio).toBe(0);
  });

  it("refuses α outside [0, 1)", () => {
    expect(() => noFloorGrowth(-0.1)).toThrow(/alpha/);
    expect(() => noFloorGrowth(1)).toThrow(/alpha/);
  });
});

describe("arch over a tilted pot: inverted catenary (Biggins, EPL 106, 44001, 2014)", () => {
  it("has a = (λv² − T_apex)/(λg)", () => {
    const { a } = tiltedPotShape({ lambda: 0.02, speed: 3, apexTension: 0.1 });
    expect(a).toBeCloseTo((0.02 * 9 - 0.1) / (0.02 * g), 12);
  });

  it("balances forces across the moving chain at every point of the arch", () => {
    // Independent check with numerical derivatives of z(x). For chain moving along a fixed curve at
    // speed v, across the curve: λv²κ = Tκ + λg·cosθ (the inward pull of tension and gravity's
    // inward component supply the centripetal force); along it, steady: T − λgz is constant, so
    // T = T_apex + λg·z. Here κ = |z''|/(1 + z'²)^{3/2} and cosθ = 1/√(1 + z'²).
    const lambda = 0.02;
    const v = 3;
    const apexTension = 0.1;
    const { z } = tiltedPotShape({ lambda, speed: v, apexTension });
    const h = 1e-4;
    for (const x of [0, 0.1, 0.25, -0.3, 0.5]) {
      const slope = (z(x + h) - z(x - h)) / (2 * h);
      const curvature = Math.abs(z(x + h) - 2 * z(x) + z(x - h)) / h ** 2 / (1 + slope ** 2) ** 1.5;
      const T = apexTension + lambda * g * z(x);
      const cosTheta = 1 / Math.sqrt(1 + slope ** 2);
      expect(lambda * v ** 2 * curvature).toBeCloseTo(T * curvature + lambda * g * cosTheta, 5);
    }
    expect(z(0)).toBe(0);
    expect(z(0.2)).toBeLessThan(0);
  });

  it("refuses an apex tension at or above λv² (no arch: a vertical fountain)", () => {
    expect(() => tiltedPotShape({ lambda: 0.02, speed: 3, apexTension: 0.18 })).toThrow(/apexTension/);
    expect(() => tiltedPotShape({ lambda: 0.02, speed: 0, apexTension: 0 })).toThrow(/speed/);
  });
});

import { describe, expect, it } from "vitest";
import { ParamError } from "../params";
import { runTrial, TrialRunner } from "../run/run-trial";
import { foldedBandMean, FOLDED_STOP } from "./folded";
import { RIGS } from "./index";

const g = 9.81;

// The folded (U) chain, energy-conserving: v² = g·x(2L − x)/(L − x), so v²/(2gx) = 1.5 at
// x/L = 0.5 (M. G. Calkin & R. H. March, "The dynamics of a falling chain. I", Am. J. Phys. 57,
// 154 (1989)). sim-notes saw v² within about 5 % of it and a/g stepping ±10–15 % link by link.
describe("folded chain rig", () => {
  let shipped: ReturnType<typeof runTrial> | undefined;
  const shippedRun = () => (shipped ??= runTrial(RIGS.folded, {}, { frameRate: 0 }));

  it("the free end's v²/(2gx) at x = L/2 is within 5 % of the energy-conserving chain's 1.5", () => {
    const { measured, theory } = shippedRun();
    expect(theory.speedRatio).toBeCloseTo(1.5, 12);
    const speed = measured.speedRatio!;
    expect(Math.abs(speed.value / 1.5 - 1), speed.value.toFixed(4)).toBeLessThan(0.05);
    expect(speed.uncertainty).toBeLessThan(0.05 * 1.5);
  }, 30_000);

  it("the free end's mean a/g while x goes from 0.4 L to 0.6 L is within 10 % of the energy-conserving chain's", () => {
    const { measured, theory } = shippedRun();
    // The formula's a/g runs from 1.889 to 3.625 across the band; its time average is 2.537.
    expect(theory.accelRatio).toBeCloseTo(2.537, 3);
    const accel = measured.accelRatio!;
    expect(Math.abs(accel.value / theory.accelRatio! - 1), accel.value.toFixed(4)).toBeLessThan(0.1);
    expect(accel.uncertainty).toBeLessThan(0.1 * theory.accelRatio!);
  }, 30_000);

  it("meets both targets for a 3 m chain too", () => {
    const { measured, theory } = runTrial(RIGS.folded, { chainLength: 3 }, { frameRate: 0 });
    expect(Math.abs(measured.speedRatio!.value / theory.speedRatio! - 1)).toBeLessThan(0.05);
    expect(Math.abs(measured.accelRatio!.value / theory.accelRatio! - 1)).toBeLessThan(0.1);
  }, 30_000);

  it("does not depend on the step, and the predicted-angle joint solve falls short where links flip over", () => {
    const { measured, theory } = shippedRun();
    const fine = runTrial(RIGS.folded, { dt: 0.0000625 }, { frameRate: 0 }).measured;
    const predicted = runTrial(RIGS.folded, { leverFromStepStart: false }, { frameRate: 0 }).measured;
    const error = (m: typeof measured, key: "speedRatio" | "accelRatio") => m[key]!.value / theory[key]! - 1;
    for (const key of ["speedRatio", "accelRatio"] as const) {
      // Converged: a quarter of the step changes the result by under 1 %.
      expect(Math.abs(error(fine, key) - error(measured, key))).toBeLessThan(0.01);
    }
    // Energy lost in the fast-turning links of the bend shows as a shortfall (sim/core/world.test.ts).
    expect(error(predicted, "accelRatio")).toBeLessThan(-Math.abs(error(measured, "accelRatio")));
  }, 30_000);

  it("stops when the free end has fallen 0.8 L, before the formula runs away", () => {
    const run = shippedRun();
    const fallen = run.series.find((s) => s.name === "fallen")!;
    // Rod links (the default): each element is one pitch long.
    const L = run.elements.reduce((s, e) => s + e.length, 0);
    const last = fallen.v[fallen.v.length - 1]!;
    expect(last / L).toBeGreaterThan(FOLDED_STOP - 0.03);
    expect(last / L).toBeLessThan(FOLDED_STOP + 0.01);
  }, 30_000);

  it("the theory's band mean matches the equation of motion integrated in time", () => {
    // ẍ = g + ẋ²/(2(L − x)), from energy conservation (derived in sim/theory/ode-crosschecks.test.ts),
    // integrated from rest with classical Runge–Kutta; shares nothing with the closed forms.
    const L = 1.3;
    const accel = (x: number, v: number) => g + (v * v) / (2 * (L - x));
    const h = 1e-5;
    let t = 0;
    let x = 0;
    let v = 0;
    const crossings: { t: number; v: number }[] = [];
    for (const target of [0.4 * L, 0.6 * L]) {
      while (x < target) {
        const k1x = v;
        const k1v = accel(x, v);
        const k2x = v + (h / 2) * k1v;
        const k2v = accel(x + (h / 2) * k1x, k2x);
        const k3x = v + (h / 2) * k2v;
        const k3v = accel(x + (h / 2) * k2x, k3x);
        const k4x = v + h * k3v;
        const k4v = accel(x + h * k3x, k4x);
        const nx = x + (h / 6) * (k1x + 2 * k2x + 2 * k3x + k4x);
        const nv = v + (h / 6) * (k1v + 2 * k2v + 2 * k3v + k4v);
        if (nx >= target) {
          const f = (target - x) / (nx - x);
          crossings.push({ t: t + f * h, v: v + f * (nv - v) });
        }
        x = nx;
        v = nv;
        t += h;
      }
    }
    const [a, b] = crossings as [{ t: number; v: number }, { t: number; v: number }];
    const band = foldedBandMean(L, 0.4 * L, 0.6 * L);
    expect(band.time / (b.t - a.t)).toBeCloseTo(1, 5);
    expect(band.accelRatio / ((b.v - a.v) / (g * (b.t - a.t)))).toBeCloseTo(1, 4);
  });

  it("refuses a chain length out of range, naming the parameter, its unit and its range", () => {
    expect(() => new TrialRunner(RIGS.folded, { chainLength: 0.1 })).toThrow(ParamError);
    expect(() => new TrialRunner(RIGS.folded, { chainLength: 0.1 })).toThrow(/chainLength: Chain length must be from 0\.3 to 3 m/);
    expect(() => new TrialRunner(RIGS.folded, { dt: 0 })).toThrow(/dt: Time step must be from 0\.00003125 to 0\.001 s/);
  });
});

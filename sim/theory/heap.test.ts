import { describe, expect, it } from "vitest";
import { STANDARD_G } from "./constants";
import { heapLiftForce, heapLiftPower } from "./heap";

const g = STANDARD_G;

describe("lifting a chain off a heap at constant speed ([textbook], conveyor-belt analogy)", () => {
  it("needs the weight lifted plus the momentum flux, F = λgy + λv², as a momentum balance shows", () => {
    // Independent: the lifted part (length y = vt, all moving at v) has momentum P = λ·y·v;
    // F − λgy = dP/dt, taken numerically.
    const lambda = 0.08;
    const v = 1.5;
    const P = (t: number) => lambda * (v * t) * v;
    const h = 1e-6;
    for (const t of [0.1, 0.4]) {
      const y = v * t;
      const dPdt = (P(t + h) - P(t - h)) / (2 * h);
      expect(heapLiftForce({ lambda, height: y, speed: v })).toBeCloseTo(lambda * g * y + dPdt, 8);
    }
  });

  it("spends λv³ on picking up, of which half becomes kinetic energy and half is dissipated", () => {
    const lambda = 0.08;
    const v = 1.5;
    const y = 0.6;
    const p = heapLiftPower({ lambda, height: y, speed: v });
    expect(p.pickUp).toBeCloseTo(lambda * v ** 3, 12);
    expect(p.toKinetic).toBeCloseTo(p.pickUp / 2, 12);
    expect(p.dissipated).toBeCloseTo(p.pickUp / 2, 12);
    // Energy balance from the stored energies, differentiated numerically: KE = ½λ·y·v²,
    // PE = λg·y²/2 (centre of the lifted part at y/2); y = v·t.
    const energy = (t: number) => 0.5 * lambda * (v * t) * v * v + (lambda * g * (v * t) ** 2) / 2;
    const t = y / v;
    const h = 1e-6;
    const dEdt = (energy(t + h) - energy(t - h)) / (2 * h);
    expect(p.input).toBeCloseTo(heapLiftForce({ lambda, height: y, speed: v }) * v, 12);
    expect(p.input - dEdt).toBeCloseTo(p.dissipated, 6);
    expect(p.toPotential + p.toKinetic).toBeCloseTo(dEdt, 6);
  });

  it("refuses negative heights and speeds", () => {
    expect(() => heapLiftForce({ lambda: 0.1, height: -1, speed: 1 })).toThrow(/height/);
    expect(() => heapLiftForce({ lambda: 0.1, height: 1, speed: -1 })).toThrow(/speed/);
  });
});

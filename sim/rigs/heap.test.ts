import { describe, expect, it } from "vitest";
import { runTrial } from "../run/run-trial";
import { heapRig } from "./heap";

// Lifting a chain off a heap at constant speed v: F = λgy + λv², half the input power lost
// at pick-up [textbook; the same as loading a conveyor belt]. sim-notes: the mean over a
// range of heights came within 2 % (self-collision off) to 9 % (on).
describe("heap rig", () => {
  for (const speed of [1, 2.5]) {
    it(`pulls with λg·ȳ + λv² (within 10 %) at ${speed} m/s`, () => {
      const run = runTrial(heapRig, { speed }, { frameRate: 0 });
      const measured = run.measured.force!.value;
      const theory = run.theory.force!;
      expect(theory).toBeCloseTo(0.05 * (9.81 * 0.6 + speed * speed), 10);
      expect(Math.abs(measured - theory) / theory).toBeLessThan(0.1);
    }, 60_000);
  }

  it("feels the momentum flux: the force grows with speed by about λΔ(v²)", () => {
    const slow = runTrial(heapRig, { speed: 0.5 }, { frameRate: 0 }).measured.force!.value;
    const fast = runTrial(heapRig, { speed: 2.5 }, { frameRate: 0 }).measured.force!.value;
    const expected = 0.05 * (2.5 ** 2 - 0.5 ** 2);
    expect(Math.abs(fast - slow - expected) / expected).toBeLessThan(0.2);
  }, 60_000);
});

import { describe, expect, it } from "vitest";
import { runTrial } from "../run/run-trial";
import { catenaryFromSpan } from "../theory/catenary";
import { hangingRig } from "./hanging";

// Checks against the catenary y = a·cosh(x/a) − a, ℓ = 2a·sinh(d/2a), T0 = λga [textbook:
// Huygens, Leibniz and Johann Bernoulli, 1691]; sim-notes saw 0.02–0.06 % on sag.
describe("hanging chain rig", () => {
  it("settles to the catenary: sag within 1 %, horizontal pull and end tension within 2 %", () => {
    const run = runTrial(hangingRig, { span: 1.6, chainLength: 2 }, { frameRate: 0 });
    // The reference's worked case (physics-reference §3): 2.000 m chain, supports 1.600 m apart.
    const curve = catenaryFromSpan({ span: 1.6, length: 2, lambda: 0.05, g: 9.81 });
    expect(curve.sag).toBeCloseTo(0.5309, 4);
    const sag = run.measured.sag!;
    expect(Math.abs(sag.value - curve.sag) / curve.sag).toBeLessThan(0.01);
    expect(Math.abs(run.measured.lowestTension!.value - curve.lowestPointTension) / curve.lowestPointTension).toBeLessThan(0.02);
    // End tension / T0 = 1.7848 for this case (physics-reference §3).
    expect(run.measured.endTension!.value / run.measured.lowestTension!.value).toBeCloseTo(1.7848, 1);
    expect(sag.uncertainty).toBeLessThan(0.005);
  }, 60_000);

  it("handles supports at different heights", () => {
    const params = { span: 1.2, heightDifference: 0.3, chainLength: 1.8 };
    const run = runTrial(hangingRig, params, { frameRate: 0 });
    const curve = catenaryFromSpan({ span: 1.2, length: 1.8, heightDifference: 0.3, lambda: 0.05, g: 9.81 });
    expect(Math.abs(run.measured.sag!.value - curve.sag) / curve.sag).toBeLessThan(0.01);
  }, 60_000);

  it("refuses a chain too short to reach both supports, naming the parameter", () => {
    expect(() => runTrial(hangingRig, { span: 2, chainLength: 1 })).toThrow(/chainLength/);
  });
});

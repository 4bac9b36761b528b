import { describe, expect, it } from "vitest";
import { trialResultInputSchema } from "@contracts/lessons";
import { RIGS, runTrial } from "@sim/index";
import { seedForTrial, trialResultPayload } from "./trial-result";

describe("a trial's seed", () => {
  it("is the same for the same trial id, differs between ids, and fits the contract's range", () => {
    const a = seedForTrial("6f1c1d2e-8a53-4d1e-9a43-0c6a1b2c3d4e");
    expect(seedForTrial("6f1c1d2e-8a53-4d1e-9a43-0c6a1b2c3d4e")).toBe(a);
    expect(seedForTrial("6f1c1d2e-8a53-4d1e-9a43-0c6a1b2c3d4f")).not.toBe(a);
    expect(Number.isInteger(a) && a >= 0 && a <= 2 ** 31 - 1).toBe(true);
  });

  it("keeps a seed the server already stored", () => {
    expect(seedForTrial("any", 42)).toBe(42);
  });
});

describe("the result the board sends", () => {
  const trialId = "6f1c1d2e-8a53-4d1e-9a43-0c6a1b2c3d4e";

  it("passes the server's schema for a real short run, with the run's own seed and step count", () => {
    const recording = runTrial(RIGS.hanging, { span: 1.2, chainLength: 1.5 }, { seed: 9, frameRate: 10 });
    const payload = trialResultPayload(trialId, recording);
    const parsed = trialResultInputSchema.safeParse(payload);
    expect(parsed.success, JSON.stringify(parsed.error?.issues)).toBe(true);
    expect(payload.seed).toBe(9);
    expect(payload.run.steps).toBe(recording.run.steps);
    expect(Object.keys(payload.measured).length).toBeGreaterThan(0);
  });

  it("leaves out values the run could not settle", () => {
    const recording = runTrial(RIGS.hanging, { span: 1.2, chainLength: 1.5 }, { seed: 1, frameRate: 0, maxSeconds: 0.05 });
    recording.measured = {
      sag: { value: 0.3, uncertainty: 0.01, unit: "m", basis: "x".repeat(400) },
      endTension: { value: Number.NaN, uncertainty: Number.NaN, unit: "N", basis: "" },
      lowestTension: { value: 1, uncertainty: Number.NaN, unit: "N", basis: "" },
    };
    const payload = trialResultPayload(trialId, recording);
    expect(Object.keys(payload.measured)).toEqual(["sag"]);
    expect(payload.measured.sag!.basis.length).toBe(300);
    expect(trialResultInputSchema.safeParse(payload).success).toBe(true);
  });
});

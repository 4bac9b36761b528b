import { describe, expect, it } from "vitest";
import { RIGS, TrialRunner } from "@sim/index";
import { runInSlices, type SteppedRun } from "./run-in-slices";

/** A run of `total` steps on a fake clock: each step costs 1 ms. */
function fakeRun(total: number) {
  let clock = 0;
  let steps = 0;
  const run: SteppedRun & { steps: () => number } = {
    get done() {
      return steps >= total;
    },
    advance(n) {
      const todo = Math.min(n, total - steps);
      steps += todo;
      clock += todo;
      return steps / total;
    },
    steps: () => steps,
  };
  return { run, now: () => clock };
}

describe("running a trial in slices", () => {
  it("works in slices of about the given time, reports rising progress and finishes", async () => {
    const { run, now } = fakeRun(1000);
    const progress: number[] = [];
    let yields = 0;
    const outcome = await runInSlices(run, {
      isCancelled: () => false,
      onProgress: (share) => progress.push(share),
      yieldNow: async () => void yields++,
      now,
      sliceMs: 100,
      stepsPerCall: 10,
    });
    expect(outcome).toBe("done");
    expect(run.steps()).toBe(1000);
    expect(progress).toHaveLength(10);
    expect(progress.at(-1)).toBe(1);
    expect(progress).toEqual([...progress].sort((a, b) => a - b));
    expect(yields).toBe(10);
  });

  it("stops at the next slice once cancelled, without finishing the run", async () => {
    const { run, now } = fakeRun(1000);
    let slices = 0;
    const outcome = await runInSlices(run, {
      isCancelled: () => slices >= 3,
      onProgress: () => slices++,
      yieldNow: async () => {},
      now,
      sliceMs: 50,
      stepsPerCall: 10,
    });
    expect(outcome).toBe("cancelled");
    expect(run.steps()).toBe(150);
  });

  it("runs a real short hanging-chain trial to the same recording as one long call", async () => {
    const params = { span: 1.2, chainLength: 1.5 };
    const sliced = new TrialRunner(RIGS.hanging, params, { seed: 3, frameRate: 30, maxSeconds: 0.2 });
    await runInSlices(sliced, { isCancelled: () => false, onProgress: () => {}, yieldNow: async () => {}, now: () => performance.now(), sliceMs: 1, stepsPerCall: 7 });
    const whole = new TrialRunner(RIGS.hanging, params, { seed: 3, frameRate: 30, maxSeconds: 0.2 });
    whole.advance(1_000_000);
    const a = sliced.result();
    const b = whole.result();
    expect(a.frames.length).toBeGreaterThan(3);
    expect(a.frames.length).toBe(b.frames.length);
    expect(Array.from(a.frames.at(-1)!)).toEqual(Array.from(b.frames.at(-1)!));
  });
});

import type { RigDefinition } from "../rigs/rig";
import { TrialRunner } from "./run-trial";

/**
 * A cheaper, interactive run for tinkering at set-up time: a coarser step and no recording,
 * advanced by the caller's frame clock. Results from it are not shown as measurements (the
 * fountain's height depends on the step; see DEVELOPERS.md "Simulation").
 */
export const LIVE_DT = 0.0005;
/** Most steps one call may take, so a slow device drops simulated time instead of freezing. */
const MAX_STEPS_PER_CALL = 400;

export class LiveSimulation {
  private readonly runner: TrialRunner;

  constructor(definition: RigDefinition, input: Record<string, unknown>, seed = 1) {
    const dt = Math.max(Number(input.dt ?? 0) || 0, LIVE_DT);
    this.runner = new TrialRunner(definition, { ...input, dt }, { seed, frameRate: 0, probeRate: 50 });
  }

  get time() {
    return this.runner.time;
  }

  get done() {
    return this.runner.done;
  }

  /** Advance by `seconds` of simulated time (or as much as one call may do); returns the frame to draw. */
  advance(seconds: number): Float32Array {
    const dt = this.runner.instance.world.settings.dt / 1000;
    this.target += seconds;
    const wanted = Math.floor((this.target - this.runner.time) / dt + 1e-9);
    this.runner.advance(Math.min(MAX_STEPS_PER_CALL, Math.max(0, wanted)));
    // Behind after a capped call: drop the missed time rather than try to catch up.
    if (wanted > MAX_STEPS_PER_CALL) this.target = this.runner.time;
    return this.runner.frame();
  }

  private target = 0;
}

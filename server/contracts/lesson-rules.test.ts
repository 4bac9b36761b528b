import { describe, expect, it } from "vitest";
import { TRIAL_PHASES, canMovePhase, canMoveTrialPhase, phaseStepsFor } from "./lesson-rules";

describe("phase moves that follow the question", () => {
  it("with both steps asked for, the moves are the usual ones", () => {
    for (const from of TRIAL_PHASES)
      for (const to of TRIAL_PHASES) expect(canMoveTrialPhase(from, to, { askExplanation: true, revote: true })).toBe(canMovePhase(from, to));
  });

  it("without an explanation the trial never reaches explain, and the re-vote opens straight after the run", () => {
    const flags = { askExplanation: false, revote: true };
    expect(canMoveTrialPhase("observe", "explain", flags)).toBe(false);
    expect(canMoveTrialPhase("revote", "explain", flags)).toBe(false);
    expect(canMoveTrialPhase("observe", "revote", flags)).toBe(true);
    expect(phaseStepsFor(flags, "observe")).toEqual(["setup", "predict", "observe"]);
  });

  it("without a re-vote the trial never reaches revote; with neither, observe is the last step", () => {
    expect(canMoveTrialPhase("explain", "revote", { revote: false })).toBe(false);
    expect(canMoveTrialPhase("observe", "explain", { revote: false })).toBe(true);
    const none = { askExplanation: false, revote: false };
    expect(TRIAL_PHASES.filter((to) => canMoveTrialPhase("observe", to, none))).toEqual([]);
  });

  it("observe to revote stays closed while an explanation is asked for (explain comes first)", () => {
    expect(canMoveTrialPhase("observe", "revote", {})).toBe(false);
    expect(phaseStepsFor({}, "revote")).toEqual(["setup", "predict", "observe", "explain", "revote"]);
  });
});

import { canMovePhase, type TrialPhase } from "@contracts/lesson-rules";

/** What "Next" (N, →) moves to: the usual order; the re-vote is opened with its own button. */
const NEXT: Record<TrialPhase, TrialPhase | null> = { setup: "predict", predict: "observe", observe: "explain", explain: null, revote: "explain" };

export function nextPhaseOf(phase: TrialPhase): TrialPhase | null {
  const next = NEXT[phase];
  return next && canMovePhase(phase, next) ? next : null;
}

/** Run moves to observe (closing predictions) unless the trial is already there or past it. */
export const runNeedsPhaseChange = (phase: TrialPhase) => phase === "setup" || phase === "predict";

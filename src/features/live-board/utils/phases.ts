import { canMoveTrialPhase, type PhaseFlags, type TrialPhase } from "@contracts/lesson-rules";

/** What "Next" (N, →) moves to: the usual order; the re-vote is opened with its own button. */
const NEXT: Record<TrialPhase, TrialPhase | null> = { setup: "predict", predict: "observe", observe: "explain", explain: null, revote: "explain" };

/** The next phase, skipping none: a step the question leaves out (no explanation asked) is simply not offered. */
export function nextPhaseOf(phase: TrialPhase, flags: PhaseFlags = {}): TrialPhase | null {
  const next = NEXT[phase];
  return next && canMoveTrialPhase(phase, next, flags) ? next : null;
}

/** The re-vote button: open it (after explain, or straight after the run when no explanation is asked), or close it back to explain. */
export function revoteToggleOf(phase: TrialPhase, flags: PhaseFlags): { to: TrialPhase; label: string } | null {
  if (phase !== "revote" && canMoveTrialPhase(phase, "revote", flags)) return { to: "revote", label: "Open a re-vote" };
  if (phase === "revote" && canMoveTrialPhase(phase, "explain", flags)) return { to: "explain", label: "Close the re-vote" };
  return null;
}

/** Run moves to observe (closing predictions) unless the trial is already there or past it. */
export const runNeedsPhaseChange = (phase: TrialPhase) => phase === "setup" || phase === "predict";

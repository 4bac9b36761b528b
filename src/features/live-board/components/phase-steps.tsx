import { TRIAL_PHASE_LABELS, phaseStepsFor, type PhaseFlags, type TrialPhase } from "@contracts/lesson-rules";
import { cx } from "@/lib/cx";

/**
 * The trial's phases in order (without those its question leaves out); the current one is
 * filled, bold and marked "now" (not colour alone).
 */
export function PhaseSteps({ phase, question, className, size = "board" }: { phase: TrialPhase; question: PhaseFlags; className?: string; size?: "board" | "remote" }) {
  const steps = phaseStepsFor(question, phase);
  const currentIndex = steps.indexOf(phase);
  return (
    <ol aria-label="Phases of this trial" className={cx("flex flex-wrap items-center gap-2", size === "board" ? "text-[max(1rem,2.6vh)]" : "text-base", className)}>
      {steps.map((step, i) => {
        const current = step === phase;
        const done = i < currentIndex;
        return (
          <li key={step} aria-current={current ? "step" : undefined} className="flex items-center gap-2">
            {i > 0 ? <span aria-hidden="true" className="text-ink-muted">→</span> : null}
            <span
              className={cx(
                "rounded-full border-2 px-3 py-0.5",
                current ? "border-accent bg-accent font-bold text-on-accent" : done ? "border-line-strong text-ink-muted line-through decoration-1" : "border-line text-ink-muted",
              )}
            >
              {current ? <span className="sr-only">Now: </span> : done ? <span className="sr-only">Done: </span> : null}
              {TRIAL_PHASE_LABELS[step]}
            </span>
          </li>
        );
      })}
    </ol>
  );
}

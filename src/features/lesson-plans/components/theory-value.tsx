import type { ShownValue } from "@contracts/lessons";
import { Spinner } from "@/components/ui/spinner";

/** Three significant figures, as the board shows a theory value at a glance. */
export const formatTheory = (value: ShownValue) => `${Number(value.value.toPrecision(3))}${value.unit ? ` ${value.unit}` : ""}`;

/** The theory value for a trial's set-up, in the question's unit (or why there is none). */
export function TheoryValue({ theory, updating = false, problem = null }: { theory: ShownValue | null; updating?: boolean; problem?: string | null }) {
  return (
    <p className="flex flex-wrap items-center gap-2" aria-live="polite">
      <span className="font-bold">Theory:</span>
      {problem ? (
        <span className="text-ink-muted">{problem}</span>
      ) : theory ? (
        <span className="font-mono text-lg font-bold" data-testid="trial-theory">
          {formatTheory(theory)}
        </span>
      ) : (
        <span className="text-ink-muted">none for this question</span>
      )}
      {updating ? (
        <span className="flex items-center gap-1 text-sm text-ink-muted">
          <Spinner className="size-4" /> updating…
        </span>
      ) : null}
    </p>
  );
}

import { RIG_NAMES } from "@contracts/lesson-questions";
import { SetupFields } from "@/components/trial-setup/setup-fields";
import { setupPayload, type SetupDraft } from "@/components/trial-setup/setup-form";
import { Button } from "@/components/ui/button";
import { ChevronDownIcon, RemoveIcon } from "@/components/ui/icons";
import { isApiError } from "@/lib/api-client";
import { useTrialPreview } from "../api/preview-trial";
import { useDebouncedValue } from "../hooks/use-debounced-value";
import { crestRiseSi } from "../utils/preview-geometry";
import { RigPreview } from "./rig-preview";
import { TheoryValue } from "./theory-value";

const PREVIEW_DELAY_MS = 300;

/**
 * One trial of the plan being edited: its position controls (move up/down by button, so the
 * keyboard can do it), a sketch of the set-up and its theory value, and the set-up form.
 */
export function TrialCard({ index, count, trialKey, setup, errors, onChange, onMove, onRemove }: {
  index: number;
  count: number;
  trialKey: string;
  setup: SetupDraft;
  errors: Record<string, string>;
  onChange: (update: (draft: SetupDraft) => SetupDraft) => void;
  onMove: (to: number) => void;
  onRemove: () => void;
}) {
  const number = index + 1;
  const payload = useDebouncedValue(setupPayload(setup).payload, PREVIEW_DELAY_MS);
  const preview = useTrialPreview(payload);
  const theory = preview.data?.theory ?? null;
  const problem = payload === null ? "fix the set-up to see it" : preview.isError ? (isApiError(preview.error) ? preview.error.message : "could not be worked out") : null;
  const headingId = `${trialKey}-heading`;
  return (
    <li aria-labelledby={headingId} className="rounded-card border border-line bg-surface p-4 shadow-card sm:p-6" data-testid="plan-trial">
      <div className="mb-4 flex flex-wrap items-center justify-between gap-3">
        <h3 id={headingId} className="text-lg font-bold">
          Trial {number} of {count}: {RIG_NAMES[setup.rig]}
        </h3>
        <div className="flex flex-wrap gap-2">
          <Button id={`${trialKey}-up`} variant="quiet" disabled={index === 0} onClick={() => onMove(index - 1)} aria-label={`Move trial ${number} up`}>
            <ChevronDownIcon className="size-5 rotate-180" /> Up
          </Button>
          <Button id={`${trialKey}-down`} variant="quiet" disabled={index === count - 1} onClick={() => onMove(index + 1)} aria-label={`Move trial ${number} down`}>
            <ChevronDownIcon className="size-5" /> Down
          </Button>
          <Button variant="quiet" icon={<RemoveIcon />} disabled={count <= 1} onClick={onRemove} aria-label={`Remove trial ${number}`}>
            Remove
          </Button>
        </div>
      </div>
      <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <div className="grid content-start gap-3 lg:order-2">
          <RigPreview setup={setup} theory={payload ? theory : null} theorySi={payload ? crestRiseSi(setup, theory) : null} />
          <TheoryValue theory={payload ? theory : null} updating={payload !== null && (preview.isFetching || preview.isPlaceholderData)} problem={problem} />
        </div>
        <div className="grid content-start gap-4">
          <SetupFields draft={setup} change={onChange} errors={errors} />
        </div>
      </div>
    </li>
  );
}

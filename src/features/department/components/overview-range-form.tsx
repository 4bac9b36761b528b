import { useEffect, useState, type FormEvent } from "react";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { PRESET_LABELS, RANGE_PRESETS, presetOf, presetRange, type OverviewRange } from "../utils/overview-range";

/**
 * Two dates and a few presets. Typed dates apply on "Show"; a preset applies at once. Messages
 * from the server (an end before the start, too long a range) appear under the date they concern.
 */
export function OverviewRangeForm({ range, today, onChange, errors }: {
  range: OverviewRange;
  today: string;
  onChange: (next: OverviewRange) => void;
  errors: { from?: string; to?: string };
}) {
  const [draft, setDraft] = useState(range);
  // The address can change the range too (back button, a preset): follow it.
  const { from, to } = range;
  useEffect(() => setDraft({ from, to }), [from, to]);
  const chosen = presetOf(range, today);

  const submit = (event: FormEvent) => {
    event.preventDefault();
    onChange(draft);
  };

  return (
    <form onSubmit={submit} className="grid gap-4" aria-label="Date range">
      <div className="flex flex-wrap items-center gap-2" role="group" aria-label="Quick ranges">
        <span className="font-bold">Quick ranges</span>
        {RANGE_PRESETS.map((preset) => (
          <Button
            key={preset}
            variant={chosen === preset ? "primary" : "secondary"}
            aria-pressed={chosen === preset}
            onClick={() => onChange(presetRange(preset, today))}
          >
            {PRESET_LABELS[preset]}
          </Button>
        ))}
      </div>
      <div className="flex flex-wrap items-start gap-4">
        <TextField
          label="From"
          type="date"
          value={draft.from}
          max={today}
          required
          error={errors.from}
          onChange={(e) => setDraft({ ...draft, from: e.target.value })}
          wrapperClassName="w-44"
        />
        <TextField
          label="To (included)"
          type="date"
          value={draft.to}
          required
          error={errors.to}
          onChange={(e) => setDraft({ ...draft, to: e.target.value })}
          wrapperClassName="w-44"
        />
        {/* Level with the inputs (below their labels), whether or not a message shows under them. */}
        <Button type="submit" variant="secondary" className="mt-[1.875rem]">
          Show
        </Button>
      </div>
    </form>
  );
}

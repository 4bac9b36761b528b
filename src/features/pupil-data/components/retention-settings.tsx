import { useEffect, useId, useState, type FormEvent } from "react";
import { RETENTION_LABELS, RETENTION_PERIODS, type RetentionPeriod, type RetentionSettings } from "@contracts/retention";
import { CheckCircleIcon, ClockIcon, ErrorIcon } from "@/components/ui/icons";
import { FormErrorNotice } from "@/components/ui/notice";
import { SaveRow } from "@/components/ui/save-row";
import { errorMessage } from "@/lib/api-client";
import { cx } from "@/lib/cx";
import { useUpdateRetention } from "../api/update-retention";
import { deletedSummary, formatDateTime } from "../utils/deleted-summary";

const PERIOD_NOTES: Record<RetentionPeriod, string> = {
  end_of_school_year: "Pupil data from a school year is deleted once that year ends. The usual choice.",
  days_90: "Deleted 90 days after its clock starts (for now: 90 days after a class is archived).",
  days_30: "Deleted 30 days after its clock starts. Less to look back on at the end of a term.",
};

/** The school's retention period, as a choice the admin saves. */
export function RetentionForm({ settings }: { settings: RetentionSettings }) {
  const [period, setPeriod] = useState<RetentionPeriod>(settings.period);
  const [saved, setSaved] = useState(false);
  const update = useUpdateRetention();
  const name = useId();
  useEffect(() => setPeriod(settings.period), [settings.period]);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (update.isPending) return;
    setSaved(false);
    update.mutate({ period }, { onSuccess: () => setSaved(true) });
  };
  const changed = period !== settings.period;

  return (
    <form onSubmit={submit} noValidate>
      <fieldset>
        <legend className="mb-2 font-bold">Keep pupil data</legend>
        <div className="grid gap-2">
          {RETENTION_PERIODS.map((value) => (
            <label
              key={value}
              className={cx(
                "flex min-h-touch cursor-pointer items-start gap-3 rounded-control border-2 px-3 py-2.5",
                period === value ? "border-accent bg-accent-soft" : "border-line hover:bg-sunken",
              )}
            >
              <input
                type="radio"
                name={name}
                value={value}
                checked={period === value}
                onChange={() => {
                  setPeriod(value);
                  setSaved(false);
                }}
                className="mt-1 size-5 accent-[var(--ll-accent)]"
              />
              <span>
                <span className="block font-bold">{RETENTION_LABELS[value]}</span>
                <span className="block text-sm text-ink-muted">{PERIOD_NOTES[value]}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      {update.error ? <FormErrorNotice className="mt-4">{errorMessage(update.error)}</FormErrorNotice> : null}
      <SaveRow
        label="Save retention period"
        busy={update.isPending}
        unchanged={!changed}
        saved={saved && !changed ? "Saved. The next deletion run uses it." : null}
      />
    </form>
  );
}

/** When the deletion job last ran, what it deleted for this school, and when it runs next. */
export function PurgeStatus({ settings }: { settings: RetentionSettings }) {
  const run = settings.lastRun;
  return (
    <dl className="grid gap-3 sm:grid-cols-2">
      <div className="rounded-control bg-sunken px-4 py-3">
        <dt className="flex items-center gap-2 text-sm font-bold text-ink-muted">
          <ClockIcon className="size-4" /> Last run
        </dt>
        <dd className="mt-1">
          {run ? (
            <>
              <span className="block font-bold">{formatDateTime(run.startedAt)}</span>
              {run.status === "succeeded" ? (
                <span className="flex items-center gap-1.5">
                  <CheckCircleIcon className="size-4 text-ok" /> Deleted {deletedSummary(run.deleted)} from this school.
                </span>
              ) : (
                <span className="flex items-center gap-1.5 font-bold text-danger">
                  <ErrorIcon className="size-4" /> It failed and deleted nothing; it tries again at the next run.
                </span>
              )}
            </>
          ) : (
            "It has not run yet."
          )}
        </dd>
      </div>
      <div className="rounded-control bg-sunken px-4 py-3">
        <dt className="flex items-center gap-2 text-sm font-bold text-ink-muted">
          <ClockIcon className="size-4" /> Next run
        </dt>
        <dd className="mt-1 font-bold">{settings.nextRunAt ? formatDateTime(settings.nextRunAt) : "Not scheduled on this server"}</dd>
      </div>
    </dl>
  );
}

import { useEffect, useMemo, useState, type FormEvent } from "react";
import { SelectField } from "@/components/ui/field";
import { FormErrorNotice } from "@/components/ui/notice";
import { SaveRow } from "@/components/ui/save-row";
import { errorMessage, isApiError } from "@/lib/api-client";
import { useUpdateTimeZone } from "../api/update-time-zone";
import { timeZoneGroups } from "../utils/time-zone-options";

const clockIn = (timeZone: string) =>
  new Date().toLocaleString("en-GB", { timeZone, weekday: "long", day: "numeric", month: "long", hour: "2-digit", minute: "2-digit" });

/**
 * The school's time zone, which the department overview's weeks and the weekly digest count in.
 * `onSaved` lets the page refresh whatever carries the zone (the session).
 */
export function TimeZoneForm({ current, onSaved }: { current: string; onSaved: () => Promise<unknown> }) {
  const [zone, setZone] = useState(current);
  const [saved, setSaved] = useState(false);
  const update = useUpdateTimeZone();
  const groups = useMemo(() => timeZoneGroups(current), [current]);
  useEffect(() => setZone(current), [current]);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (update.isPending) return;
    setSaved(false);
    update.mutate({ timeZone: zone }, { onSuccess: () => void onSaved().then(() => setSaved(true)) });
  };
  const changed = zone !== current;
  const fieldError = isApiError(update.error) ? update.error.fieldMessage("timeZone") : undefined;

  return (
    <form onSubmit={submit} noValidate aria-label="School time zone">
      <SelectField
        label="Time zone"
        hint={`It is now ${clockIn(zone)} there.`}
        error={fieldError ?? undefined}
        value={zone}
        onChange={(event) => {
          setZone(event.target.value);
          setSaved(false);
        }}
        wrapperClassName="max-w-md"
      >
        {groups.map((group) => (
          <optgroup key={group.region} label={group.region}>
            {group.zones.map((z) => (
              <option key={z.value} value={z.value}>
                {z.label}
              </option>
            ))}
          </optgroup>
        ))}
      </SelectField>
      {update.error && !fieldError ? <FormErrorNotice className="mt-4">{errorMessage(update.error)}</FormErrorNotice> : null}
      <SaveRow label="Save time zone" busy={update.isPending} unchanged={!changed} saved={saved && !changed ? "Saved." : null} />
    </form>
  );
}

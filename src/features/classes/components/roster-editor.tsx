import { useEffect, useId, useMemo, useRef, useState, type FormEvent } from "react";
import { ROSTER_LIMITS, type Roster } from "@contracts/roster";
import { Button } from "@/components/ui/button";
import { FieldError, CONTROL_CLASSES, TextAreaField } from "@/components/ui/field";
import { CheckCircleIcon, ListIcon, PlusIcon, RemoveIcon, WarnIcon } from "@/components/ui/icons";
import { FormErrorNotice } from "@/components/ui/notice";
import { useFocusFirstError } from "@/hooks/use-focus-first-error";
import { errorMessage, isApiError } from "@/lib/api-client";
import { cx } from "@/lib/cx";
import { useReplaceRoster } from "../api/replace-roster";
import { RosterCsvUpload } from "./roster-csv-panel";
import {
  newRowKey,
  placeServerErrors,
  rosterChanged,
  rowsFromNames,
  splitPastedNames,
  tidyName,
  validateRoster,
  type RosterRow,
} from "../utils/roster-draft";

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * Edits a class roster as a list of display names. The whole list is saved at once, in order.
 * Names are checked with the same rules as the server: pasted names at once, typed names from
 * the first save attempt on (checking on leaving a row would move the buttons under the pointer
 * mid-click). Server errors land on the row they belong to.
 */
export function RosterEditor({ classId, roster, onDirtyChange }: {
  classId: string;
  roster: Roster;
  onDirtyChange?: (dirty: boolean) => void;
}) {
  const savedNames = useMemo(() => roster.names.map((n) => n.displayName), [roster]);
  const [rows, setRows] = useState<RosterRow[]>(() => rowsFromNames(savedNames));
  /** Rows checked before any save attempt: the ones just pasted. */
  const [touched, setTouched] = useState<ReadonlySet<string>>(new Set());
  const [submitted, setSubmitted] = useState(false);
  const [serverRowErrors, setServerRowErrors] = useState<ReadonlyMap<string, string>>(new Map());
  const [serverFormErrors, setServerFormErrors] = useState<string[]>([]);
  const [status, setStatus] = useState<string | null>(null);
  const [pasteOpen, setPasteOpen] = useState(false);
  const formRef = useRef<HTMLFormElement>(null);
  const inputs = useRef(new Map<string, HTMLInputElement>());
  /** A row to focus as soon as its input exists (just added). */
  const focusOnMount = useRef<string | null>(null);
  const focusFirstError = useFocusFirstError(formRef);
  const save = useReplaceRoster();
  const baseId = useId();

  const values = rows.map((r) => r.value);
  const validation = validateRoster(values);
  const dirty = rosterChanged(values, savedNames);
  const nameCount = validation.names.length;

  useEffect(() => onDirtyChange?.(dirty), [dirty, onDirtyChange]);

  // The roster changed on the server (another tab, a refetch): show it, unless there are edits here
  // (then the edits stay, and saving replaces the roster with them).
  const previousSaved = useRef(savedNames);
  useEffect(() => {
    const before = previousSaved.current;
    previousSaved.current = savedNames;
    if (before === savedNames || rosterChanged(before, savedNames) === false) return;
    setRows((current) => (rosterChanged(current.map((r) => r.value), before) ? current : rowsFromNames(savedNames)));
  }, [savedNames]);

  const errorFor = (row: RosterRow, index: number) =>
    serverRowErrors.get(row.key) ?? (submitted || touched.has(row.key) ? validation.rowErrors.get(index) : undefined);

  const updateRow = (key: string, value: string) => {
    setRows((current) => current.map((r) => (r.key === key ? { ...r, value } : r)));
    if (serverRowErrors.has(key)) {
      const next = new Map(serverRowErrors);
      next.delete(key);
      setServerRowErrors(next);
    }
    setStatus(null);
  };

  const addRow = () => {
    const key = newRowKey();
    setRows((current) => [...current, { key, value: "" }]);
    focusOnMount.current = key;
    setStatus(null);
  };

  const removeRow = (index: number) => {
    const next = rows.filter((_, i) => i !== index);
    setRows(next);
    setStatus(`Removed row ${index + 1}.`);
    // Focus moves to the row that took its place (or the one before, or "Add name"), never to the page top.
    const neighbour = next[index] ?? next[index - 1];
    const target = neighbour ? inputs.current.get(neighbour.key) : document.getElementById(`${baseId}-add`);
    target?.focus();
  };

  const addPasted = (names: string[]) => {
    const kept = rows.filter((r) => tidyName(r.value));
    const added = rowsFromNames(names);
    setRows([...kept, ...added]);
    setTouched((t) => new Set([...t, ...added.map((r) => r.key)]));
    setPasteOpen(false);
    setStatus(`Added ${plural(names.length, "name", "names")}. Check them, then save the roster.`);
    if (added[0]) focusOnMount.current = added[0].key;
  };

  const savedFromFile = (savedRoster: Roster) => {
    setRows(rowsFromNames(savedRoster.names.map((n) => n.displayName)));
    setTouched(new Set());
    setSubmitted(false);
    setServerRowErrors(new Map());
    setServerFormErrors([]);
    setPasteOpen(false);
    setStatus(`Roster saved from the file: ${plural(savedRoster.names.length, "name", "names")}.`);
  };

  const loadFromFile = (names: string[]) => {
    const loaded = rowsFromNames(names);
    setRows(loaded);
    // Checked at once, like pasted names, so the rows that need fixing are marked.
    setTouched(new Set(loaded.map((r) => r.key)));
    setPasteOpen(false);
    setStatus(`Put ${plural(names.length, "name", "names")} from the file in the list. Fix any marked, then save the roster.`);
    if (loaded[0]) focusOnMount.current = loaded[0].key;
  };

  const discard = () => {
    setRows(rowsFromNames(savedNames));
    setTouched(new Set());
    setSubmitted(false);
    setServerRowErrors(new Map());
    setServerFormErrors([]);
    save.reset();
    setStatus("Changes discarded.");
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (save.isPending) return;
    setSubmitted(true);
    setStatus(null);
    if (!dirty && validation.valid) {
      setStatus("No changes to save.");
      return;
    }
    if (!validation.valid) {
      focusFirstError();
      return;
    }
    const rowsSent = rows;
    const rowOfName = validation.rowOfName;
    save.mutate(
      { classId, names: validation.names },
      {
        onSuccess: (savedRoster) => {
          setRows(rowsFromNames(savedRoster.names.map((n) => n.displayName)));
          setTouched(new Set());
          setSubmitted(false);
          setServerRowErrors(new Map());
          setServerFormErrors([]);
          setStatus(`Roster saved: ${plural(savedRoster.names.length, "name", "names")}.`);
        },
        onError: (error) => {
          const placed = placeServerErrors(isApiError(error) ? error.fields : {}, rowOfName);
          const byKey = new Map<string, string>();
          for (const [rowIndex, message] of placed.rowErrors) {
            const key = rowsSent[rowIndex]?.key;
            if (key) byKey.set(key, message);
          }
          setServerRowErrors(byKey);
          setServerFormErrors(byKey.size === 0 && placed.formErrors.length === 0 ? [errorMessage(error)] : placed.formErrors);
          focusFirstError();
        },
      },
    );
  };

  const formErrors = [...(submitted ? validation.formErrors : []), ...serverFormErrors];
  const rowsWithErrors = rows.filter((row, i) => errorFor(row, i)).length;

  return (
    <form ref={formRef} noValidate onSubmit={submit} aria-label="Roster">
      <p className="mb-4 flex items-start gap-2 rounded-control bg-sunken px-3 py-2 text-ink-muted">
        <span>
          Display names only: a first name and an initial, for example “Amira K.”. No surnames, e-mail addresses or other
          details.
        </span>
      </p>

      <div aria-live="polite" className="sr-only">
        {status}
      </div>

      {submitted && rowsWithErrors > 0 ? (
        <FormErrorNotice className="mb-4">
          {plural(rowsWithErrors, "name needs", "names need")} correcting before the roster can be saved.
        </FormErrorNotice>
      ) : null}

      {rows.length === 0 ? (
        <p className="rounded-control border-2 border-dashed border-line px-4 py-6 text-center text-ink-muted">
          No names on this roster yet. Add them one at a time, or paste a list.
        </p>
      ) : (
        <ol className="grid gap-2">
          {rows.map((row, index) => {
            const inputId = `${baseId}-row-${row.key}`;
            const errorId = `${inputId}-error`;
            const error = errorFor(row, index);
            const shown = tidyName(row.value);
            return (
              <li key={row.key} className="flex items-start gap-2">
                <span aria-hidden="true" className="w-8 shrink-0 pt-2.5 text-right font-mono text-ink-muted">
                  {index + 1}
                </span>
                <div className="min-w-0 flex-1">
                  <label htmlFor={inputId} className="sr-only">
                    Pupil {index + 1}
                  </label>
                  <input
                    id={inputId}
                    ref={(el) => {
                      if (!el) {
                        inputs.current.delete(row.key);
                        return;
                      }
                      inputs.current.set(row.key, el);
                      if (focusOnMount.current === row.key) {
                        focusOnMount.current = null;
                        el.focus();
                      }
                    }}
                    value={row.value}
                    onChange={(event) => updateRow(row.key, event.target.value)}
                    aria-invalid={error ? true : undefined}
                    aria-describedby={error ? errorId : undefined}
                    autoComplete="off"
                    autoCapitalize="words"
                    spellCheck={false}
                    maxLength={ROSTER_LIMITS.nameLength + 20}
                    className={CONTROL_CLASSES}
                  />
                  {error ? <FieldError id={errorId}>{error}</FieldError> : null}
                </div>
                <Button
                  variant="quiet"
                  className="min-w-touch px-2.5"
                  aria-label={shown ? `Remove ${shown} (row ${index + 1})` : `Remove row ${index + 1}`}
                  icon={<RemoveIcon />}
                  onClick={() => removeRow(index)}
                >
                  <span className="hidden sm:inline">Remove</span>
                </Button>
              </li>
            );
          })}
        </ol>
      )}

      <div className="mt-4 flex flex-wrap gap-3">
        <Button id={`${baseId}-add`} icon={<PlusIcon />} onClick={addRow}>
          Add name
        </Button>
        <Button
          icon={<ListIcon />}
          aria-expanded={pasteOpen}
          aria-controls={`${baseId}-paste`}
          onClick={() => setPasteOpen((o) => !o)}
        >
          Paste several names
        </Button>
        <RosterCsvUpload classId={classId} onSaved={savedFromFile} onLoadIntoList={loadFromFile} />
      </div>

      {pasteOpen ? <PastePanel id={`${baseId}-paste`} onAdd={addPasted} onCancel={() => setPasteOpen(false)} /> : null}

      {formErrors.map((message) => (
        <FormErrorNotice key={message} className="mt-4">
          {message}
        </FormErrorNotice>
      ))}

      <div
        className={cx(
          "-mx-4 mt-6 flex flex-wrap items-center gap-3 border-t border-line bg-surface px-4 py-3 sm:-mx-6 sm:px-6",
          // While there is something to save, the save button stays in view however long the roster is.
          dirty && "sticky bottom-0 shadow-[0_-6px_16px_rgb(20_24_33/0.08)]",
        )}
      >
        <Button type="submit" variant="primary" busy={save.isPending}>
          Save roster
        </Button>
        {dirty ? (
          <Button variant="quiet" onClick={discard}>
            Discard changes
          </Button>
        ) : null}
        {status ? (
          <p className="flex items-center gap-1.5 font-bold text-ok" aria-hidden="true">
            <CheckCircleIcon className="size-5" />
            {status}
          </p>
        ) : null}
        <p className="ml-auto text-sm text-ink-muted">
          <span className="font-mono font-bold text-ink">{nameCount}</span> of at most{" "}
          <span className="font-mono">{ROSTER_LIMITS.entries}</span> names
          {dirty ? (
            <span className="ml-2 inline-flex items-center gap-1 font-bold text-warn">
              <WarnIcon className="size-4" /> Not saved yet
            </span>
          ) : null}
        </p>
      </div>
    </form>
  );
}

function PastePanel({ id, onAdd, onCancel }: { id: string; onAdd: (names: string[]) => void; onCancel: () => void }) {
  const [text, setText] = useState("");
  const [error, setError] = useState<string | undefined>();
  const ref = useRef<HTMLTextAreaElement>(null);
  useEffect(() => ref.current?.focus(), []);
  const add = () => {
    const names = splitPastedNames(text);
    if (names.length === 0) {
      setError("There are no names to add: put one name on each line.");
      ref.current?.focus();
      return;
    }
    onAdd(names);
  };
  return (
    <div
      id={id}
      className="mt-4 rounded-card border border-line bg-sunken p-4"
      onKeyDown={(event) => {
        if (event.key === "Escape") {
          event.stopPropagation();
          onCancel();
        }
      }}
    >
      <TextAreaField
        ref={ref}
        label="Names, one per line"
        hint="Copy a column from your register or a spreadsheet. Blank lines are skipped; the names are added below the others."
        value={text}
        onChange={(event) => {
          setText(event.target.value);
          setError(undefined);
        }}
        error={error}
        rows={6}
        spellCheck={false}
      />
      <div className="mt-3 flex flex-wrap gap-3">
        <Button variant="primary" icon={<PlusIcon />} onClick={add}>
          Add these names
        </Button>
        <Button onClick={onCancel}>Cancel</Button>
      </div>
    </div>
  );
}

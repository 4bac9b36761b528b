import { useEffect, useId, useRef, useState, type ChangeEvent } from "react";
import type { Roster } from "@contracts/roster";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { CheckCircleIcon, ErrorIcon, InfoIcon, ListIcon, UploadIcon } from "@/components/ui/icons";
import { FormErrorNotice, Notice } from "@/components/ui/notice";
import { errorMessage, isApiError } from "@/lib/api-client";
import { useReplaceRoster } from "../api/replace-roster";
import { checkRosterFile, PROBLEM_LABELS, readRosterCsv, type RosterCsvPreview } from "../utils/roster-csv";

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

/**
 * "Upload a CSV file": the teacher picks a file of display names; every row is shown as
 * accepted or rejected, with the reason, before anything is saved. Saving replaces the roster
 * with the file's names all at once (the server checks every row again), and only when every
 * row is accepted. Otherwise the names can go into the list below to be fixed there.
 */
export function RosterCsvUpload({ classId, onSaved, onLoadIntoList }: {
  classId: string;
  onSaved: (roster: Roster) => void;
  /** Puts the file's names in the editor's list, replacing its rows, to be fixed and saved there. */
  onLoadIntoList: (names: string[]) => void;
}) {
  const inputRef = useRef<HTMLInputElement>(null);
  const [file, setFile] = useState<{ name: string; preview: RosterCsvPreview } | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [serverRowErrors, setServerRowErrors] = useState<Map<number, string>>(new Map());
  const save = useReplaceRoster();
  const headingRef = useRef<HTMLHeadingElement>(null);
  const baseId = useId();

  useEffect(() => {
    if (file) headingRef.current?.focus();
  }, [file]);

  const pick = async (event: ChangeEvent<HTMLInputElement>) => {
    const chosen = event.target.files?.[0];
    event.target.value = ""; // choosing the same file again still triggers a change
    if (!chosen) return;
    setFile(null);
    setServerRowErrors(new Map());
    save.reset();
    const bytes = new Uint8Array(await chosen.arrayBuffer());
    const problem = checkRosterFile(chosen, bytes);
    if (problem) {
      setFileError(`${chosen.name}: ${problem.message}`);
      return;
    }
    setFileError(null);
    setFile({ name: chosen.name, preview: readRosterCsv(new TextDecoder().decode(bytes)) });
  };

  const close = () => {
    setFile(null);
    setFileError(null);
    setServerRowErrors(new Map());
    save.reset();
  };

  const saveAll = () => {
    if (!file || !file.preview.canSave || save.isPending) return;
    save.mutate(
      { classId, names: file.preview.names },
      {
        onSuccess: (roster) => {
          close();
          onSaved(roster);
        },
        onError: (error) => {
          // Every row was sent, in order: `names.i` is row i of the preview.
          const byRow = new Map<number, string>();
          for (const [path, messages] of Object.entries(isApiError(error) ? error.fields : {})) {
            const match = /^names\.(\d+)$/.exec(path);
            if (match && messages[0]) byRow.set(Number(match[1]), messages[0]);
          }
          setServerRowErrors(byRow);
        },
      },
    );
  };

  return (
    <>
      <Button icon={<UploadIcon />} onClick={() => inputRef.current?.click()} aria-describedby={`${baseId}-hint`}>
        Upload a CSV file
      </Button>
      <span id={`${baseId}-hint`} className="sr-only">
        A file with one pupil display name per row, in the first column or under a “Name” heading.
      </span>
      <input
        ref={inputRef}
        type="file"
        accept=".csv,text/csv,text/plain"
        className="sr-only"
        tabIndex={-1}
        aria-hidden="true"
        data-testid="roster-csv-input"
        onChange={(event) => void pick(event)}
      />
      {fileError ? (
        <div className="w-full">
          <FormErrorNotice>{fileError}</FormErrorNotice>
        </div>
      ) : null}
      {file ? (
        <div
          className="w-full rounded-card border border-line bg-sunken p-4"
          onKeyDown={(event) => {
            if (event.key === "Escape") {
              event.stopPropagation();
              close();
            }
          }}
        >
          <h3 ref={headingRef} tabIndex={-1} className="text-lg font-bold focus:outline-none [overflow-wrap:anywhere]">
            Preview of {file.name}
          </h3>
          <PreviewSummary preview={file.preview} />
          <PreviewTable preview={file.preview} serverRowErrors={serverRowErrors} />
          {save.error && serverRowErrors.size === 0 ? (
            <FormErrorNotice className="mt-4">{errorMessage(save.error)}</FormErrorNotice>
          ) : null}
          {serverRowErrors.size > 0 ? (
            <FormErrorNotice className="mt-4">The roster was not saved: the rows marked above were refused.</FormErrorNotice>
          ) : null}
          <div className="mt-4 flex flex-wrap gap-3">
            {file.preview.canSave ? (
              <Button variant="primary" icon={<CheckCircleIcon />} busy={save.isPending} onClick={saveAll}>
                Replace the roster with these {plural(file.preview.names.length, "name", "names")}
              </Button>
            ) : null}
            <Button
              icon={<ListIcon />}
              onClick={() => {
                onLoadIntoList(file.preview.rows.map((r) => r.raw).filter((raw) => raw.trim()));
                close();
              }}
            >
              {file.preview.canSave ? "Edit them in the list first" : "Put them in the list to fix there"}
            </Button>
            <Button variant="quiet" onClick={close}>
              Cancel
            </Button>
          </div>
        </div>
      ) : null}
    </>
  );
}

function PreviewSummary({ preview }: { preview: RosterCsvPreview }) {
  const accepted = preview.rows.length - preview.rejectedCount;
  return (
    <div className="mt-2 grid gap-2" aria-live="polite">
      <p>
        <span className="font-mono font-bold">{preview.rows.length}</span> {preview.rows.length === 1 ? "row" : "rows"}:{" "}
        <span className="font-bold text-ok">{accepted} accepted</span>,{" "}
        <span className={preview.rejectedCount ? "font-bold text-danger" : undefined}>{preview.rejectedCount} rejected</span>.
        {preview.headerSkipped ? " The heading row was skipped." : ""}
        {preview.otherColumnsIgnored ? " Only the names column was read; the other columns were ignored." : ""}
      </p>
      {preview.fileErrors.map((message) => (
        <Notice key={message} tone="danger">
          <p>{message}</p>
        </Notice>
      ))}
      {preview.rejectedCount > 0 ? (
        <Notice tone="warn">
          <p>
            Nothing has been saved. Correct the rejected rows in the file and choose it again, or put the names in the list below
            and fix them there.
          </p>
        </Notice>
      ) : preview.canSave ? (
        <p className="flex items-start gap-2 text-ink-muted">
          <InfoIcon className="mt-0.5 size-5" /> Saving replaces this class’s roster with these names, in this order.
        </p>
      ) : null}
    </div>
  );
}

function PreviewTable({ preview, serverRowErrors }: { preview: RosterCsvPreview; serverRowErrors: Map<number, string> }) {
  if (preview.rows.length === 0) return null;
  return (
    <div className="mt-3 max-h-[28rem] overflow-auto rounded-control border border-line bg-surface">
      <table className="w-full min-w-[30rem] text-left">
        <caption className="sr-only">Each row of the file and whether it can go on the roster</caption>
        <thead className="sticky top-0 bg-surface text-sm text-ink-muted">
          <tr>
            <th scope="col" className="px-3 py-2 font-bold">Row</th>
            <th scope="col" className="px-3 py-2 font-bold">In the file</th>
            <th scope="col" className="px-3 py-2 font-bold">Result</th>
          </tr>
        </thead>
        <tbody>
          {preview.rows.map((row, index) => {
            const serverError = serverRowErrors.get(index);
            const rejected = row.status === "rejected" || serverError;
            return (
              <tr key={row.row} className="border-t border-line align-top" data-status={rejected ? "rejected" : "accepted"}>
                <td className="px-3 py-2 font-mono text-ink-muted">{row.row}</td>
                <td className="px-3 py-2 [overflow-wrap:anywhere]">
                  {row.raw.trim() ? row.raw : <span className="italic text-ink-muted">(blank)</span>}
                </td>
                <td className="px-3 py-2">
                  {row.status === "rejected" ? (
                    <>
                      <span className="flex items-center gap-1.5 font-bold text-danger">
                        <ErrorIcon className="size-4" /> Rejected: {PROBLEM_LABELS[row.problem]}
                      </span>
                      <span className="block text-sm">{row.message}</span>
                    </>
                  ) : serverError ? (
                    <>
                      <span className="flex items-center gap-1.5 font-bold text-danger">
                        <ErrorIcon className="size-4" /> Refused when saving
                      </span>
                      <span className="block text-sm">{serverError}</span>
                    </>
                  ) : (
                    <Badge icon={<CheckCircleIcon className="size-4 text-ok" />}>Accepted</Badge>
                  )}
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

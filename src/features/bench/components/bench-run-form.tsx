import { useState, type ChangeEvent, type FormEvent } from "react";
import { HEIGHT_UNITS, rangeText, type HeightUnit } from "@contracts/bench";
import { Button } from "@/components/ui/button";
import { SelectField, TextField } from "@/components/ui/field";
import { CheckCircleIcon, UploadIcon } from "@/components/ui/icons";
import { FormErrorNotice, Notice } from "@/components/ui/notice";
import { errorMessage, isApiError } from "@/lib/api-client";
import { useCreateBenchRuns } from "../api/create-bench-runs";
import { BENCH_CSV_MAX_BYTES, readBenchCsv, VALUE_PROBLEM_LABELS, type BenchCsvPreview } from "../utils/bench-csv";

/** One real run typed in, in the teacher's units. */
export function BenchRunForm({ classId }: { classId: string }) {
  const [unit, setUnit] = useState<HeightUnit>("cm");
  const [values, setValues] = useState({ potHeight: "", rise: "", speed: "", note: "" });
  const [saved, setSaved] = useState(false);
  const save = useCreateBenchRuns(classId);
  const field = (name: string) => (isApiError(save.error) ? save.error.fieldMessage(`runs.0.${name}`) : undefined);
  const set = (name: keyof typeof values) => (e: ChangeEvent<HTMLInputElement>) => {
    setSaved(false);
    setValues((v) => ({ ...v, [name]: e.target.value }));
  };
  const submit = (event: FormEvent) => {
    event.preventDefault();
    save.mutate(
      { source: "typed", runs: [{ ...values, heightUnit: unit, speedUnit: "m/s" }] },
      {
        onSuccess: () => {
          setValues({ potHeight: "", rise: "", speed: "", note: "" });
          setSaved(true);
        },
      },
    );
  };
  return (
    <form aria-label="Add a real run" onSubmit={submit} noValidate className="grid gap-4">
      <h3 className="text-lg font-bold">Type in a run</h3>
      <SelectField label="Height unit" value={unit} onChange={(e) => setUnit(e.target.value as HeightUnit)}>
        {HEIGHT_UNITS.map((u) => (
          <option key={u} value={u}>{u}</option>
        ))}
      </SelectField>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label={`Pot height (${unit})`} hint={`Floor to the top of the pile, ${rangeText("potHeight", unit)}`} inputMode="decimal" value={values.potHeight} onChange={set("potHeight")} error={field("potHeight")} />
        <TextField label={`Rise (${unit})`} hint={`Rim to the chain’s highest point, ${rangeText("rise", unit)}`} inputMode="decimal" value={values.rise} onChange={set("rise")} error={field("rise")} />
        <TextField label="Chain speed (m/s), optional" hint={rangeText("speed", "m/s")} inputMode="decimal" value={values.speed} onChange={set("speed")} error={field("speed")} />
        <TextField label="Note, optional" hint="e.g. which chain" value={values.note} onChange={set("note")} error={field("note")} maxLength={200} />
      </div>
      {save.error && !isApiError(save.error) ? <FormErrorNotice>{errorMessage(save.error)}</FormErrorNotice> : null}
      {isApiError(save.error) && save.error.code !== "validation_failed" ? <FormErrorNotice>{save.error.message}</FormErrorNotice> : null}
      <div className="flex flex-wrap items-center gap-3">
        <Button type="submit" variant="primary" icon={<CheckCircleIcon />} busy={save.isPending}>
          Add this run
        </Button>
        {saved ? <p role="status" className="font-bold text-ok">Run added.</p> : null}
      </div>
    </form>
  );
}

/** Runs from a CSV file: a row-by-row preview, then all saved together or none. */
export function BenchCsvUpload({ classId }: { classId: string }) {
  const [unit, setUnit] = useState<HeightUnit>("cm");
  const [file, setFile] = useState<{ name: string; text: string } | null>(null);
  const [fileError, setFileError] = useState<string | null>(null);
  const [savedCount, setSavedCount] = useState<number | null>(null);
  const save = useCreateBenchRuns(classId);
  const preview: BenchCsvPreview | null = file ? readBenchCsv(file.text, unit) : null;

  const pick = async (event: ChangeEvent<HTMLInputElement>) => {
    const chosen = event.target.files?.[0];
    event.target.value = "";
    setSavedCount(null);
    save.reset();
    if (!chosen) return;
    const bytes = new Uint8Array(await chosen.arrayBuffer());
    if (chosen.size > BENCH_CSV_MAX_BYTES || bytes.includes(0)) {
      setFile(null);
      setFileError(`${chosen.name}: this is not a small CSV text file.`);
      return;
    }
    setFileError(null);
    setFile({ name: chosen.name, text: new TextDecoder().decode(bytes) });
  };
  const saveAll = () => {
    if (!preview?.canSave) return;
    save.mutate(
      {
        source: "csv",
        runs: preview.rows.map((r) => ({ potHeight: r.cells.potHeight, rise: r.cells.rise, speed: r.cells.speed, note: r.cells.note, heightUnit: unit })),
      },
      {
        onSuccess: (runs) => {
          setFile(null);
          setSavedCount(runs.length);
        },
      },
    );
  };
  return (
    <div className="grid gap-3">
      <h3 className="text-lg font-bold">Or upload a CSV file</h3>
      <p className="text-ink-muted">Columns: pot height, rise, speed (optional, m/s), note — under those headings, or in that order.</p>
      <SelectField label="Heights in the file are in" value={unit} onChange={(e) => setUnit(e.target.value as HeightUnit)}>
        {HEIGHT_UNITS.map((u) => (
          <option key={u} value={u}>{u}</option>
        ))}
      </SelectField>
      <label className="inline-flex w-fit cursor-pointer items-center gap-2 rounded-control border-2 border-line-strong px-4 min-h-touch font-bold focus-within:outline-2">
        <UploadIcon /> Choose a CSV file
        <input type="file" accept=".csv,text/csv,text/plain" className="sr-only" data-testid="bench-csv-input" onChange={(e) => void pick(e)} />
      </label>
      {fileError ? <FormErrorNotice>{fileError}</FormErrorNotice> : null}
      {savedCount !== null ? <p role="status" className="font-bold text-ok">{savedCount} runs saved from the file.</p> : null}
      {file && preview ? (
        <div className="rounded-card border border-line bg-sunken p-3">
          <h4 className="font-bold">Preview of {file.name}</h4>
          <p aria-live="polite">
            {preview.rows.length} rows: {preview.rows.length - preview.rejectedCount} accepted, {preview.rejectedCount} rejected.
          </p>
          {preview.rejectedCount > 0 ? (
            <Notice tone="warn"><p>Nothing has been saved. Correct the rejected rows in the file and choose it again.</p></Notice>
          ) : null}
          <div className="mt-2 max-h-80 overflow-auto">
            <table className="w-full text-left text-sm">
              <thead>
                <tr><th className="px-2 py-1">Row</th><th className="px-2 py-1">Pot height</th><th className="px-2 py-1">Rise</th><th className="px-2 py-1">Speed</th><th className="px-2 py-1">Result</th></tr>
              </thead>
              <tbody>
                {preview.rows.map((r) => (
                  <tr key={r.row} data-status={r.status} className="border-t border-line">
                    <td className="px-2 py-1 font-mono">{r.row}</td>
                    <td className="px-2 py-1">{r.cells.potHeight || "(blank)"}</td>
                    <td className="px-2 py-1">{r.cells.rise || "(blank)"}</td>
                    <td className="px-2 py-1">{r.cells.speed || "—"}</td>
                    <td className="px-2 py-1">
                      {r.status === "accepted" ? "✓ Accepted" : <><strong>✗ Rejected: {VALUE_PROBLEM_LABELS[r.problem]}</strong> <span>{r.message}</span></>}
                    </td>
                  </tr>
                ))}
              </tbody>
            </table>
          </div>
          {save.error ? <FormErrorNotice className="mt-2">{errorMessage(save.error)}</FormErrorNotice> : null}
          <div className="mt-3 flex flex-wrap gap-3">
            {preview.canSave ? (
              <Button variant="primary" busy={save.isPending} onClick={saveAll}>Save these {preview.rows.length} runs</Button>
            ) : null}
            <Button variant="quiet" onClick={() => setFile(null)}>Cancel</Button>
          </div>
        </div>
      ) : null}
    </div>
  );
}

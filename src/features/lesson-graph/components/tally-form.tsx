import { useId, useState, type FormEvent } from "react";
import type { Question, Tally } from "@contracts/lessons";
import { LESSON_LIMITS, type Round } from "@contracts/lesson-rules";
import { Button } from "@/components/ui/button";
import { CONTROL_CLASSES, FieldError, TextAreaField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { cx } from "@/lib/cx";
import { countsProblem, parseCount, parseTypedValues, valuesProblem } from "../utils/tally-parse";

export interface TallyFormProps {
  question: Question;
  round: Round;
  initial: Tally | null;
  onSubmit: (tally: { counts: number[] | null; values: number[] | null }) => Promise<void>;
}

type SaveState = { kind: "idle" } | { kind: "saving" } | { kind: "saved"; what: string } | { kind: "error"; message: string };

const ROUND_NAMES = { 1: "before the run", 2: "in the re-vote" } as const;

/**
 * Tally mode, for rooms without pupil devices: the teacher types what a show of hands gave,
 * a count per choice or a list of values. Saving replaces the tally for this round.
 */
export function TallyForm(props: TallyFormProps) {
  return props.question.kind === "choice" ? <ChoiceTally {...props} question={props.question} /> : <ValueTally {...props} />;
}

function errorMessage(error: unknown): string {
  return error instanceof Error && error.message ? error.message : "The tally could not be saved. Check the connection and try again.";
}

function SaveNotice({ state }: { state: SaveState }) {
  return (
    <div>
      {state.kind === "saved" ? <Notice tone="ok" live="status" title={`Saved: ${state.what}.`} /> : null}
      {state.kind === "error" ? (
        <Notice tone="danger" live="alert" title="Not saved">
          {state.message}
        </Notice>
      ) : null}
    </div>
  );
}

function ChoiceTally({ question, round, initial, onSubmit }: TallyFormProps & { question: Extract<Question, { kind: "choice" }> }) {
  const n = question.choices.length;
  const [texts, setTexts] = useState<string[]>(() => question.choices.map((_, i) => String(initial?.counts?.[i] ?? 0)));
  const [problem, setProblem] = useState<string | null>(null);
  const [state, setState] = useState<SaveState>({ kind: "idle" });
  const base = useId();
  const problemId = `${base}-problem`;
  const parsed = texts.map(parseCount);
  const total = parsed.reduce<number>((sum, c) => sum + (c ?? 0), 0);

  const change = (i: number, text: string) => {
    setTexts((old) => old.map((t, j) => (j === i ? text : t)));
    setProblem(null);
    if (state.kind !== "saving") setState({ kind: "idle" });
  };
  const step = (i: number, by: 1 | -1) => {
    const now = parsed[i] ?? 0;
    change(i, String(Math.min(LESSON_LIMITS.tallyCount, Math.max(0, now + by))));
  };

  async function submit(event: FormEvent) {
    event.preventDefault();
    if (state.kind === "saving") return;
    const bad = parsed.findIndex((c) => c === null);
    if (bad !== -1) {
      setProblem(`The count for “${question.choices[bad]!.label}” is not a whole number.`);
      return;
    }
    const counts = parsed as number[];
    const wrong = countsProblem(counts);
    if (wrong) {
      setProblem(wrong);
      return;
    }
    setState({ kind: "saving" });
    try {
      await onSubmit({ counts, values: null });
      setState({ kind: "saved", what: `${total} ${total === 1 ? "hand" : "hands"} over ${n} choices` });
    } catch (error) {
      setState({ kind: "error", message: errorMessage(error) });
    }
  }

  return (
    <form className="grid gap-4" aria-label={`Tally of hands ${ROUND_NAMES[round]}`} onSubmit={submit} noValidate>
      <fieldset className="grid gap-3" aria-describedby={problem ? problemId : undefined}>
        <legend className="mb-1 font-bold">Hands up for each choice ({ROUND_NAMES[round]})</legend>
        {question.choices.map((choice, i) => {
          const inputId = `${base}-count-${i}`;
          return (
            <div key={i} className="flex flex-wrap items-center gap-2">
              <label htmlFor={inputId} className="min-w-0 flex-1 basis-40 font-bold">
                {choice.label}
              </label>
              <Button className="min-w-touch px-0" aria-label={`One fewer for ${choice.label}`} onClick={() => step(i, -1)} disabled={(parsed[i] ?? 0) <= 0}>
                −
              </Button>
              {/* The control classes make an input full width: the box around it sets the width. */}
              <div className="w-24 shrink-0">
                <input
                  id={inputId}
                  inputMode="numeric"
                  autoComplete="off"
                  value={texts[i]}
                  onChange={(e) => change(i, e.target.value)}
                  aria-invalid={parsed[i] === null || undefined}
                  className={cx(CONTROL_CLASSES, "text-center tabular-nums")}
                />
              </div>
              <Button className="min-w-touch px-0" aria-label={`One more for ${choice.label}`} onClick={() => step(i, 1)} disabled={(parsed[i] ?? 0) >= LESSON_LIMITS.tallyCount}>
                +
              </Button>
            </div>
          );
        })}
      </fieldset>
      <p aria-live="polite">
        Total: <strong className="tabular-nums">{total}</strong> {total === 1 ? "hand" : "hands"}
      </p>
      {problem ? <FieldError id={problemId}>{problem}</FieldError> : null}
      <div>
        <Button type="submit" variant="primary" busy={state.kind === "saving"}>
          {state.kind === "saving" ? "Saving…" : "Save the tally"}
        </Button>
      </div>
      <SaveNotice state={state} />
    </form>
  );
}

function ValueTally({ question, round, initial, onSubmit }: TallyFormProps) {
  const [text, setText] = useState(() => (initial?.values ?? []).join("\n"));
  const [problem, setProblem] = useState<string | null>(null);
  const [state, setState] = useState<SaveState>({ kind: "idle" });
  const parsed = parseTypedValues(text);
  const unit = question.unit;

  async function submit(event: FormEvent) {
    event.preventDefault();
    if (state.kind === "saving") return;
    const wrong = valuesProblem(parsed);
    if (wrong) {
      setProblem(wrong);
      return;
    }
    setState({ kind: "saving" });
    try {
      await onSubmit({ counts: null, values: parsed.values });
      setState({ kind: "saved", what: `${parsed.values.length} ${parsed.values.length === 1 ? "value" : "values"}` });
    } catch (error) {
      setState({ kind: "error", message: errorMessage(error) });
    }
  }

  const preview = parsed.values.length > 0 && parsed.ambiguous === null;
  return (
    <form className="grid gap-4" aria-label={`Tally of values ${ROUND_NAMES[round]}`} onSubmit={submit} noValidate>
      <TextAreaField
        label={`Values given ${ROUND_NAMES[round]}${unit ? ` (${unit})` : ""}`}
        hint={`One value per hand, separated by spaces, commas or new lines; at most ${LESSON_LIMITS.tallyValues}. A decimal comma is fine when values are on separate lines.`}
        error={problem ?? undefined}
        value={text}
        onChange={(e) => {
          setText(e.target.value);
          setProblem(null);
          if (state.kind !== "saving") setState({ kind: "idle" });
        }}
        spellCheck={false}
        autoComplete="off"
      />
      <p aria-live="polite" className="text-ink-muted" data-testid="tally-read-as">
        {preview
          ? `Read as ${parsed.values.length} ${parsed.values.length === 1 ? "value" : "values"}: ${parsed.values.join(", ")}${unit ? ` ${unit}` : ""}.`
          : null}
        {parsed.notUnderstood.length > 0 ? ` Not understood: ${parsed.notUnderstood.map((t) => `“${t}”`).join(", ")}.` : null}
      </p>
      <div>
        <Button type="submit" variant="primary" busy={state.kind === "saving"}>
          {state.kind === "saving" ? "Saving…" : "Save the tally"}
        </Button>
      </div>
      <SaveNotice state={state} />
    </form>
  );
}

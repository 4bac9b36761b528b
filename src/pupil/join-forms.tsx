import { useState, type FormEvent } from "react";
import type { LessonLookup } from "@contracts/lessons";
import { LESSON_CODE_LENGTH, LESSON_LIMITS, checkDisplayName, isLessonCode, normaliseLessonCode } from "@contracts/lesson-rules";
import { TextField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { Spinner } from "@/components/ui/spinner";
import { CARD, pupilButton } from "./pupil-ui";

export function CodeForm({ initial, busy, error, onCode }: { initial: string; busy: boolean; error: string | null; onCode: (code: string) => void }) {
  const [text, setText] = useState(initial);
  const [problem, setProblem] = useState<string | null>(null);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const code = normaliseLessonCode(text);
    if (!isLessonCode(code)) {
      setProblem(`A lesson code is ${LESSON_CODE_LENGTH} letters and digits, as shown on the board.`);
      return;
    }
    setProblem(null);
    onCode(code);
  };
  return (
    <form className={CARD} onSubmit={submit} aria-labelledby="code-heading" noValidate>
      <h1 id="code-heading" className="text-2xl font-bold">
        Join a lesson
      </h1>
      <p className="mt-1 text-ink-muted">Type the code shown on the board.</p>
      <TextField
        wrapperClassName="mt-4"
        label="Lesson code"
        value={text}
        onChange={(e) => setText(e.target.value)}
        autoComplete="off"
        autoCapitalize="characters"
        spellCheck={false}
        maxLength={12}
        className="font-mono text-2xl tracking-widest uppercase"
        error={problem ?? error ?? undefined}
      />
      <button type="submit" className={pupilButton("primary", "mt-4 w-full")} disabled={busy}>
        {busy ? <Spinner className="size-5" /> : null}
        Next
      </button>
    </form>
  );
}

export function NameForm({
  lookup,
  code,
  busy,
  error,
  onJoin,
  onChangeCode,
}: {
  lookup: LessonLookup;
  code: string;
  busy: boolean;
  error: string | null;
  onJoin: (who: { name: string } | { rosterEntryId: string }) => void;
  onChangeCode: () => void;
}) {
  const [name, setName] = useState("");
  const [problem, setProblem] = useState<string | null>(null);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const check = checkDisplayName(name);
    if (!check.ok) {
      setProblem(check.message);
      return;
    }
    setProblem(null);
    onJoin({ name: check.name });
  };
  return (
    <div className={CARD}>
      <h1 className="text-2xl font-bold">{lookup.className}</h1>
      <p className="mt-1 text-ink-muted">
        Lesson code <span className="font-mono font-bold text-ink">{code}</span>{" "}
        <button type="button" className={pupilButton("quiet", "px-2")} onClick={onChangeCode}>
          Change code
        </button>
      </p>
      {error ? (
        <Notice tone="danger" live="alert" className="mt-3">
          {error}
        </Notice>
      ) : null}
      {lookup.roster ? (
        <fieldset className="mt-4">
          <legend className="font-bold">Pick your name</legend>
          <ul className="mt-2 grid grid-cols-1 gap-2 min-[420px]:grid-cols-2">
            {lookup.roster.map((entry) => (
              <li key={entry.id}>
                <button
                  type="button"
                  className={pupilButton("secondary", "w-full justify-start text-left")}
                  disabled={entry.taken || busy}
                  onClick={() => onJoin({ rosterEntryId: entry.id })}
                >
                  {entry.displayName}
                  {entry.taken ? <span className="ml-auto font-normal text-ink-muted">(already joined)</span> : null}
                </button>
              </li>
            ))}
          </ul>
        </fieldset>
      ) : null}
      <form className="mt-5" onSubmit={submit} noValidate>
        <TextField
          label={lookup.roster ? "Not on the list? Type your name" : "Your name"}
          hint="Your first name and the first letter of your surname, such as Sam K."
          value={name}
          onChange={(e) => setName(e.target.value)}
          autoComplete="off"
          maxLength={LESSON_LIMITS.displayName + 10}
          error={problem ?? undefined}
        />
        <button type="submit" className={pupilButton("primary", "mt-4 w-full")} disabled={busy}>
          {busy ? <Spinner className="size-5" /> : null}
          Join the lesson
        </button>
      </form>
    </div>
  );
}

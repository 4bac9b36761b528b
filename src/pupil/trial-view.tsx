import { useState, type FormEvent } from "react";
import type { PublicTrial } from "@contracts/lessons";
import { LESSON_LIMITS, TRIAL_PHASE_LABELS, parseTypedNumber, type Round } from "@contracts/lesson-rules";
import { TextAreaField, TextField } from "@/components/ui/field";
import { CheckCircleIcon, ClockIcon, WarnIcon } from "@/components/ui/icons";
import { cx } from "@/lib/cx";
import { AnswerPlot } from "./answer-plot";
import type { PupilClient, PupilState } from "./pupil-client";
import { formatUncertainty, withUnit } from "./pupil-format";
import { latestExplanation, latestPrediction, type OutboxEntry } from "./pupil-storage";
import { CARD, pupilButton } from "./pupil-ui";
import { RigSketch } from "./rig-sketch";

type Question = PublicTrial["question"];
type Delivery = "sending" | "offline" | "received";

/** "12.5 cm", or the choice's label. */
export function answerText(question: Question, answer: { value: number | null; choice: number | null }): string {
  if (answer.value !== null) return withUnit(answer.value, question.unit);
  if (answer.choice !== null && question.kind === "choice") return question.choices[answer.choice]?.label ?? "–";
  return "–";
}

function DeliveryLine({ delivery }: { delivery: Delivery | null }) {
  // Always rendered, so the live region exists before its words change.
  return (
    <p role="status" className="mt-2 flex min-h-6 items-center gap-2 font-bold">
      {delivery === "received" ? (
        <>
          <CheckCircleIcon className="size-5 text-ok" />
          <span>Answer received</span>
        </>
      ) : delivery === "sending" ? (
        <>
          <ClockIcon className="size-5 text-accent" />
          <span>Sending…</span>
        </>
      ) : delivery === "offline" ? (
        <>
          <WarnIcon className="size-5 text-warn" />
          <span>Not sent yet — will send when you are back online</span>
        </>
      ) : null}
    </p>
  );
}

function pendingPrediction(outbox: readonly OutboxEntry[], trialId: string, round: Round) {
  const entry = outbox.findLast((e) => e.kind === "prediction" && e.payload.trialId === trialId && e.payload.round === round);
  return entry?.kind === "prediction" ? entry.payload : null;
}

function pendingExplanation(outbox: readonly OutboxEntry[], trialId: string) {
  const entry = outbox.findLast((e) => e.kind === "explanation" && e.payload.trialId === trialId);
  return entry?.kind === "explanation" ? entry.payload : null;
}

/** The pupil's answer for a round: one still waiting to be sent wins over the last received one. */
function ownAnswer(state: PupilState, trialId: string, round: Round) {
  const pending = pendingPrediction(state.outbox, trialId, round);
  if (pending) {
    return {
      answer: { value: pending.value ?? null, choice: pending.choice ?? null, reason: pending.reason ?? "" },
      delivery: (state.connected ? "sending" : "offline") as Delivery,
    };
  }
  const stored = latestPrediction(state.mine, trialId, round);
  return stored ? { answer: stored, delivery: "received" as Delivery } : null;
}

function PredictionPanel({ client, state, trial, round }: { client: PupilClient; state: PupilState; trial: PublicTrial; round: Round }) {
  const own = ownAnswer(state, trial.id, round);
  const [editing, setEditing] = useState(false);
  const question = trial.question;
  const open = editing || !own;
  const heading = round === 1 ? "Your prediction" : "Your second prediction";
  return (
    <section className={CARD} aria-labelledby={`predict-${round}`}>
      <h2 id={`predict-${round}`} className="text-xl font-bold">
        {heading}
      </h2>
      {own && !open ? (
        <div className="mt-2">
          <p className="text-2xl font-bold" data-testid={`own-answer-${round}`}>
            {answerText(question, own.answer)}
          </p>
          {own.answer.reason ? <p className="mt-1 text-ink-muted">Because: {own.answer.reason}</p> : null}
          <button type="button" className={pupilButton("secondary", "mt-3")} onClick={() => setEditing(true)}>
            Change my answer
          </button>
        </div>
      ) : (
        <PredictionForm
          question={question}
          initial={own?.answer ?? null}
          onSubmit={(answer) => {
            client.submitPrediction({ trialId: trial.id, round, ...answer });
            setEditing(false);
          }}
          onCancel={own ? () => setEditing(false) : null}
        />
      )}
      <DeliveryLine delivery={open && editing ? null : (own?.delivery ?? null)} />
    </section>
  );
}

function PredictionForm({
  question,
  initial,
  onSubmit,
  onCancel,
}: {
  question: Question;
  initial: { value: number | null; choice: number | null; reason: string } | null;
  onSubmit: (answer: { value: number | null; choice: number | null; reason: string }) => void;
  onCancel: (() => void) | null;
}) {
  const [typed, setTyped] = useState(initial?.value !== null && initial?.value !== undefined ? String(initial.value) : "");
  const [reason, setReason] = useState(initial?.reason ?? "");
  const [problem, setProblem] = useState<string | null>(null);
  const unitWords = question.unit ? ` (${question.unit})` : "";

  const reasonField = question.askReason ? (
    <TextAreaField
      wrapperClassName="mt-3"
      label="Why do you think so? (optional)"
      value={reason}
      onChange={(e) => setReason(e.target.value)}
      maxLength={LESSON_LIMITS.reason}
      className="min-h-24"
    />
  ) : null;

  if (question.kind === "choice") {
    return (
      <div className="mt-2">
        {reasonField}
        <fieldset className="mt-3">
          <legend className="font-bold">Pick one answer</legend>
          <div className="mt-2 flex flex-col gap-2">
            {question.choices.map((choice, index) => (
              <button
                key={index}
                type="button"
                aria-pressed={initial?.choice === index}
                className={pupilButton(initial?.choice === index ? "primary" : "secondary", "w-full justify-start text-left")}
                onClick={() => onSubmit({ value: null, choice: index, reason: reason.trim() })}
              >
                {initial?.choice === index ? <CheckCircleIcon /> : null}
                {choice.label}
              </button>
            ))}
          </div>
        </fieldset>
        {onCancel ? (
          <button type="button" className={pupilButton("quiet", "mt-3")} onClick={onCancel}>
            Keep my answer
          </button>
        ) : null}
      </div>
    );
  }

  const submit = (event: FormEvent) => {
    event.preventDefault();
    const value = parseTypedNumber(typed);
    if (value === null) {
      setProblem("Type a number, such as 12.5 or 12,5.");
      return;
    }
    setProblem(null);
    onSubmit({ value, choice: null, reason: reason.trim() });
  };
  return (
    <form className="mt-2" onSubmit={submit} noValidate>
      <div className="flex items-end gap-2">
        <TextField
          wrapperClassName="flex-1"
          label={`Your answer${unitWords}`}
          value={typed}
          onChange={(e) => setTyped(e.target.value)}
          inputMode="decimal"
          autoComplete="off"
          error={problem ?? undefined}
          className="text-xl"
        />
        {question.unit ? (
          <span aria-hidden="true" className={cx("pb-2 text-xl font-bold", problem && "self-center")}>
            {question.unit}
          </span>
        ) : null}
      </div>
      {reasonField}
      <div className="mt-4 flex flex-wrap gap-3">
        <button type="submit" className={pupilButton("primary", "flex-1")}>
          Send my prediction
        </button>
        {onCancel ? (
          <button type="button" className={pupilButton("secondary")} onClick={onCancel}>
            Keep my answer
          </button>
        ) : null}
      </div>
    </form>
  );
}

function ExplanationPanel({ client, state, trial }: { client: PupilClient; state: PupilState; trial: PublicTrial }) {
  const pending = pendingExplanation(state.outbox, trial.id);
  const stored = latestExplanation(state.mine, trial.id);
  const current = pending?.text ?? stored?.text ?? null;
  const delivery: Delivery | null = pending ? (state.connected ? "sending" : "offline") : stored ? "received" : null;
  const [editing, setEditing] = useState(false);
  const [text, setText] = useState(current ?? "");
  const [problem, setProblem] = useState<string | null>(null);
  const open = editing || current === null;
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const clean = text.replace(/\s+/g, " ").trim();
    if (!clean) {
      setProblem("Write your explanation first.");
      return;
    }
    setProblem(null);
    client.submitExplanation({ trialId: trial.id, text: clean });
    setEditing(false);
  };
  return (
    <section className={CARD} aria-labelledby="explain-heading">
      <h2 id="explain-heading" className="text-xl font-bold">
        Your explanation
      </h2>
      {open ? (
        <form onSubmit={submit} noValidate>
          <TextAreaField
            wrapperClassName="mt-2"
            label="Why did it happen this way?"
            hint="Your teacher may show some explanations on the board, without names."
            value={text}
            onChange={(e) => setText(e.target.value)}
            maxLength={LESSON_LIMITS.explanation}
            error={problem ?? undefined}
          />
          <button type="submit" className={pupilButton("primary", "mt-3 w-full")}>
            Send my explanation
          </button>
        </form>
      ) : (
        <div className="mt-2">
          <p className="whitespace-pre-wrap">{current}</p>
          <button type="button" className={pupilButton("secondary", "mt-3")} onClick={() => setEditing(true)}>
            Change my explanation
          </button>
        </div>
      )}
      <DeliveryLine delivery={open ? null : delivery} />
    </section>
  );
}

function ResultPanel({ state, trial }: { state: PupilState; trial: PublicTrial }) {
  const question = trial.question;
  const first = ownAnswer(state, trial.id, 1)?.answer ?? null;
  const second = trial.phase === "revote" || trial.phase === "explain" ? (ownAnswer(state, trial.id, 2)?.answer ?? null) : null;
  if (!trial.result) {
    return (
      <section className={CARD} aria-labelledby="result-heading">
        <h2 id="result-heading" className="text-xl font-bold">
          Watch the board
        </h2>
        <p className="mt-2">The run is on. The result will appear here when it has settled.</p>
        {first ? (
          <p className="mt-2">
            Your prediction: <span className="font-bold">{answerText(question, first)}</span>
          </p>
        ) : null}
      </section>
    );
  }
  const result = trial.result;
  const rows: { label: string; text: string; testId: string }[] = [
    { label: "Your prediction", text: first ? answerText(question, first) : "No prediction", testId: "compare-own" },
    ...(second ? [{ label: "Your second prediction", text: answerText(question, second), testId: "compare-own-2" }] : []),
    {
      label: "Result of the run",
      text: `${withUnit(result.value, result.unit)}${result.uncertainty ? ` ± ${formatUncertainty(result.uncertainty)}${result.unit ? ` ${result.unit}` : ""}` : ""}`,
      testId: "compare-result",
    },
    ...(trial.theory ? [{ label: "Theory", text: withUnit(trial.theory.value, trial.theory.unit), testId: "compare-theory" }] : []),
  ];
  return (
    <section className={CARD} aria-labelledby="result-heading">
      <h2 id="result-heading" className="text-xl font-bold">
        Your prediction and the result
      </h2>
      <dl className="mt-3 grid grid-cols-[auto_1fr] gap-x-4 gap-y-1">
        {rows.map((row) => (
          <div key={row.testId} className="contents">
            <dt className="text-ink-muted">{row.label}</dt>
            <dd className="font-bold" data-testid={row.testId}>
              {row.text}
            </dd>
          </div>
        ))}
      </dl>
      {trial.answers && trial.answers.length > 0 ? (
        <AnswerPlot trial={trial} own={{ 1: first, 2: second }} />
      ) : (
        <p className="mt-3 text-ink-muted">No answers from the class to show.</p>
      )}
    </section>
  );
}

const PHASE_ORDER = ["predict", "observe", "explain"] as const;

/** Where the trial is: plain words, the current step in bold and marked for screen readers. */
function PhaseSteps({ phase, askExplanation }: { phase: PublicTrial["phase"]; askExplanation: boolean }) {
  const current = phase === "revote" ? "explain" : phase;
  // A question that asks for no explanation has no explain step.
  const order = PHASE_ORDER.filter((p) => p !== "explain" || askExplanation);
  const steps: PublicTrial["phase"][] = [...order, ...(phase === "revote" ? (["revote"] as const) : [])];
  return (
    <ol className="mt-2 flex flex-wrap items-center gap-x-1 text-ink-muted" aria-label="Steps of this trial">
      {steps.map((p, i) => {
        const now = p === phase || (p === current && phase !== "revote");
        return (
          <li key={p} aria-current={now ? "step" : undefined} className="flex items-center gap-1">
            {i > 0 ? <span aria-hidden="true">→</span> : null}
            <span className={cx(now && "font-bold text-ink underline decoration-2 underline-offset-4")}>{TRIAL_PHASE_LABELS[p]}</span>
            {now ? <span className="sr-only"> (now)</span> : null}
          </li>
        );
      })}
    </ol>
  );
}

export function TrialView({ client, state, trial, className }: { client: PupilClient; state: PupilState; trial: PublicTrial; className: string }) {
  const question = trial.question;
  const beforeRun = trial.phase === "setup" || trial.phase === "predict";
  return (
    <>
      <section className={CARD} aria-labelledby="trial-heading">
        <p className="text-sm text-ink-muted">
          {className} · Trial {trial.position}
        </p>
        <h1 id="trial-heading" className="text-2xl font-bold">
          {trial.rigLabel}
        </h1>
        {/* What the rig does is shown after the run: before it, it could answer the question. */}
        {beforeRun ? null : <p className="mt-1">{trial.rigSummary}</p>}
        <PhaseSteps phase={trial.phase} askExplanation={trial.question.askExplanation !== false} />
        <RigSketch rig={trial.rig} label={trial.rigLabel} beforeRun={beforeRun} className="mt-3" />
        {trial.shownParams.length > 0 ? (
          <dl className="mt-3 grid grid-cols-[1fr_auto] gap-x-4 gap-y-1 border-t border-line pt-3">
            {trial.shownParams.map((p) => (
              <div key={p.key} className="contents">
                <dt className="text-ink-muted">{p.label}</dt>
                <dd className="text-right font-bold">
                  {typeof p.value === "number" ? withUnit(p.value, p.unit) : `${p.value}${p.unit ? ` ${p.unit}` : ""}`}
                </dd>
              </div>
            ))}
          </dl>
        ) : null}
      </section>

      <section className={cx(CARD, "border-l-4 border-l-accent")} aria-labelledby="question-heading">
        <h2 id="question-heading" className="sr-only">
          The question
        </h2>
        <p className="text-xl font-bold" data-testid="question">
          {question.prompt}
        </p>
        {question.kind === "number" && question.unit ? <p className="mt-1 text-ink-muted">Answer in {question.unit}.</p> : null}
        {trial.phase === "predict" || trial.phase === "revote" ? (
          <p className="mt-1 text-sm text-ink-muted">
            Answers so far: {trial.answered[trial.phase === "predict" ? 1 : 2]}
          </p>
        ) : null}
      </section>

      {trial.phase === "setup" ? (
        <section className={CARD}>
          <p>Your teacher is setting up this trial. You can answer when predictions open.</p>
        </section>
      ) : null}
      {trial.phase === "predict" ? <PredictionPanel key={`${trial.id}-1`} client={client} state={state} trial={trial} round={1} /> : null}
      {trial.phase === "observe" || trial.phase === "explain" || trial.phase === "revote" ? <ResultPanel state={state} trial={trial} /> : null}
      {trial.phase === "revote" ? <PredictionPanel key={`${trial.id}-2`} client={client} state={state} trial={trial} round={2} /> : null}
      {trial.phase === "explain" ? <ExplanationPanel key={trial.id} client={client} state={state} trial={trial} /> : null}

      {trial.shownExplanations.length > 0 ? (
        <section className={CARD} aria-labelledby="shown-heading">
          <h2 id="shown-heading" className="text-xl font-bold">
            Explanations on the board
          </h2>
          <ul className="mt-2 flex flex-col gap-2">
            {trial.shownExplanations.map((e) => (
              <li key={e.id} className="rounded-control bg-sunken px-3 py-2">
                {e.text}
              </li>
            ))}
          </ul>
        </section>
      ) : null}
      {trial.notes.length > 0 ? (
        <ul className="text-sm text-ink-muted">
          {trial.notes.map((n) => (
            <li key={n}>{n}</li>
          ))}
        </ul>
      ) : null}
    </>
  );
}

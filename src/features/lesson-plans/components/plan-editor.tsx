import { useMemo, useRef, useState } from "react";
import type { LessonPlan } from "@contracts/lesson-plans";
import { PLAN_LIMITS } from "@contracts/lesson-plans";
import { LESSON_LIMITS } from "@contracts/lesson-rules";
import type { SetupDraft } from "@/components/trial-setup/setup-form";
import { Button } from "@/components/ui/button";
import { TextAreaField, TextField } from "@/components/ui/field";
import { PlusIcon } from "@/components/ui/icons";
import { FormErrorNotice, Notice } from "@/components/ui/notice";
import { UnsavedChangesDialog } from "@/components/ui/unsaved-changes-dialog";
import { useFocusFirstError } from "@/hooks/use-focus-first-error";
import { useUnsavedChanges } from "@/hooks/use-unsaved-changes";
import { isApiError } from "@/lib/api-client";
import { useCreatePlan } from "../api/create-plan";
import { useUpdatePlan } from "../api/update-plan";
import {
  draftFingerprint,
  draftFromPlan,
  emptyPlanDraft,
  moveItem,
  newTrialDraft,
  planPayload,
  serverFieldMessages,
  trialErrors,
  type PlanDraft,
} from "../utils/plan-draft";
import { TrialCard } from "./trial-card";

/**
 * The plan editor: title, summary, sharing, and the trials in order (add, remove, move up and
 * down, edit each set-up with the board's own form). Asks before leaving with unsaved changes.
 */
export function PlanEditor({ plan, departmentName = null, onSaved }: {
  /** The plan being changed, or null for a new one. */
  plan: LessonPlan | null;
  /** The teacher's department (sharing reaches it); null when they have none, so sharing would reach nobody. */
  departmentName?: string | null;
  /** After a save; `created` when it was a new plan (the page moves to its address). */
  onSaved: (plan: LessonPlan, created: boolean) => void;
}) {
  const initial = useMemo(() => (plan ? draftFromPlan(plan) : emptyPlanDraft()), [plan]);
  const [draft, setDraft] = useState<PlanDraft>(initial);
  const [savedPrint, setSavedPrint] = useState(() => draftFingerprint(initial));
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [problem, setProblem] = useState<string | null>(null);
  const [justSaved, setJustSaved] = useState(false);
  const formRef = useRef<HTMLFormElement>(null);
  const focusFirstError = useFocusFirstError(formRef);
  const create = useCreatePlan();
  const update = useUpdatePlan();
  const saving = create.isPending || update.isPending;

  const dirty = draftFingerprint(draft) !== savedPrint;
  const blocker = useUnsavedChanges(dirty);

  const edit = (next: (d: PlanDraft) => PlanDraft) => {
    setJustSaved(false);
    setDraft(next);
  };
  const changeTrial = (index: number) => (update: (setup: SetupDraft) => SetupDraft) =>
    edit((d) => ({ ...d, trials: d.trials.map((t, i) => (i === index ? { ...t, setup: update(t.setup) } : t)) }));
  const moveTrial = (from: number, to: number) => {
    const key = draft.trials[from]!.key;
    const direction = to < from ? "up" : "down";
    edit((d) => ({ ...d, trials: moveItem(d.trials, from, to) }));
    // Keep the keyboard on the trial that moved: its same button, or the other one at an end.
    requestAnimationFrame(() => {
      const same = document.getElementById(`${key}-${direction}`) as HTMLButtonElement | null;
      const other = document.getElementById(`${key}-${direction === "up" ? "down" : "up"}`);
      (same && !same.disabled ? same : other)?.focus();
    });
  };
  // The trial's own messages after a move or removal would point at the wrong trial: drop them.
  const clearTrialErrors = () => setErrors((e) => Object.fromEntries(Object.entries(e).filter(([k]) => !k.startsWith("trials."))));

  const save = () => {
    setProblem(null);
    const { payload, errors: local } = planPayload(draft);
    setErrors(local);
    if (!payload) {
      setProblem("Some of the details need correcting: see the messages below.");
      focusFirstError();
      return;
    }
    const printAtSave = draftFingerprint(draft);
    const done = (saved: LessonPlan) => {
      setSavedPrint(printAtSave);
      setJustSaved(true);
      onSaved(saved, plan === null);
    };
    const failed = (error: unknown) => {
      if (isApiError(error) && Object.keys(error.fields).length > 0) setErrors(serverFieldMessages(error.fields));
      setProblem(isApiError(error) ? error.message : "The plan could not be saved.");
      focusFirstError();
    };
    if (plan) update.mutate({ planId: plan.id, input: payload }, { onSuccess: done, onError: failed });
    else create.mutate(payload, { onSuccess: done, onError: failed });
  };

  return (
    <form
      ref={formRef}
      noValidate
      className="grid gap-6"
      onSubmit={(e) => {
        e.preventDefault();
        save();
      }}
    >
      {problem ? <FormErrorNotice>{problem}</FormErrorNotice> : null}
      {justSaved && !dirty ? (
        <Notice tone="ok" live="status">
          <p>Plan saved.</p>
        </Notice>
      ) : null}
      <section aria-labelledby="plan-details" className="grid gap-4 rounded-card border border-line bg-surface p-4 shadow-card sm:p-6">
        <h2 id="plan-details" className="text-xl font-bold">
          About the plan
        </h2>
        <TextField
          label="Title"
          value={draft.title}
          maxLength={PLAN_LIMITS.title}
          error={errors.title}
          onChange={(e) => {
            const title = e.target.value;
            edit((d) => ({ ...d, title }));
          }}
        />
        <TextAreaField
          label="Summary"
          hint="Your aim and notes for the lesson (optional)."
          value={draft.summary}
          maxLength={PLAN_LIMITS.summary}
          error={errors.summary}
          onChange={(e) => {
            const summary = e.target.value;
            edit((d) => ({ ...d, summary }));
          }}
        />
        <label className="flex min-h-touch items-start gap-3">
          <input
            type="checkbox"
            className="mt-1 size-5"
            checked={draft.shared}
            disabled={departmentName === null && !draft.shared}
            aria-describedby="plan-share-hint"
            onChange={(e) => {
              const shared = e.target.checked;
              edit((d) => ({ ...d, shared }));
            }}
          />
          <span>
            <span className="block font-bold">{departmentName ? `Share with the ${departmentName} department` : "Share with my department"}</span>
            <span id="plan-share-hint" className="text-ink-muted">
              {departmentName === null
                ? "You are not in a department yet, so there is nobody to share with: ask your school admin to add you to one."
                : "Colleagues in your department can read it, start lessons with it and duplicate it. Only you can change it."}
            </span>
          </span>
        </label>
      </section>

      <section aria-labelledby="plan-trials" className="grid gap-4">
        <h2 id="plan-trials" className="text-xl font-bold">
          Trials, in the order they will run
        </h2>
        {errors.trials ? <p className="font-bold text-danger" data-form-error tabIndex={-1}>{errors.trials}</p> : null}
        <ol className="grid gap-4">
          {draft.trials.map((trial, i) => (
            <TrialCard
              key={trial.key}
              trialKey={trial.key}
              index={i}
              count={draft.trials.length}
              setup={trial.setup}
              errors={trialErrors(errors, i)}
              onChange={changeTrial(i)}
              onMove={(to) => {
                clearTrialErrors();
                moveTrial(i, to);
              }}
              onRemove={() => {
                clearTrialErrors();
                edit((d) => ({ ...d, trials: d.trials.filter((_, j) => j !== i) }));
              }}
            />
          ))}
        </ol>
        {draft.trials.length < LESSON_LIMITS.trialsPerLesson ? (
          <div>
            <Button
              icon={<PlusIcon />}
              onClick={() =>
                // A new trial starts as a copy of the last one: change one thing and compare.
                edit((d) => ({ ...d, trials: [...d.trials, newTrialDraft(d.trials.at(-1)?.setup)] }))
              }
            >
              Add a trial
            </Button>
          </div>
        ) : null}
      </section>

      <div className="sticky bottom-0 flex flex-wrap items-center gap-3 border-t border-line bg-paper py-3">
        <Button type="submit" variant="primary" busy={saving}>
          {plan ? "Save changes" : "Save plan"}
        </Button>
        <span className="text-ink-muted" aria-live="polite">
          {dirty ? "Unsaved changes" : plan ? "All changes saved" : ""}
        </span>
      </div>
      <UnsavedChangesDialog blocker={blocker} />
    </form>
  );
}

import type { LessonPlan, LessonPlanInput } from "@contracts/lesson-plans";
import { PLAN_LIMITS } from "@contracts/lesson-plans";
import { LESSON_LIMITS } from "@contracts/lesson-rules";
import type { TrialSetupInput } from "@contracts/lessons";
import { draftForRig, draftFromSetup, setupPayload, type SetupDraft } from "@/components/trial-setup/setup-form";

/** One trial in the editor: a stable key (for React and focus after a move) and its set-up form. */
export interface TrialDraft {
  key: string;
  setup: SetupDraft;
}

/** The plan form as typed. */
export interface PlanDraft {
  title: string;
  summary: string;
  shared: boolean;
  trials: TrialDraft[];
}

let nextKey = 0;
export const newTrialKey = () => `trial-${++nextKey}`;

export const newTrialDraft = (setup: SetupDraft = draftForRig("fountain")): TrialDraft => ({ key: newTrialKey(), setup });

export const emptyPlanDraft = (): PlanDraft => ({ title: "", summary: "", shared: false, trials: [newTrialDraft()] });

export function draftFromPlan(plan: Pick<LessonPlan, "title" | "summary" | "shared" | "trials">): PlanDraft {
  return {
    title: plan.title,
    summary: plan.summary,
    shared: plan.shared,
    trials: plan.trials.map((t) => newTrialDraft(draftFromSetup({ rig: t.rig, params: t.params, question: t.question }))),
  };
}

/**
 * The request body for a draft, or the messages to show first, keyed as the server keys them
 * (`title`, `trials`, `trials.1.params.potHeight`), so the server's field errors land in the same places.
 */
export function planPayload(draft: PlanDraft): { payload: LessonPlanInput | null; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const title = draft.title.replace(/\s+/g, " ").trim();
  if (!title) errors.title = "Give the title.";
  else if (title.length > PLAN_LIMITS.title) errors.title = `Keep the title to ${PLAN_LIMITS.title} characters or fewer.`;
  const summary = draft.summary.trim();
  if (summary.length > PLAN_LIMITS.summary) errors.summary = `Keep the summary to ${PLAN_LIMITS.summary} characters or fewer.`;
  if (draft.trials.length === 0) errors.trials = "Add at least one trial.";
  if (draft.trials.length > LESSON_LIMITS.trialsPerLesson) errors.trials = `A plan can have up to ${LESSON_LIMITS.trialsPerLesson} trials.`;
  const trials: TrialSetupInput[] = [];
  draft.trials.forEach((trial, i) => {
    const { payload, errors: own } = setupPayload(trial.setup);
    for (const [key, message] of Object.entries(own)) errors[`trials.${i}.${key}`] = message;
    if (payload) trials.push(payload);
  });
  if (Object.keys(errors).length > 0) return { payload: null, errors };
  return { payload: { title, summary, shared: draft.shared, trials }, errors };
}

/** The messages of trial `index`, keyed as its set-up form keys them (`params.potHeight`). */
export function trialErrors(errors: Record<string, string>, index: number): Record<string, string> {
  const prefix = `trials.${index}.`;
  const out: Record<string, string> = {};
  for (const [key, message] of Object.entries(errors)) if (key.startsWith(prefix)) out[key.slice(prefix.length)] = message;
  return out;
}

/** The server's field errors (first message per field). */
export function serverFieldMessages(fields: Record<string, string[]>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, messages] of Object.entries(fields)) if (messages[0]) out[key] = messages[0];
  return out;
}

/** The list with the item at `from` moved to `to` (both clamped to the list); the same list when nothing moves. */
export function moveItem<T>(items: readonly T[], from: number, to: number): T[] {
  const target = Math.max(0, Math.min(items.length - 1, to));
  if (from < 0 || from >= items.length || from === target) return [...items];
  const next = [...items];
  const [moved] = next.splice(from, 1);
  next.splice(target, 0, moved!);
  return next;
}

/** A comparable form of the draft, to tell whether anything changed since it was loaded or saved. */
export const draftFingerprint = (draft: PlanDraft) =>
  JSON.stringify({ ...draft, trials: draft.trials.map((t) => t.setup) });

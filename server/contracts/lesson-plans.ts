import { z } from "zod";
import { LESSON_LIMITS } from "./lesson-rules";
import { trialSetupSchema, type ShownParam, type ShownValue, type TrialSetup } from "./lessons";

/**
 * Lesson plans: a teacher's saved sequence of trial set-ups, started as a live lesson later.
 * Each set-up is checked on the server with the rig's own schema (as on the board), so field
 * errors come back keyed like `trials.1.params.potHeight`.
 */
export const PLAN_LIMITS = { title: 80, summary: 600 } as const;

const oneLine = (label: string, max: number) =>
  z
    .string({ error: `Give the ${label}.` })
    .transform((s) => s.replace(/\s+/g, " ").trim())
    .pipe(
      z
        .string()
        .min(1, `Give the ${label}.`)
        .max(max, `Keep the ${label} to ${max} characters or fewer.`)
        .refine((s) => !/[\u0000-\u001f\u007f]/.test(s), `The ${label} contains characters that cannot be shown.`),
    );

export const lessonPlanInputSchema = z.object({
  title: oneLine("title", PLAN_LIMITS.title),
  // Line breaks are kept in the summary: it is the teacher's notes.
  summary: z
    .string()
    .max(PLAN_LIMITS.summary, `Keep the summary to ${PLAN_LIMITS.summary} characters or fewer.`)
    .transform((s) => s.trim())
    .default(""),
  shared: z.boolean().default(false),
  trials: z
    .array(trialSetupSchema)
    .min(1, "Add at least one trial.")
    .max(LESSON_LIMITS.trialsPerLesson, `A plan can have up to ${LESSON_LIMITS.trialsPerLesson} trials.`),
});
export type LessonPlanInput = z.input<typeof lessonPlanInputSchema>;

/** The theory value of one unsaved set-up, for the editor's preview. */
export const planPreviewInputSchema = trialSetupSchema;

export interface PlanTrial extends TrialSetup {
  rigLabel: string;
  shownParams: ShownParam[];
  /** The closed-form value for this set-up in the question's unit (null where the theory gives none). */
  theory: ShownValue | null;
}

export interface LessonPlan {
  id: string;
  title: string;
  summary: string;
  shared: boolean;
  /** Whether the signed-in teacher owns it (only the owner may change or delete it). */
  mine: boolean;
  ownerName: string;
  copiedFromId: string | null;
  createdAt: string;
  updatedAt: string;
  trials: PlanTrial[];
}

/** A plan in the list: its trials in brief. */
export interface LessonPlanListItem extends Omit<LessonPlan, "trials"> {
  trialCount: number;
  rigs: string[];
  trials: { rig: TrialSetup["rig"]; rigLabel: string; prompt: string; theory: ShownValue | null }[];
}

export interface PlanPreview {
  shownParams: ShownParam[];
  theory: ShownValue | null;
}

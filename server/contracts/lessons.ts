import { z } from "zod";
import { RIG_IDS } from "../../sim/rigs/rig";
import {
  BOARD_CONTROLS,
  LESSON_LIMITS,
  ROUNDS,
  TRIAL_PHASES,
  checkDisplayName,
  isLessonCode,
  normaliseLessonCode,
  type Round,
  type TrialPhase,
} from "./lesson-rules";

/**
 * Wire shapes of live lessons: what the board, the remote and pupils' devices send (zod, checked
 * on the server) and what they receive (plain types). Parameters travel as a plain record; the
 * server checks them against the rig's own schema in sim/ (the pupil page never loads sim/).
 */

const plainText = (label: string, max: number, min = 1) =>
  z
    .string({ error: `Give the ${label}.` })
    .transform((s) => s.replace(/\s+/g, " ").trim())
    .pipe(
      z
        .string()
        .min(min, `Give the ${label}.`)
        .max(max, `Keep the ${label} to ${max} characters or fewer.`)
        .refine((s) => !/[\u0000-\u001f\u007f]/.test(s), `The ${label} contains characters that cannot be shown.`),
    );

export const lessonCodeSchema = z
  .string({ error: "Type the lesson code from the board." })
  .transform(normaliseLessonCode)
  .refine(isLessonCode, "A lesson code is 6 letters and digits, as shown on the board.");

export const rigIdSchema = z.enum(RIG_IDS);
export const trialPhaseSchema = z.enum(TRIAL_PHASES);
export const roundSchema = z.union([z.literal(1), z.literal(2)]) satisfies z.ZodType<(typeof ROUNDS)[number]>;
/** Client-made ids make resends idempotent: the same id is stored once. */
export const clientIdSchema = z.uuid({ error: "Each answer needs its own id." });

/** One choice of a multiple-choice question; an optional range (in the question's unit) lets the result mark it. */
export const choiceSchema = z.object({
  label: plainText("choice", LESSON_LIMITS.choiceLabel),
  min: z.number().finite().nullable().default(null),
  max: z.number().finite().nullable().default(null),
});

/**
 * What pupils are asked. `quantity` names a measured value of the rig (e.g. `rise`); a number
 * question is answered in `unit`, one of DISPLAY_UNITS for that quantity's SI unit.
 */
export const questionSchema = z.discriminatedUnion("kind", [
  z.object({
    kind: z.literal("number"),
    prompt: plainText("question", LESSON_LIMITS.prompt),
    quantity: z.string().min(1).max(40),
    unit: z.string().max(8),
    askReason: z.boolean().default(true),
    /** Ask pupils to explain what they saw after the run (phase "explain"). */
    askExplanation: z.boolean().default(true),
    /** Offer a second vote after the discussion (phase "re-vote"). */
    revote: z.boolean().default(true),
  }),
  z.object({
    kind: z.literal("choice"),
    prompt: plainText("question", LESSON_LIMITS.prompt),
    quantity: z.string().min(1).max(40),
    unit: z.string().max(8),
    choices: z
      .array(choiceSchema)
      .min(LESSON_LIMITS.minChoices, `Give at least ${LESSON_LIMITS.minChoices} choices.`)
      .max(LESSON_LIMITS.maxChoices, `Give at most ${LESSON_LIMITS.maxChoices} choices.`),
    askReason: z.boolean().default(true),
    /** Ask pupils to explain what they saw after the run (phase "explain"). */
    askExplanation: z.boolean().default(true),
    /** Offer a second vote after the discussion (phase "re-vote"). */
    revote: z.boolean().default(true),
  }),
]);
export type Question = z.output<typeof questionSchema>;
export type QuestionInput = z.input<typeof questionSchema>;

/** A trial's set-up as the teacher edits it in phase "set up". */
export const trialSetupSchema = z.object({
  rig: rigIdSchema,
  params: z.record(z.string(), z.unknown()).default({}),
  question: questionSchema,
});
export type TrialSetupInput = z.input<typeof trialSetupSchema>;
export type TrialSetup = z.output<typeof trialSetupSchema>;

export const startLessonInputSchema = z.object({
  /** Show pupils' names on the board for this lesson (off unless the teacher turns it on). */
  showNames: z.boolean().default(false),
  /** Start with the trials (rig, parameters, question, in order) of one of the teacher's earlier lessons. */
  fromLessonId: z.uuid({ error: "Pick one of your earlier lessons." }).nullable().default(null),
  /** Start with the trials of a lesson plan the teacher can see (their own, or shared in their department). */
  planId: z.uuid({ error: "Pick one of the plans." }).nullable().default(null),
}).refine((v) => v.fromLessonId === null || v.planId === null, {
  message: "Start from an earlier lesson or from a plan, not both.",
  path: ["planId"],
});
export type StartLessonInput = z.input<typeof startLessonInputSchema>;

/** The settled value of one measured quantity, as sim/ reports it (SI). */
export const settledSchema = z.object({
  value: z.number().finite(),
  uncertainty: z.number().finite().min(0),
  unit: z.string().max(8),
  basis: z.string().max(300),
});

/** What the board's simulation measured; the server records it and works out the theory itself. */
export const trialResultInputSchema = z.object({
  trialId: z.uuid(),
  seed: z.number().int().min(0).max(2 ** 31 - 1),
  measured: z.record(z.string().max(40), settledSchema).refine((m) => Object.keys(m).length <= 40, "Too many values."),
  run: z.object({
    dt: z.number().positive(),
    steps: z.number().int().min(0),
    simulatedSeconds: z.number().min(0),
    wallSeconds: z.number().min(0).nullable(),
  }),
});
export type TrialResultInput = z.input<typeof trialResultInputSchema>;

/** Counts per choice, or a list of typed values, from a show of hands (no pupil devices). */
export const tallyInputSchema = z.object({
  trialId: z.uuid(),
  round: roundSchema,
  counts: z.array(z.number().int().min(0).max(LESSON_LIMITS.tallyCount)).max(LESSON_LIMITS.maxChoices).nullable().default(null),
  values: z.array(z.number().finite()).max(LESSON_LIMITS.tallyValues).nullable().default(null),
});
export type TallyInput = z.input<typeof tallyInputSchema>;

export const joinLessonInputSchema = z
  .object({
    code: lessonCodeSchema,
    /** A name typed by the pupil, or… */
    name: z
      .string()
      .optional()
      .transform((s, ctx) => {
        if (s === undefined) return undefined;
        const check = checkDisplayName(s);
        if (!check.ok) {
          ctx.addIssue({ code: "custom", message: check.message });
          return z.NEVER;
        }
        return check.name;
      }),
    /** …a pick from the class roster, or… */
    rosterEntryId: z.uuid().optional(),
    /** …the token this device was given when it first joined (rejoin as the same participant). */
    resumeToken: z.string().min(20).max(100).optional(),
  })
  .refine((v) => v.name !== undefined || v.rosterEntryId !== undefined || v.resumeToken !== undefined, {
    message: "Type your name or pick it from the list.",
    path: ["name"],
  });
export type JoinLessonInput = z.input<typeof joinLessonInputSchema>;

export const predictionInputSchema = z
  .object({
    trialId: z.uuid(),
    round: roundSchema,
    clientId: clientIdSchema,
    value: z.number({ error: "Type a number." }).finite("Type a number.").nullable().default(null),
    choice: z.number().int().min(0).max(LESSON_LIMITS.maxChoices - 1).nullable().default(null),
    reason: z.string().max(LESSON_LIMITS.reason, `Keep your reason to ${LESSON_LIMITS.reason} characters or fewer.`).default(""),
  })
  .refine((v) => (v.value === null) !== (v.choice === null), { message: "Give a number or pick one choice.", path: ["value"] });
export type PredictionInput = z.input<typeof predictionInputSchema>;

export const explanationInputSchema = z.object({
  trialId: z.uuid(),
  clientId: clientIdSchema,
  text: plainText("explanation", LESSON_LIMITS.explanation),
});
export type ExplanationInput = z.input<typeof explanationInputSchema>;

export const lessonIdInputSchema = z.object({ lessonId: z.uuid() });
export const trialSetupUpdateSchema = trialSetupSchema.extend({ trialId: z.uuid() });
export const addTrialInputSchema = z.object({
  lessonId: z.uuid(),
  /** Start from a copy of this trial's set-up (change a parameter and run again). */
  copyOf: z.uuid().nullable().default(null),
  setup: trialSetupSchema.nullable().default(null),
});
export const movePhaseInputSchema = z.object({ trialId: z.uuid(), phase: trialPhaseSchema });
export const currentTrialInputSchema = z.object({ lessonId: z.uuid(), trialId: z.uuid() });
export const showExplanationInputSchema = z.object({ explanationId: z.uuid(), shown: z.boolean() });
export const lessonSettingsInputSchema = z.object({ lessonId: z.uuid(), showNames: z.boolean() });
export const boardControlInputSchema = z.object({ lessonId: z.uuid(), action: z.enum(BOARD_CONTROLS) });

// ---- What clients receive (built by the server; plain types) ----

export interface ShownParam {
  key: string;
  label: string;
  unit: string;
  value: number | string;
}

/** A result as shown in the question's unit. */
export interface ShownValue {
  value: number;
  uncertainty: number | null;
  unit: string;
}

/** Numbers from the theory for the current set-up (SI), with the α and β it used. */
export type TheoryValues = Record<string, number>;

export interface PublicTrial {
  id: string;
  position: number;
  rig: (typeof RIG_IDS)[number];
  rigLabel: string;
  rigSummary: string;
  params: Record<string, unknown>;
  shownParams: ShownParam[];
  question: Question;
  phase: TrialPhase;
  /** Answers received so far per round (values are never public before the run). */
  answered: Record<Round, number>;
  /** Set once the run has been recorded. */
  result: ShownValue | null;
  /** The closed-form value for this set-up, in the question's unit (null where the theory gives none). */
  theory: ShownValue | null;
  /** Everyone's answers without names, once the phase is past predict: values or choice indexes. */
  answers: { round: Round; value: number | null; choice: number | null }[] | null;
  /** Explanations the teacher chose to show, without names. */
  shownExplanations: { id: string; text: string }[];
  notes: string[];
}

export interface PublicLesson {
  id: string;
  code: string;
  className: string;
  status: "open" | "ended";
  joinedCount: number;
  trialCount: number;
  trial: PublicTrial | null;
}

export interface TeacherPrediction {
  id: string;
  participantId: string;
  participantName: string;
  round: Round;
  value: number | null;
  choice: number | null;
  reason: string;
  createdAt: string;
}

export interface TeacherExplanation {
  id: string;
  participantId: string;
  participantName: string;
  text: string;
  shown: boolean;
  createdAt: string;
}

export interface Tally {
  counts: number[] | null;
  values: number[] | null;
}

export interface TeacherTrial extends Omit<PublicTrial, "answers" | "shownExplanations"> {
  seed: number | null;
  measured: Record<string, z.output<typeof settledSchema>> | null;
  theoryValues: TheoryValues | null;
  predictions: TeacherPrediction[];
  explanations: TeacherExplanation[];
  tally: Record<Round, Tally | null>;
  ranAt: string | null;
}

export interface TeacherLesson {
  id: string;
  code: string;
  classId: string;
  className: string;
  status: "open" | "ended";
  showNames: boolean;
  /** The plan the lesson started from, as titled then (null for none). */
  planTitle: string | null;
  startedAt: string;
  endedAt: string | null;
  currentTrialId: string | null;
  participants: { id: string; displayName: string; online: boolean }[];
  trials: TeacherTrial[];
  /** The join address the QR code holds. */
  joinUrl: string;
}

/** What a pupil's device gets on joining: the lesson, who they are, and their own answers so far. */
export interface PupilSession {
  lesson: PublicLesson;
  participant: { id: string; displayName: string; resumeToken: string };
  mine: {
    predictions: { trialId: string; round: Round; clientId: string; value: number | null; choice: number | null; reason: string }[];
    explanations: { trialId: string; clientId: string; text: string }[];
  };
}

/** Before joining: the class's roster to pick from (if it has one), by display name only. */
export interface LessonLookup {
  lessonId: string;
  className: string;
  roster: { id: string; displayName: string; taken: boolean }[] | null;
}

// ---- HTTP (start, list, end) ----

export interface StartedLesson {
  lessonId: string;
  code: string;
}

/** A class's lessons, newest first. */
export interface LessonListItem {
  id: string;
  code: string;
  status: "open" | "ended";
  startedAt: string;
  endedAt: string | null;
  trialCount: number;
  /** Trials with a recorded result. */
  trialsRun: number;
  participantCount: number;
  /** The plan the lesson started from, as titled then (null: no plan). */
  planTitle: string | null;
}

/** The signed-in teacher's lessons still open (to get back to the board). */
export interface OpenLesson {
  id: string;
  code: string;
  classId: string;
  className: string;
  startedAt: string;
}

import type { TrialSetupInput, QuestionInput } from "@contracts/lessons";
import { DISPLAY_UNITS, LESSON_LIMITS, parseTypedNumber } from "@contracts/lesson-rules";
import { DEFAULT_QUESTIONS, QUESTION_QUANTITIES, quantityOf } from "@contracts/lesson-questions";
import { LINK_SHAPES, numberMetaOf, RIG_CATALOG, type LinkShape, type NumberMeta, type RigId } from "@sim/catalog";
import type { z } from "zod";

/** Parameters behind "More": the solver's step, pile details and the theory line's coefficients. */
export const ADVANCED_PARAMS = new Set(["dt", "looseRows", "aspectRatio", "theoryAlpha", "theoryBeta"]);
/** Shown beside the theory (and adjustable there on the board). */
export const THEORY_PARAMS = ["theoryAlpha", "theoryBeta"] as const;

export interface ParamField {
  key: string;
  meta: NumberMeta;
  advanced: boolean;
}

/** The number parameters of a rig, in its schema's order, with label, unit, range and default. */
export function paramFieldsFor(rig: RigId): ParamField[] {
  const schema = RIG_CATALOG[rig].schema as unknown as { shape?: Record<string, z.ZodType> };
  const fields: ParamField[] = [];
  for (const [key, field] of Object.entries(schema.shape ?? {})) {
    const meta = numberMetaOf(field);
    if (meta) fields.push({ key, meta, advanced: ADVANCED_PARAMS.has(key) });
  }
  return fields;
}

export interface ChoiceDraft {
  label: string;
  min: string;
  max: string;
}

/** The set-up form as typed: numbers stay text until sent, so a half-typed "0," is kept. */
export interface SetupDraft {
  rig: RigId;
  linkShape: LinkShape;
  params: Record<string, string>;
  question: {
    kind: "number" | "choice";
    prompt: string;
    quantity: string;
    unit: string;
    choices: ChoiceDraft[];
    askReason: boolean;
    askExplanation: boolean;
    revote: boolean;
  };
}

const text = (value: unknown) => (typeof value === "number" && Number.isFinite(value) ? String(value) : "");

export function defaultQuestionDraft(rig: RigId): SetupDraft["question"] {
  const q = DEFAULT_QUESTIONS[rig];
  return { kind: "number", prompt: q.prompt, quantity: q.quantity, unit: q.unit, choices: [], askReason: true, askExplanation: true, revote: true };
}

/** The form for a trial's stored set-up (parameters not stored show their defaults as placeholders). */
export function draftFromSetup(setup: { rig: RigId; params: Record<string, unknown>; question: QuestionInput }): SetupDraft {
  const params: Record<string, string> = {};
  for (const field of paramFieldsFor(setup.rig)) params[field.key] = text(setup.params[field.key]);
  const shape = setup.params.linkShape;
  const q = setup.question;
  return {
    rig: setup.rig,
    linkShape: LINK_SHAPES.includes(shape as LinkShape) ? (shape as LinkShape) : "rod",
    params,
    question: {
      kind: q.kind,
      prompt: q.prompt,
      quantity: q.quantity,
      unit: q.unit,
      choices: q.kind === "choice" ? q.choices.map((c) => ({ label: c.label, min: text(c.min), max: text(c.max) })) : [],
      askReason: q.askReason ?? true,
      askExplanation: q.askExplanation ?? true,
      revote: q.revote ?? true,
    },
  };
}

/** Switching rig starts from that rig's defaults and its default question. */
export const draftForRig = (rig: RigId, linkShape: LinkShape = "rod"): SetupDraft => ({
  rig,
  linkShape,
  params: Object.fromEntries(paramFieldsFor(rig).map((f) => [f.key, ""])),
  question: defaultQuestionDraft(rig),
});

/** Units a number question on this quantity may use. */
export function unitsFor(rig: RigId, quantity: string): string[] {
  const si = quantityOf(rig, quantity)?.siUnit ?? "";
  return (DISPLAY_UNITS[si] ?? [{ unit: si }]).map((u) => u.unit);
}

/** A new quantity keeps the unit if it still fits, else takes the first unit of that quantity. */
export function withQuantity(draft: SetupDraft, quantity: string): SetupDraft {
  const units = unitsFor(draft.rig, quantity);
  const unit = units.includes(draft.question.unit) ? draft.question.unit : units[0] ?? "";
  return { ...draft, question: { ...draft.question, quantity, unit } };
}

const rangeMessage = (meta: NumberMeta) =>
  `${meta.label} must be ${meta.integer ? "a whole number " : ""}from ${meta.min} to ${meta.max}${meta.unit ? ` ${meta.unit}` : ""}.`;

/**
 * The `trial:setup` payload for a draft, or the messages to show beside fields first (keyed
 * as the server keys them: `params.potHeight`, `question.prompt`, `question.choices.1.label`).
 * Empty number fields are left out, so the rig's default applies.
 */
export function setupPayload(draft: SetupDraft): { payload: TrialSetupInput | null; errors: Record<string, string> } {
  const errors: Record<string, string> = {};
  const params: Record<string, unknown> = { linkShape: draft.linkShape };
  for (const field of paramFieldsFor(draft.rig)) {
    const raw = (draft.params[field.key] ?? "").trim();
    if (!raw) continue;
    const value = parseTypedNumber(raw);
    if (value === null) errors[`params.${field.key}`] = "Type a number.";
    else if (value < field.meta.min || value > field.meta.max || (field.meta.integer && !Number.isInteger(value))) errors[`params.${field.key}`] = rangeMessage(field.meta);
    else params[field.key] = value;
  }
  const q = draft.question;
  const prompt = q.prompt.replace(/\s+/g, " ").trim();
  if (!prompt) errors["question.prompt"] = "Give the question.";
  else if (prompt.length > LESSON_LIMITS.prompt) errors["question.prompt"] = `Keep the question to ${LESSON_LIMITS.prompt} characters or fewer.`;
  if (!QUESTION_QUANTITIES[draft.rig].some((x) => x.key === q.quantity)) errors["question.quantity"] = "Pick what is asked.";
  let question: QuestionInput;
  if (q.kind === "number") {
    if (!unitsFor(draft.rig, q.quantity).includes(q.unit)) errors["question.unit"] = "Pick a unit.";
    question = { kind: "number", prompt, quantity: q.quantity, unit: q.unit, askReason: q.askReason, askExplanation: q.askExplanation, revote: q.revote };
  } else {
    const choices = q.choices.map((c, i) => {
      const label = c.label.replace(/\s+/g, " ").trim();
      if (!label) errors[`question.choices.${i}.label`] = "Give the choice.";
      const bound = (raw: string, which: "min" | "max") => {
        if (!raw.trim()) return null;
        const value = parseTypedNumber(raw);
        if (value === null) errors[`question.choices.${i}.${which}`] = "Type a number or leave empty.";
        return value;
      };
      return { label, min: bound(c.min, "min"), max: bound(c.max, "max") };
    });
    if (choices.length < LESSON_LIMITS.minChoices) errors["question.choices"] = `Give at least ${LESSON_LIMITS.minChoices} choices.`;
    if (choices.length > LESSON_LIMITS.maxChoices) errors["question.choices"] = `Give at most ${LESSON_LIMITS.maxChoices} choices.`;
    question = { kind: "choice", prompt, quantity: q.quantity, unit: q.unit, choices, askReason: q.askReason, askExplanation: q.askExplanation, revote: q.revote };
  }
  if (Object.keys(errors).length > 0) return { payload: null, errors };
  return { payload: { rig: draft.rig, params, question }, errors };
}

/** The server's field messages (from a validation_failed ack), first message per field. */
export function fieldMessages(fields: Record<string, string[]>): Record<string, string> {
  const out: Record<string, string> = {};
  for (const [key, messages] of Object.entries(fields)) {
    // Parameters checked by the rig's own schema may come back without the `params.` prefix.
    const name = key.startsWith("params.") || key.startsWith("question") || key === "rig" || key === "_form" ? key : `params.${key}`;
    if (messages[0]) out[name] ??= messages[0];
  }
  return out;
}

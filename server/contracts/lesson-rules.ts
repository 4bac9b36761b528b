/**
 * Live-lesson rules as plain values, without zod, so the pupil page's first load can use them
 * (it must stay small). The zod schemas in `lessons.ts` are built from these numbers.
 */

/**
 * Lesson codes use capitals and digits that cannot be mistaken for one another when read off a
 * projector or typed on a phone: no 0/O/D/Q, 1/I/L, 2/Z, 5/S, 6/G, 8/B, U/V. 20^6 = 64 million codes.
 */
export const LESSON_CODE_ALPHABET = "ACEFHJKMNPRTWXY34679";
export const LESSON_CODE_LENGTH = 6;

/** Uppercases and drops spaces and dashes, so "ab3-k7p" and "AB3 K7P" both work. */
export function normaliseLessonCode(input: string): string {
  return input.toUpperCase().replace(/[\s\-–]/g, "");
}

export function isLessonCode(input: string): boolean {
  if (input.length !== LESSON_CODE_LENGTH) return false;
  for (const ch of input) if (!LESSON_CODE_ALPHABET.includes(ch)) return false;
  return true;
}

/** The four phases of a trial, and the optional second vote after discussion. */
export const TRIAL_PHASES = ["setup", "predict", "observe", "explain", "revote"] as const;
export type TrialPhase = (typeof TRIAL_PHASES)[number];

export const TRIAL_PHASE_LABELS: Record<TrialPhase, string> = {
  setup: "Set up",
  predict: "Predict",
  observe: "Observe",
  explain: "Explain",
  revote: "Re-vote",
};

/**
 * Where the teacher may move a trial from each phase. Forward only, so answers already given
 * always belong to the set-up they were given for; a changed set-up is a new trial.
 */
export const PHASE_NEXT: Record<TrialPhase, readonly TrialPhase[]> = {
  setup: ["predict", "observe"],
  predict: ["observe"],
  observe: ["explain"],
  explain: ["revote"],
  revote: ["explain"],
};

export const canMovePhase = (from: TrialPhase, to: TrialPhase) => PHASE_NEXT[from].includes(to);

/** A question's say on the phases after the run (both default to on). */
export interface PhaseFlags {
  askExplanation?: boolean;
  revote?: boolean;
}

/**
 * `canMovePhase` for a trial whose question may skip steps: no "explain" when no explanation is
 * asked, no "revote" when no re-vote is offered. Without "explain", the re-vote (if offered)
 * opens straight after the run.
 */
export function canMoveTrialPhase(from: TrialPhase, to: TrialPhase, flags: PhaseFlags): boolean {
  const explain = flags.askExplanation !== false;
  const revote = flags.revote !== false;
  if (to === "explain" && !explain) return false;
  if (to === "revote" && !revote) return false;
  if (from === "observe" && to === "revote") return !explain;
  return canMovePhase(from, to);
}

/** The steps a trial with this question goes through, in order (the re-vote only when it is open). */
export function phaseStepsFor(flags: PhaseFlags, current: TrialPhase): TrialPhase[] {
  const steps: TrialPhase[] = ["setup", "predict", "observe"];
  if (flags.askExplanation !== false) steps.push("explain");
  if (current === "revote") steps.push("revote");
  return steps;
}

/** Round 1 is the prediction before the run; round 2 the re-vote after discussion. */
export const ROUNDS = [1, 2] as const;
export type Round = (typeof ROUNDS)[number];
/** The phase in which each round's answers are taken. */
export const ROUND_PHASE: Record<Round, TrialPhase> = { 1: "predict", 2: "revote" };

export const LESSON_LIMITS = {
  displayName: 30,
  reason: 280,
  explanation: 600,
  prompt: 160,
  choiceLabel: 60,
  minChoices: 2,
  maxChoices: 6,
  trialsPerLesson: 40,
  tallyValues: 60,
  tallyCount: 200,
} as const;

/**
 * Units a number question may be asked in, for each SI unit the simulation reports, with how
 * many of the display unit make one SI unit (cm: 100 per metre).
 */
export const DISPLAY_UNITS: Record<string, readonly { unit: string; perSi: number }[]> = {
  m: [
    { unit: "cm", perSi: 100 },
    { unit: "m", perSi: 1 },
    { unit: "mm", perSi: 1000 },
  ],
  "m/s": [{ unit: "m/s", perSi: 1 }],
  N: [
    { unit: "N", perSi: 1 },
    { unit: "mN", perSi: 1000 },
  ],
  "": [{ unit: "", perSi: 1 }],
};

export function perSiOf(siUnit: string, unit: string): number | null {
  return DISPLAY_UNITS[siUnit]?.find((u) => u.unit === unit)?.perSi ?? null;
}

/** A name a pupil types: "Sam K." is fine; an e-mail address or a long full name is not. */
export function checkDisplayName(raw: string): { ok: true; name: string } | { ok: false; message: string } {
  const name = raw.replace(/\s+/g, " ").trim();
  if (!name) return { ok: false, message: "Type the name your teacher asked for, such as your first name and initial." };
  if (name.length > LESSON_LIMITS.displayName)
    return { ok: false, message: `Keep your name to ${LESSON_LIMITS.displayName} characters or fewer.` };
  if (name.includes("@")) return { ok: false, message: "Use a first name and initial, not an e-mail address." };
  if (/[\u0000-\u001f\u007f<>]/.test(name)) return { ok: false, message: "Your name contains characters that cannot be shown." };
  return { ok: true, name };
}

/** Reads a typed number: accepts a decimal comma ("12,5") as schools in many countries write it. */
export function parseTypedNumber(raw: string): number | null {
  const text = raw.trim().replace(/\s/g, "").replace(",", ".");
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(text)) return null;
  const value = Number(text);
  return Number.isFinite(value) ? value : null;
}

/** What the remote can ask the board's player to do (the board plays; the remote has no drawing). */
export const BOARD_CONTROLS = ["toggle-play", "toggle-slow", "replay"] as const;
export type BoardControl = (typeof BOARD_CONTROLS)[number];

/**
 * Within 10 % of the result, as the board, the review and the overview all count it:
 * |v − r| ≤ 0.1·|r|, with a 1e-9·|r| allowance for rounding so that 11 against 10 counts.
 */
export function isWithin10(value: number, result: number): boolean {
  const r = Math.abs(result);
  return Math.abs(value - result) <= 0.1 * r + 1e-9 * r;
}

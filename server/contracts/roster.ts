import { z } from "zod";

/**
 * Pupils have no accounts: a roster holds display names only, a first name and an
 * initial ("Amira K."). These rules are shared by the roster editor and the API.
 */
export const ROSTER_LIMITS = { nameLength: 30, entries: 60 } as const;

export const ROSTER_NAME_PROBLEMS = ["blank", "too_long", "email", "full_name", "characters", "duplicate"] as const;
export type RosterNameProblem = (typeof ROSTER_NAME_PROBLEMS)[number];

export type RosterNameCheck =
  | { ok: true; value: string }
  | { ok: false; problem: Exclude<RosterNameProblem, "duplicate">; message: string };

const ALLOWED = /^[\p{L}\p{M}\p{N} .'’-]+$/u;
// An initial, optionally with an apostrophe prefix as in "O'N.".
const INITIAL = /^\p{L}(?:['’]\p{L})?\.?$/u;

/** Collapses runs of spaces and trims, as every stored display name is. */
export const tidyRosterName = (raw: string) => raw.replace(/\s+/g, " ").trim();

/** Tidies spaces and checks one display name. */
export function checkRosterName(raw: string): RosterNameCheck {
  const value = tidyRosterName(raw);
  if (!value) return { ok: false, problem: "blank", message: "This name is blank." };
  if (value.length > ROSTER_LIMITS.nameLength)
    return { ok: false, problem: "too_long", message: `Keep names to ${ROSTER_LIMITS.nameLength} characters or fewer.` };
  if (value.includes("@") || /\.[a-z]{2,}$/i.test(value))
    return { ok: false, problem: "email", message: "This looks like an e-mail address: use a first name and initial." };
  if (!ALLOWED.test(value))
    return { ok: false, problem: "characters", message: "Use letters, spaces, hyphens, apostrophes and full stops only." };
  const words = value.split(" ");
  if (words.length > 1 && !INITIAL.test(words[words.length - 1]!))
    return {
      ok: false,
      problem: "full_name",
      message: "This looks like a full name: use the first name and an initial, for example “Amira K.”.",
    };
  return { ok: true, value };
}

/** Key under which two names count as the same pupil ("Sam K" and "sam k." clash). */
export const rosterNameKey = (name: string) => name.toLocaleLowerCase("en").replace(/\.$/, "");

/** One name, tidied, or an issue naming the problem. */
export const rosterNameSchema = z.string().transform((raw, ctx) => {
  const check = checkRosterName(raw);
  if (!check.ok) {
    ctx.addIssue({ code: "custom", message: check.message, params: { problem: check.problem } });
    return z.NEVER;
  }
  return check.value;
});

/**
 * A whole roster: every row is checked (blank, too long, e-mail, full name, duplicate) in one
 * pass, so a teacher sees all the problems at once, each on its own row.
 */
export const rosterInputSchema = z.object({
  names: z
    .array(z.string({ error: "Each name must be text." }))
    .max(ROSTER_LIMITS.entries, `A roster holds at most ${ROSTER_LIMITS.entries} names.`)
    .superRefine((names, ctx) => {
      classifyRosterRows(names).forEach((verdict, i) => {
        if (!verdict.ok) ctx.addIssue({ code: "custom", path: [i], message: verdict.message, params: { problem: verdict.problem } });
      });
    })
    .transform((names) => names.map(tidyRosterName)),
});
export type RosterInput = z.input<typeof rosterInputSchema>;

export const rosterSchema = z.object({
  classId: z.uuid(),
  names: z.array(z.object({ id: z.uuid(), displayName: z.string() })),
  updatedAt: z.string().nullable(),
});
export type Roster = z.infer<typeof rosterSchema>;

export type RosterRowVerdict =
  | { ok: true; value: string }
  | {
      ok: false;
      problem: RosterNameProblem;
      message: string;
      /** For a duplicate: the index of the row it repeats. */
      duplicateOf?: number;
    };

/**
 * Every row of a list of names judged on its own, blank rows included (an uploaded file's rows
 * are shown one by one): the same rules as `rosterInputSchema`, so a preview says what the
 * server will say. A repeated name is refused on its second and later rows.
 */
export function classifyRosterRows(raws: readonly string[]): RosterRowVerdict[] {
  const firstSeen = new Map<string, number>();
  return raws.map((raw, i) => {
    const check = checkRosterName(raw);
    if (!check.ok) return check;
    const key = rosterNameKey(check.value);
    const first = firstSeen.get(key);
    if (first !== undefined) {
      return {
        ok: false,
        problem: "duplicate",
        message: `Same name as row ${first + 1}: add a letter to tell them apart.`,
        duplicateOf: first,
      };
    }
    firstSeen.set(key, i);
    return check;
  });
}

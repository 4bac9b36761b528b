import { LESSON_LIMITS, parseTypedNumber } from "@contracts/lesson-rules";

export interface ParsedValues {
  values: number[];
  /** Tokens that are not numbers, as typed. */
  notUnderstood: string[];
  /** Set when commas could be decimal commas or separators and the text does not say which. */
  ambiguous: string | null;
}

/**
 * Reads a list of values the teacher typed from a show of hands: separated by spaces, new lines,
 * semicolons or commas. A comma is a decimal comma ("12,5" = 12.5) only when that is unambiguous:
 * the values are already separated by spaces, new lines or semicolons, and no value holds two
 * commas. A comma followed or preceded by a space ("12, 15") always separates. A single "12,5"
 * with nothing else could be 12.5 or the two values 12 and 5: it is reported, not guessed.
 */
export function parseTypedValues(text: string): ParsedValues {
  const trimmed = text.trim();
  if (!trimmed) return { values: [], notUnderstood: [], ambiguous: null };
  const rough = trimmed.split(/[\s;]+/).filter(Boolean);
  const commasSeparate = /,\s|\s,/.test(trimmed) || rough.some((t) => t.split(",").length > 2) || /^,|,$/.test(trimmed);
  if (!commasSeparate && rough.length === 1 && rough[0]!.includes(",")) {
    return { values: [], notUnderstood: [], ambiguous: rough[0]! };
  }
  const tokens = commasSeparate ? trimmed.split(/[\s;,]+/).filter(Boolean) : rough;
  const values: number[] = [];
  const notUnderstood: string[] = [];
  for (const token of tokens) {
    // A typed minus sign (U+2212) is a minus.
    const value = parseTypedNumber(token.replace(/\u2212/g, "-"));
    if (value === null) notUnderstood.push(token);
    else values.push(value);
  }
  return { values, notUnderstood, ambiguous: null };
}

/** What is wrong with a typed list, in plain words, or null when it can be saved. */
export function valuesProblem(parsed: ParsedValues): string | null {
  if (parsed.ambiguous !== null) {
    const [whole, part] = parsed.ambiguous.split(",");
    return `“${parsed.ambiguous}” could be one value (${whole}.${part}) or two (${whole} and ${part}). Write ${whole}.${part} for one value, or put a space between two.`;
  }
  if (parsed.notUnderstood.length > 0) {
    const shown = parsed.notUnderstood.slice(0, 5).map((t) => `“${t}”`).join(", ");
    const more = parsed.notUnderstood.length > 5 ? ` and ${parsed.notUnderstood.length - 5} more` : "";
    return `These are not numbers: ${shown}${more}. Type numbers only, without units.`;
  }
  if (parsed.values.length === 0) return "Type at least one value.";
  if (parsed.values.length > LESSON_LIMITS.tallyValues) {
    return `That is ${parsed.values.length} values; at most ${LESSON_LIMITS.tallyValues} can be saved.`;
  }
  return null;
}

/** What is wrong with the counts per choice, in plain words, or null when they can be saved. */
export function countsProblem(counts: readonly number[]): string | null {
  if (counts.some((c) => !Number.isInteger(c) || c < 0)) return "Each count is a whole number, 0 or more.";
  if (counts.some((c) => c > LESSON_LIMITS.tallyCount)) return `Each count can be at most ${LESSON_LIMITS.tallyCount}.`;
  if (counts.every((c) => c === 0)) return "Every count is 0: count the hands for at least one choice.";
  return null;
}

/** Reads one count box: whole numbers only (spaces ignored); null when it is not one. */
export function parseCount(raw: string): number | null {
  const text = raw.replace(/\s/g, "");
  if (text === "") return 0;
  return /^\d{1,4}$/.test(text) ? Number(text) : null;
}

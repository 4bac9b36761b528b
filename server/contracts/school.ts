import { z } from "zod";

/**
 * The school's time zone (an IANA name): the department overview's weeks and the weekly digest
 * count days in it, so a lesson at 08:30 on a Monday is in that Monday's week all year round.
 */
export const DEFAULT_SCHOOL_TIME_ZONE = "Europe/London";

/** The canonical spelling of a time zone name ("europe/london" → "Europe/London"), or null if there is none. */
export function canonicalTimeZone(name: string): string | null {
  try {
    return new Intl.DateTimeFormat("en-GB", { timeZone: name }).resolvedOptions().timeZone;
  } catch {
    return null;
  }
}

export const timeZoneSchema = z
  .string()
  .trim()
  .transform((name, ctx) => {
    const canonical = name ? canonicalTimeZone(name) : null;
    if (!canonical) {
      ctx.addIssue({ code: "custom", message: "Choose a time zone from the list." });
      return z.NEVER;
    }
    return canonical;
  });

export const updateTimeZoneInputSchema = z.object({ timeZone: timeZoneSchema });

/** "2026-12-02": the calendar day `date` falls on in `timeZone`. */
export function isoDayIn(date: Date, timeZone: string): string {
  const parts = new Intl.DateTimeFormat("en-GB", { timeZone, year: "numeric", month: "2-digit", day: "2-digit" }).formatToParts(date);
  const part = (type: string) => parts.find((p) => p.type === type)!.value;
  return `${part("year")}-${part("month")}-${part("day")}`;
}

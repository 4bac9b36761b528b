import { z } from "zod";

/**
 * The head of department's overview: totals only, for the department's lessons in a date range.
 * Days are the school's (its time zone) and weeks start on Monday. Days here are plain calendar
 * days ("2026-11-30"); the helpers below do calendar arithmetic on them at UTC midnight.
 */
/** The longest range one request may ask for (two school years and a bit). */
export const OVERVIEW_MAX_DAYS = 731;
/** With no range given: the current week and the 11 before it. */
export const OVERVIEW_DEFAULT_WEEKS = 12;

const DAY_MS = 86_400_000;
const ISO_DAY = /^\d{4}-\d{2}-\d{2}$/;

/** "2026-11-30" for the UTC day of `date`. */
export const isoDay = (date: Date): string => date.toISOString().slice(0, 10);

/** Midnight UTC of an ISO day, or null when it is not a real calendar day ("2026-02-30"). */
export function parseIsoDay(text: string): Date | null {
  if (!ISO_DAY.test(text)) return null;
  const date = new Date(`${text}T00:00:00Z`);
  return Number.isNaN(date.getTime()) || isoDay(date) !== text ? null : date;
}

export const addDays = (day: string, days: number): string => isoDay(new Date(parseIsoDay(day)!.getTime() + days * DAY_MS));

/** The Monday (UTC) of the week holding `day`. */
export function mondayOf(day: string): string {
  const date = parseIsoDay(day)!;
  const sinceMonday = (date.getUTCDay() + 6) % 7;
  return addDays(day, -sinceMonday);
}

/** Whole days from `from` to `to` (0 for the same day). */
export const daysBetween = (from: string, to: string): number => Math.round((parseIsoDay(to)!.getTime() - parseIsoDay(from)!.getTime()) / DAY_MS);

/** The Mondays of every week that overlaps from…to, oldest first. */
export function weeksOverlapping(from: string, to: string): string[] {
  const weeks: string[] = [];
  for (let week = mondayOf(from); week <= to; week = addDays(week, 7)) weeks.push(week);
  return weeks;
}

/** The default range on `today`: from the Monday 11 weeks before this week's Monday, to today. */
export function defaultOverviewRange(today: string): { from: string; to: string } {
  return { from: addDays(mondayOf(today), -7 * (OVERVIEW_DEFAULT_WEEKS - 1)), to: today };
}

const daySchema = (label: string) =>
  z
    .string({ error: `Give the ${label} date as YYYY-MM-DD.` })
    .refine((text) => parseIsoDay(text) !== null, `Give the ${label} date as a real day, YYYY-MM-DD (e.g. 2026-09-07).`);

/** `?from=YYYY-MM-DD&to=YYYY-MM-DD`, both days included; either may be left out (see the service's defaults). */
export const overviewQuerySchema = z
  .object({ from: daySchema("start").optional(), to: daySchema("end").optional() })
  .superRefine((q, ctx) => {
    if (!q.from || !q.to) return;
    if (q.from > q.to) ctx.addIssue({ code: "custom", path: ["to"], message: "The end date must be on or after the start date." });
    else if (daysBetween(q.from, q.to) >= OVERVIEW_MAX_DAYS)
      ctx.addIssue({ code: "custom", path: ["from"], message: `Choose a range of at most ${OVERVIEW_MAX_DAYS} days (about two school years).` });
  });
export type OverviewQuery = z.input<typeof overviewQuerySchema>;

export interface OverviewTotals {
  lessons: number;
  /** Trials whose run was recorded. */
  trialsRun: number;
  /** Pupils taking part, counted once per lesson they joined (a pupil in two lessons counts twice). */
  pupilsTakingPart: number;
  classesActive: number;
  teachersActive: number;
}

/** One row of numbers per teacher or class, one number per week of `weeks`. */
export interface WeeklySeries {
  id: string;
  name: string;
  perWeek: number[];
  total: number;
}

/** How close the class predictions were to results, in one week. */
export interface WeeklyCloseness {
  week: string;
  /** Trials with a result and at least one round-1 number prediction. */
  trialsCompared: number;
  /** Round-1 number predictions in those trials. */
  predictions: number;
  /** Share (0–1) of those predictions within 10 % of the result; null with none. */
  shareWithin10: number | null;
  /** Median over trials of each class's median relative error |prediction − result| / |result| (0.25 = 25 %). */
  medianRelativeError: number | null;
}

export interface DepartmentOverview {
  from: string;
  to: string;
  /** The school's time zone (IANA), in which days and weeks are counted. */
  timeZone: string;
  /** Mondays of the weeks shown, oldest first; every `perWeek` array follows this order. */
  weeks: string[];
  totals: OverviewTotals;
  lessonsByTeacher: WeeklySeries[];
  lessonsByClass: (WeeklySeries & { teacherName: string })[];
  pupilsPerWeek: number[];
  trialsByRig: { rig: string; trialsRun: number }[];
  closeness: WeeklyCloseness[];
}

import { addDays, defaultOverviewRange, isoDay, parseIsoDay } from "@contracts/department-overview";

export interface OverviewRange {
  from: string;
  to: string;
}

export const RANGE_PRESETS = ["this-term", "last-12-weeks", "this-school-year"] as const;
export type RangePreset = (typeof RANGE_PRESETS)[number];

export const PRESET_LABELS: Record<RangePreset, string> = {
  "this-term": "This term",
  "last-12-weeks": "Last 12 weeks",
  "this-school-year": "This school year",
};

/**
 * The school year starts on 1 September and has three terms, from 1 September, 1 January and
 * 1 April (a rule of thumb for schools in England, from memory; real term dates vary, so the
 * date inputs are there for exact ranges).
 */
export function presetRange(preset: RangePreset, today: string): OverviewRange {
  const year = Number(today.slice(0, 4));
  const month = Number(today.slice(5, 7));
  if (preset === "last-12-weeks") return defaultOverviewRange(today);
  if (preset === "this-school-year") return { from: `${month >= 9 ? year : year - 1}-09-01`, to: today };
  const termStart = month >= 9 ? `${year}-09-01` : month >= 4 ? `${year}-04-01` : `${year}-01-01`;
  return { from: termStart, to: today };
}

/** Which preset, if any, a range is on `today` (to show it as chosen). */
export function presetOf(range: OverviewRange, today: string): RangePreset | null {
  return RANGE_PRESETS.find((p) => {
    const r = presetRange(p, today);
    return r.from === range.from && r.to === range.to;
  }) ?? null;
}

/**
 * The range in the address (`?from=…&to=…`), or the last 12 weeks when either is missing or is
 * not a real day. Whether from ≤ to is left to the server, which answers with a message.
 */
export function rangeFromParams(params: URLSearchParams, today: string): OverviewRange {
  const from = params.get("from");
  const to = params.get("to");
  if (from && to && parseIsoDay(from) && parseIsoDay(to)) return { from, to };
  return defaultOverviewRange(today);
}

/** Today's date where the browser is (the date a teacher would type). */
export function localToday(now: Date = new Date()): string {
  return isoDay(new Date(now.getTime() - now.getTimezoneOffset() * 60_000));
}

/** "7 Sep" for a week's Monday; "7 Sep 2025" with the year. */
export function formatDay(day: string, withYear = false): string {
  return parseIsoDay(day)!.toLocaleDateString("en-GB", { day: "numeric", month: "short", year: withYear ? "numeric" : undefined, timeZone: "UTC" });
}

/** "7–13 Sep 2025": the Monday to Sunday of a week. */
export function formatWeek(monday: string): string {
  return `${formatDay(monday)} – ${formatDay(addDays(monday, 6), true)}`;
}

/** 0.4321 → "43 %"; null → "–". */
export function formatShare(share: number | null): string {
  return share === null ? "–" : `${Math.round(share * 100)} %`;
}

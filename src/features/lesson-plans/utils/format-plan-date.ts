/** "30 Nov 2026" in the browser's own time zone: when a plan last changed. */
export function formatPlanDate(iso: string, locale = "en-GB", timeZone?: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return "on an unknown date";
  return date.toLocaleDateString(locale, { day: "numeric", month: "short", year: "numeric", timeZone });
}

/** "Mon 30 Nov 2026, 09:05" in the browser's time zone (the lesson's date as the teacher knows it). */
export function formatReviewDate(iso: string, locale = "en-GB", timeZone?: string): string {
  const date = new Date(iso);
  if (Number.isNaN(date.getTime())) return "Unknown date";
  return date.toLocaleString(locale, { weekday: "short", day: "numeric", month: "short", year: "numeric", hour: "2-digit", minute: "2-digit", timeZone });
}

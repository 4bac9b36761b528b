const pad = (n: number) => String(n).padStart(2, "0");
const dateText = (d: Date) => `${d.getFullYear()}-${pad(d.getMonth() + 1)}-${pad(d.getDate())}`;

/**
 * The form's first suggestion: the next weekday at 09:00, in the browser's own time zone
 * (a teacher plans ahead; today is still one change away).
 */
export function defaultPlannedSlot(now: Date): { date: string; time: string } {
  const day = new Date(now.getFullYear(), now.getMonth(), now.getDate() + 1);
  while (day.getDay() === 0 || day.getDay() === 6) day.setDate(day.getDate() + 1);
  return { date: dateText(day), time: "09:00" };
}

/** The ISO instant for a date ("2026-12-03") and time ("09:05") typed in local time, or null if either is not valid. */
export function plannedForIso(date: string, time: string): string | null {
  if (!/^\d{4}-\d{2}-\d{2}$/.test(date) || !/^\d{2}:\d{2}$/.test(time)) return null;
  const [y, m, d] = date.split("-").map(Number) as [number, number, number];
  const [hh, mm] = time.split(":").map(Number) as [number, number];
  const at = new Date(y, m - 1, d, hh, mm);
  // Date rolls 31 February over into March: refuse instead.
  if (at.getFullYear() !== y || at.getMonth() !== m - 1 || at.getDate() !== d || hh > 23 || mm > 59) return null;
  return at.toISOString();
}

/** "Today, 09:05", "Tomorrow, 14:00" or "Thu 10 Dec, 09:00", in the browser's time zone. */
export function plannedDayLabel(iso: string, now: Date, locale = "en-GB"): string {
  const at = new Date(iso);
  if (Number.isNaN(at.getTime())) return "Unknown time";
  const time = at.toLocaleTimeString(locale, { hour: "2-digit", minute: "2-digit" });
  const days = Math.round(
    (new Date(at.getFullYear(), at.getMonth(), at.getDate()).getTime() - new Date(now.getFullYear(), now.getMonth(), now.getDate()).getTime()) /
      86_400_000,
  );
  if (days === 0) return `Today, ${time}`;
  if (days === 1) return `Tomorrow, ${time}`;
  const day = at.toLocaleDateString(locale, { weekday: "short", day: "numeric", month: "short" });
  return `${day}, ${time}`;
}

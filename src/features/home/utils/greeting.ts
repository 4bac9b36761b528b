/** "Good morning" before noon, "Good afternoon" until six, then "Good evening". */
export function greetingFor(hour: number): string {
  if (hour < 12) return "Good morning";
  if (hour < 18) return "Good afternoon";
  return "Good evening";
}

/** The first word of a display name: "Tom Ashdown" → "Tom". */
export const firstNameOf = (displayName: string) => displayName.trim().split(/\s+/)[0] ?? displayName;

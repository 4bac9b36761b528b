/**
 * Where to send someone after sign-in. Only paths on this site are accepted (the server applies
 * the same rule), and never the sign-in pages themselves, so a bad link cannot loop or leave the site.
 */
export function safeReturnTo(value: string | null | undefined): string | undefined {
  if (!value || value.length > 300) return undefined;
  if (!value.startsWith("/") || value.startsWith("//") || value.startsWith("/\\")) return undefined;
  if (value.startsWith("/auth/") || /[\u0000-\u001f]/.test(value)) return undefined;
  const path = value.split(/[?#]/)[0]!;
  if (path === "/sign-in" || path.startsWith("/sign-in/")) return undefined;
  return value;
}

/** `/sign-in?returnTo=…` for a page that needs sign-in; the home page needs no returnTo. */
export function signInPath(returnTo?: string): string {
  const safe = safeReturnTo(returnTo);
  return safe && safe !== "/" ? `/sign-in?returnTo=${encodeURIComponent(safe)}` : "/sign-in";
}

/** The server's sign-in start, which comes back to `returnTo` (or home) afterwards. */
export function signInStartUrl(returnTo?: string | null): string {
  const safe = safeReturnTo(returnTo);
  return safe ? `/auth/google?returnTo=${encodeURIComponent(safe)}` : "/auth/google";
}

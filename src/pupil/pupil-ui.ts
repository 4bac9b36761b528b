import { cx } from "@/lib/cx";

/**
 * Button looks for the pupil page, matching the staff app's buttons (components/ui/button.tsx
 * imports the router, which the pupil page must not load). At least 44 px tall.
 */
const VARIANTS = {
  primary: "bg-accent text-on-accent border-accent hover:bg-accent-strong hover:border-accent-strong",
  secondary: "bg-surface text-ink border-line-strong hover:bg-sunken",
  quiet: "bg-transparent text-accent border-transparent hover:bg-accent-soft underline",
} as const;

export function pupilButton(variant: keyof typeof VARIANTS = "secondary", extra?: string) {
  return cx(
    "inline-flex min-h-touch items-center justify-center gap-2 rounded-control border-2 px-4 text-base font-bold leading-tight",
    "cursor-pointer select-none transition-colors disabled:cursor-not-allowed disabled:opacity-60",
    VARIANTS[variant],
    extra,
  );
}

export const CARD = "rounded-card border border-line bg-surface p-4 shadow-card";

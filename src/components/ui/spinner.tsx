import { cx } from "@/lib/cx";

/** A turning arc; decorative, so always paired with words. */
export function Spinner({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 24 24" className={cx("animate-spin shrink-0", className ?? "size-6")} aria-hidden="true" focusable="false">
      <circle cx="12" cy="12" r="9" fill="none" stroke="currentColor" strokeOpacity="0.25" strokeWidth="3" />
      <path d="M21 12a9 9 0 0 0-9-9" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
    </svg>
  );
}

/** A spinner with a sentence saying what is loading, announced politely. */
export function LoadingState({ label, className }: { label: string; className?: string }) {
  return (
    <div role="status" className={cx("flex items-center gap-3 py-8 text-ink-muted", className)}>
      <Spinner className="size-6 text-accent" />
      <span>{label}</span>
    </div>
  );
}

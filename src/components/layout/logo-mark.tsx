import { cx } from "@/lib/cx";

/**
 * Linkleap's mark: a chain of links rising out of a pot and arcing down past it. Drawn in the
 * accent colour with the paper colour inside, so it follows the theme. The favicon in
 * index.html is the same drawing with fixed colours.
 */
export function LogoMark({ className }: { className?: string }) {
  return (
    <svg viewBox="0 0 32 32" className={cx("shrink-0", className ?? "size-9")} aria-hidden="true" focusable="false">
      <rect width="32" height="32" rx="8" className="fill-accent" />
      <path d="M5.5 18.5v6.5a1.5 1.5 0 0 0 1.5 1.5h6a1.5 1.5 0 0 0 1.5-1.5v-6.5" fill="none" strokeWidth="2.4" strokeLinecap="round" strokeLinejoin="round" className="stroke-on-accent" />
      <path d="M10 22C10 4.5 24 4 26 27" fill="none" strokeWidth="3" strokeLinecap="round" strokeDasharray="2.6 2.4" className="stroke-on-accent" />
    </svg>
  );
}

/** The mark and the product name, as one link home. */
export function Wordmark({ className }: { className?: string }) {
  return (
    <span className={cx("inline-flex items-center gap-2.5 text-xl font-bold tracking-tight", className)}>
      <LogoMark />
      <span>Linkleap</span>
    </span>
  );
}

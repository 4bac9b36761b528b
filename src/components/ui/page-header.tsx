import type { ReactNode } from "react";
import { cx } from "@/lib/cx";

/** The page's one h1 (focused after navigation, hence tabIndex -1), a line of context and the page's main actions. */
export function PageHeader({ title, eyebrow, description, actions, className }: {
  title: ReactNode;
  eyebrow?: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  className?: string;
}) {
  return (
    <div className={cx("mb-6 flex flex-col gap-4 sm:mb-8 sm:flex-row sm:items-end sm:justify-between", className)}>
      <div className="min-w-0">
        {eyebrow ? <div className="mb-1 text-sm font-bold text-ink-muted">{eyebrow}</div> : null}
        <h1 tabIndex={-1} className="text-3xl font-bold leading-tight text-balance break-words focus:outline-none sm:text-4xl">
          {title}
        </h1>
        {description ? <div className="mt-2 max-w-prose text-lg text-ink-muted">{description}</div> : null}
      </div>
      {actions ? <div className="flex shrink-0 flex-wrap gap-3">{actions}</div> : null}
    </div>
  );
}

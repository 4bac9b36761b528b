import { useId, type ReactNode } from "react";
import { cx } from "@/lib/cx";

/** A card with an h2, labelled by it so screen-reader users can jump between sections. */
export function Section({ title, description, actions, children, className, tone = "plain" }: {
  title: ReactNode;
  description?: ReactNode;
  actions?: ReactNode;
  children: ReactNode;
  className?: string;
  tone?: "plain" | "danger";
}) {
  const id = useId();
  return (
    <section
      aria-labelledby={id}
      className={cx(
        "rounded-card border bg-surface p-4 shadow-card sm:p-6",
        tone === "danger" ? "border-danger/40" : "border-line",
        className,
      )}
    >
      <div className="mb-4 flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0">
          <h2 id={id} className="text-xl font-bold">
            {title}
          </h2>
          {description ? <div className="mt-1 text-ink-muted">{description}</div> : null}
        </div>
        {actions ? <div className="flex flex-wrap gap-3">{actions}</div> : null}
      </div>
      {children}
    </section>
  );
}

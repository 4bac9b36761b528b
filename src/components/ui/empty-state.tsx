import type { ReactNode } from "react";
import { cx } from "@/lib/cx";

/** Nothing to show yet: say so plainly and offer the next step. */
export function EmptyState({ icon, title, children, action, className }: {
  icon?: ReactNode;
  title: string;
  children?: ReactNode;
  action?: ReactNode;
  className?: string;
}) {
  return (
    <div className={cx("rounded-card border-2 border-dashed border-line bg-surface/60 px-5 py-8 text-center", className)}>
      {icon ? <div className="mx-auto mb-3 flex size-12 items-center justify-center rounded-full bg-sunken text-ink-muted">{icon}</div> : null}
      <p className="text-lg font-bold">{title}</p>
      {children ? <div className="mx-auto mt-1 max-w-prose text-ink-muted">{children}</div> : null}
      {action ? <div className="mt-5 flex justify-center">{action}</div> : null}
    </div>
  );
}

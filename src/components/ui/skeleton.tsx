import { cx } from "@/lib/cx";

/** Grey placeholder blocks in the shape of what is coming, with a hidden sentence for screen readers. */
export function SkeletonList({ rows = 3, label, className }: { rows?: number; label: string; className?: string }) {
  return (
    <div role="status" className={cx("grid gap-3", className)}>
      <span className="sr-only">{label}</span>
      {Array.from({ length: rows }, (_, i) => (
        <div key={i} aria-hidden="true" className="rounded-card border border-line bg-surface p-4">
          <div className="h-5 w-2/5 animate-pulse rounded bg-sunken" />
          <div className="mt-3 h-4 w-3/5 animate-pulse rounded bg-sunken" />
        </div>
      ))}
    </div>
  );
}

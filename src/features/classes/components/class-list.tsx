import { Link } from "react-router";
import type { ClassSummary } from "@contracts/classes";
import { Badge } from "@/components/ui/badge";
import { ArchiveIcon, ChevronRightIcon, PeopleIcon } from "@/components/ui/icons";
import { cx } from "@/lib/cx";
import { rosterCountLabel } from "../utils/class-form";

/** Classes as a list of cards; each whole card is one link to the class. */
export function ClassList({ classes, showTeacher = false, highlightId, className }: {
  classes: readonly ClassSummary[];
  showTeacher?: boolean;
  /** A class just created: marked so it can be found at a glance. */
  highlightId?: string | null;
  className?: string;
}) {
  return (
    <ul className={cx("grid gap-3 md:grid-cols-2", className)}>
      {classes.map((item) => (
        <li key={item.id}>
          <Link
            to={`/classes/${item.id}`}
            className={cx(
              "group flex h-full items-center gap-4 rounded-card border-2 bg-surface p-4 no-underline shadow-card hover:border-accent",
              item.id === highlightId ? "border-ok" : "border-line",
            )}
          >
            <span className="min-w-0 flex-1">
              <span className="flex flex-wrap items-center gap-2">
                <span className="text-lg font-bold text-ink group-hover:underline">{item.name}</span>
                {item.archivedAt ? (
                  <Badge icon={<ArchiveIcon className="size-4" />} tone="warn">
                    Archived
                  </Badge>
                ) : null}
                {item.id === highlightId ? <Badge tone="accent">New</Badge> : null}
              </span>
              <span className="mt-0.5 block text-ink-muted">
                {item.yearGroup} · {item.subject}
                {showTeacher ? ` · ${item.teacher.displayName}` : ""}
              </span>
              <span className="mt-1.5 flex items-center gap-1.5 text-sm text-ink-muted">
                <PeopleIcon className="size-4" />
                {rosterCountLabel(item.rosterCount)}
              </span>
            </span>
            <ChevronRightIcon className="size-6 text-accent" />
          </Link>
        </li>
      ))}
    </ul>
  );
}

import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { ErrorState } from "@/components/ui/error-state";
import { ArchiveIcon, PeopleIcon } from "@/components/ui/icons";
import { SkeletonList } from "@/components/ui/skeleton";
import { useSchoolClasses } from "../api/get-school-classes";
import { DeletePupilDataButton } from "./delete-pupil-data-button";

/** Every class of the school with how much pupil data it holds, and a way to delete it now. */
export function SchoolClassesData() {
  const query = useSchoolClasses();
  if (query.isPending) return <SkeletonList rows={3} label="Loading the school's classes…" />;
  if (query.isError) {
    return <ErrorState title="Could not load the classes" error={query.error} onRetry={() => void query.refetch()} retrying={query.isFetching} />;
  }
  if (query.data.length === 0) {
    return (
      <EmptyState icon={<PeopleIcon />} title="No classes yet">
        When teachers create classes, they are listed here.
      </EmptyState>
    );
  }
  return (
    <ul className="grid gap-3">
      {query.data.map((item) => (
        <li key={item.id} className="flex flex-wrap items-center justify-between gap-3 rounded-card border border-line p-4">
          <div className="min-w-0">
            <p className="flex flex-wrap items-center gap-2 font-bold">
              {item.name}
              {item.archivedAt ? (
                <Badge tone="warn" icon={<ArchiveIcon className="size-4" />}>
                  Archived
                </Badge>
              ) : null}
            </p>
            <p className="text-sm text-ink-muted">
              {item.teacher.displayName} · {item.yearGroup} ·{" "}
              <span className="font-mono font-bold text-ink">{item.rosterCount}</span> {item.rosterCount === 1 ? "roster name" : "roster names"}
            </p>
          </div>
          {/* Kept after a deletion (count 0), so its "deleted" message stays in view. */}
          <DeletePupilDataButton classId={item.id} className={item.name} rosterCount={item.rosterCount} />
        </li>
      ))}
    </ul>
  );
}

import { Link } from "react-router";
import type { ArchivedFilter } from "@contracts/classes";
import { Badge } from "@/components/ui/badge";
import { EmptyState } from "@/components/ui/empty-state";
import { ErrorState } from "@/components/ui/error-state";
import { ArchiveIcon, BuildingIcon } from "@/components/ui/icons";
import { SkeletonList } from "@/components/ui/skeleton";
import { useDepartmentClasses } from "../api/get-department-classes";
import { groupByTeacher } from "../utils/group-by-teacher";

/** The department's classes, one table per teacher. Read-only: each class opens in view mode. */
export function DepartmentClasses({ archived, viewerId }: { archived: ArchivedFilter; viewerId: string }) {
  const query = useDepartmentClasses(archived);

  if (query.isPending) return <SkeletonList rows={3} label="Loading the department's classes…" />;
  if (query.isError) {
    return (
      <ErrorState
        title="Could not load the department's classes"
        error={query.error}
        onRetry={() => void query.refetch()}
        retrying={query.isFetching}
      />
    );
  }

  const groups = groupByTeacher(query.data, viewerId);
  if (groups.length === 0) {
    return (
      <EmptyState icon={<BuildingIcon />} title={archived === "only" ? "No archived classes in the department." : "No classes in the department yet."}>
        {archived === "only"
          ? "Classes that teachers archive are listed here."
          : "When teachers in your department create classes, they appear here, grouped by teacher."}
      </EmptyState>
    );
  }

  return (
    <div className="grid min-w-0 gap-6">
      <p className="text-ink-muted">
        <span className="font-mono font-bold text-ink">{query.data.length}</span> {query.data.length === 1 ? "class" : "classes"},{" "}
        <span className="font-mono font-bold text-ink">{groups.length}</span> {groups.length === 1 ? "teacher" : "teachers"}
      </p>
      {groups.map((group) => {
        const headingId = `teacher-${group.teacher.id}`;
        const own = group.teacher.id === viewerId;
        return (
          <section key={group.teacher.id} aria-labelledby={headingId} className="min-w-0 rounded-card border border-line bg-surface shadow-card">
            <h2 id={headingId} className="flex flex-wrap items-baseline gap-x-3 border-b border-line px-4 py-3 text-xl font-bold sm:px-6">
              {group.teacher.displayName}
              {own ? <span className="text-base font-normal text-ink-muted">(you)</span> : null}
              <span className="text-base font-normal text-ink-muted">
                {group.classes.length} {group.classes.length === 1 ? "class" : "classes"}
              </span>
            </h2>
            <div className="overflow-x-auto">
              <table className="w-full min-w-[34rem] text-left">
                <thead className="text-sm text-ink-muted">
                  <tr>
                    <th scope="col" className="px-4 py-2 font-bold sm:px-6">Class</th>
                    <th scope="col" className="px-4 py-2 font-bold">Year group</th>
                    <th scope="col" className="px-4 py-2 font-bold">Subject</th>
                    <th scope="col" className="px-4 py-2 text-right font-bold sm:pr-6">Pupils on roster</th>
                  </tr>
                </thead>
                <tbody>
                  {group.classes.map((item) => (
                    <tr key={item.id} className="border-t border-line">
                      <td className="px-4 py-2 sm:px-6">
                        <span className="flex flex-wrap items-center gap-2">
                          <Link to={`/classes/${item.id}`} className="inline-flex min-h-touch items-center font-bold text-accent underline underline-offset-2">
                            {item.name}
                          </Link>
                          {item.archivedAt ? (
                            <Badge tone="warn" icon={<ArchiveIcon className="size-4" />}>
                              Archived
                            </Badge>
                          ) : null}
                        </span>
                      </td>
                      <td className="px-4 py-2">{item.yearGroup}</td>
                      <td className="px-4 py-2">{item.subject}</td>
                      <td className="px-4 py-2 text-right font-mono sm:pr-6">{item.rosterCount}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
          </section>
        );
      })}
    </div>
  );
}

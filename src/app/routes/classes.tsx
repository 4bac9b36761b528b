import { useState } from "react";
import { Link } from "react-router";
import type { ClassSummary } from "@contracts/classes";
import { ArchivedFilterBar } from "@/components/ui/archived-filter-bar";
import { EmptyState } from "@/components/ui/empty-state";
import { ErrorState } from "@/components/ui/error-state";
import { ArchiveIcon, PeopleIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { SkeletonList } from "@/components/ui/skeleton";
import { useClasses } from "@/features/classes/api/get-classes";
import { ClassList } from "@/features/classes/components/class-list";
import { NewClassAction } from "@/features/classes/components/create-class-dialog";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { useArchivedFilterParam } from "@/hooks/use-archived-filter-param";
import { RequireRole } from "../layouts/require-role";

export function Component() {
  useDocumentTitle("Your classes");
  return (
    <RequireRole roles={["teacher", "head_of_department"]} forWhom="teachers and heads of department">
      <ClassesPage />
    </RequireRole>
  );
}

function ClassesPage() {
  const [filter, setFilter] = useArchivedFilterParam();
  const classes = useClasses(filter);
  const [created, setCreated] = useState<ClassSummary | null>(null);

  return (
    <>
      <PageHeader
        title="Your classes"
        description="Each class keeps its roster of pupils’ display names."
        actions={
          <NewClassAction
            onCreated={(item) => {
              setCreated(item);
              // A new class is current: make sure the list shows it.
              if (filter === "only") setFilter("exclude");
            }}
          />
        }
      />
      <ArchivedFilterBar
        value={filter}
        onChange={(next) => {
          setCreated(null);
          setFilter(next);
        }}
      />

      {created ? (
        <Notice tone="ok" live="status" className="mb-5">
          <p>
            Created <Link to={`/classes/${created.id}`} className="font-bold text-accent underline">{created.name}</Link>. Open it to add
            its roster.
          </p>
        </Notice>
      ) : null}

      {classes.isPending ? (
        <SkeletonList rows={4} label="Loading your classes…" className="md:grid-cols-2" />
      ) : classes.isError ? (
        <ErrorState title="Could not load your classes" error={classes.error} onRetry={() => void classes.refetch()} retrying={classes.isFetching} />
      ) : classes.data.length === 0 ? (
        filter === "only" ? (
          <EmptyState icon={<ArchiveIcon />} title="No archived classes">
            When a class has finished, archive it from its page. It is kept here and can be restored.
          </EmptyState>
        ) : (
          <EmptyState icon={<PeopleIcon />} title="No classes yet" action={<NewClassAction />}>
            Create a class for each group you teach, then add its roster.
          </EmptyState>
        )
      ) : (
        <>
          <p className="mb-3 text-ink-muted" aria-live="polite">
            <span className="font-mono font-bold text-ink">{classes.data.length}</span>{" "}
            {classes.data.length === 1 ? "class" : "classes"}
          </p>
          <ClassList classes={classes.data} highlightId={created?.id} />
        </>
      )}
    </>
  );
}

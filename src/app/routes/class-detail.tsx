import { lazy, Suspense, useState } from "react";
import { ErrorBoundary } from "react-error-boundary";
import { useQueryClient } from "@tanstack/react-query";
import { Link, useParams } from "react-router";
import type { ClassSummary } from "@contracts/classes";
import { Badge } from "@/components/ui/badge";
import { ButtonLink } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/error-state";
import { ArchiveIcon, ArrowLeftIcon, LockIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { UnsavedChangesDialog } from "@/components/ui/unsaved-changes-dialog";
import { classKeys } from "@/features/classes/api/class-keys";
import { useClass } from "@/features/classes/api/get-class";
import { ArchiveClassSection } from "@/features/classes/components/archive-class-section";
import { ClassDetailsSection } from "@/features/classes/components/class-details-section";
import { RosterSection } from "@/features/classes/components/roster-section";
import { usePlans } from "@/features/lesson-plans/api/get-plans";
import { LiveLessonsSection } from "@/features/live-lessons/components/live-lessons-section";
import { DeletePupilDataButton } from "@/features/pupil-data/components/delete-pupil-data-button";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { useUnsavedChanges } from "@/hooks/use-unsaved-changes";
import { isApiError } from "@/lib/api-client";
import { RequireRole } from "../layouts/require-role";

// The chart and drawing libraries load only when a class page shows its real runs.
const RealRunsSection = lazy(() => import("@/features/bench/components/real-runs-section"));

export function Component() {
  return (
    <RequireRole roles={["teacher", "head_of_department"]} forWhom="teachers and heads of department">
      <ClassPage />
    </RequireRole>
  );
}

function ClassPage() {
  const { classId = "" } = useParams();
  const query = useClass(classId);
  useDocumentTitle(query.data?.name ?? "Class");

  if (query.isPending) {
    return (
      <>
        <BackLink access="owner" />
        <SkeletonList rows={3} label="Loading the class…" className="mt-4" />
      </>
    );
  }
  if (query.isError) {
    const notFound = isApiError(query.error) && query.error.status === 404;
    return (
      <div className="max-w-prose">
        <BackLink access="owner" />
        <PageHeader title={notFound ? "Class not found" : "Could not load this class"} className="mt-4" />
        {notFound ? (
          <p className="text-lg">This class does not exist, or it is not one of yours. Pick one from your classes.</p>
        ) : (
          <ErrorState title="Could not load this class" error={query.error} onRetry={() => void query.refetch()} retrying={query.isFetching} />
        )}
      </div>
    );
  }
  // Keyed by id: moving to another class starts with fresh forms.
  return <ClassView key={query.data.id} item={query.data} />;
}

function BackLink({ access }: { access: ClassSummary["access"] }) {
  return access === "department" ? (
    <ButtonLink to="/department" variant="quiet" icon={<ArrowLeftIcon />} className="-ml-3">
      Department classes
    </ButtonLink>
  ) : (
    <ButtonLink to="/classes" variant="quiet" icon={<ArrowLeftIcon />} className="-ml-3">
      Your classes
    </ButtonLink>
  );
}

function ClassView({ item }: { item: ClassSummary }) {
  const [detailsDirty, setDetailsDirty] = useState(false);
  const [rosterDirty, setRosterDirty] = useState(false);
  const blocker = useUnsavedChanges(detailsDirty || rosterDirty);
  const readOnly = item.access === "department";
  // Plans to start a lesson from (the section offers them only to the class's teacher).
  const plans = usePlans();

  return (
    <>
      <BackLink access={item.access} />
      <PageHeader
        className="mt-2"
        eyebrow="Class"
        title={item.name}
        description={
          <span className="flex flex-wrap items-center gap-2">
            <span>
              {item.yearGroup} · {item.subject}
            </span>
            {item.archivedAt ? (
              <Badge tone="warn" icon={<ArchiveIcon className="size-4" />}>
                Archived
              </Badge>
            ) : null}
            {readOnly ? (
              <Badge icon={<LockIcon className="size-4" />}>Read-only</Badge>
            ) : null}
          </span>
        }
      />
      {readOnly ? (
        <Notice tone="info" className="mb-6">
          <p>
            You are looking at {item.teacher.displayName}’s class as head of department. Only {item.teacher.displayName} can
            change it.
          </p>
        </Notice>
      ) : null}
      <div className="grid gap-6">
        <LiveLessonsSection item={item} plans={plans.data} />
        <ClassDetailsSection item={item} onDirtyChange={setDetailsDirty} />
        <RosterSection item={item} onDirtyChange={setRosterDirty} />
        {/* A failed chunk or a drawing error stays inside the section: the roster above still works. */}
        <ErrorBoundary
          fallbackRender={({ error, resetErrorBoundary }) => (
            <ErrorState title="Could not show the real runs" error={error} onRetry={resetErrorBoundary} />
          )}
        >
          <Suspense fallback={<SkeletonList rows={2} label="Loading the real runs…" />}>
            <RealRunsSection item={item} />
          </Suspense>
        </ErrorBoundary>
        {readOnly ? null : <ArchiveClassSection item={item} />}
        {readOnly ? null : <PupilDataSection item={item} />}
      </div>
      <UnsavedChangesDialog blocker={blocker} />
    </>
  );
}

/** The owner's "delete this class's pupil data now"; the roster on this page refreshes after. */
function PupilDataSection({ item }: { item: ClassSummary }) {
  const queryClient = useQueryClient();
  return (
    <Section
      tone="danger"
      title="Pupil data"
      description={
        <>
          Pupil data is deleted automatically once the school’s retention period has passed. You can delete this class’s now,
          for example when a class has left. <Link to="/privacy">What is stored, and for how long</Link>.
        </>
      }
    >
      <DeletePupilDataButton
        classId={item.id}
        className={item.name}
        rosterCount={item.rosterCount}
        onDeleted={() => void queryClient.invalidateQueries({ queryKey: classKeys.detail(item.id) })}
      />
    </Section>
  );
}

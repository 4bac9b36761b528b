import { useState } from "react";
import { Navigate } from "react-router";
import type { ClassSummary } from "@contracts/classes";
import { ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { ErrorState } from "@/components/ui/error-state";
import { PeopleIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { useClasses } from "@/features/classes/api/get-classes";
import { ClassList } from "@/features/classes/components/class-list";
import { NewClassAction } from "@/features/classes/components/create-class-dialog";
import { DepartmentShortcut } from "@/features/home/components/department-shortcut";
import { Guides } from "@/features/home/components/guides";
import { firstNameOf, greetingFor } from "@/features/home/utils/greeting";
import { usePlans } from "@/features/lesson-plans/api/get-plans";
import { PlansGlance } from "@/features/lesson-plans/components/plans-glance";
import { OpenLessons } from "@/features/live-lessons/components/open-lessons";
import { QuickStartAction } from "@/features/live-lessons/components/quick-start-dialog";
import { RecentLessons } from "@/features/live-lessons/components/recent-lessons";
import { usePlannedLessons } from "@/features/planned-lessons/api/get-planned-lessons";
import { UpcomingLessons } from "@/features/planned-lessons/components/upcoming-lessons";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { useMe } from "../use-me";

export function Component() {
  const me = useMe();
  useDocumentTitle("Home");
  // A school admin's work is the staff list.
  if (me.role === "admin") return <Navigate to="/staff" replace />;
  return <TeacherHome />;
}

function TeacherHome() {
  const me = useMe();
  const classes = useClasses("exclude");
  const plans = usePlans();
  const planned = usePlannedLessons();
  const [created, setCreated] = useState<ClassSummary | null>(null);
  // Only the teacher's own current classes can start a lesson (a head of department also sees others').
  const ownClasses = (classes.data ?? []).filter((c) => c.access === "owner" && !c.archivedAt).map((c) => ({ id: c.id, name: c.name }));
  // Colleagues' shared plans carry their owner's name, so two plans of the same title stay apart.
  const planOptions = (plans.data ?? []).map((p) => ({ id: p.id, title: p.mine ? p.title : `${p.title} (${p.ownerName})` }));

  return (
    <>
      <PageHeader
        eyebrow={me.school.name}
        title={`${greetingFor(new Date().getHours())}, ${firstNameOf(me.displayName)}`}
        description="Your next lessons, classes and plans at a glance."
        actions={
          <QuickStartAction
            classes={ownClasses.map((c) => ({ id: c.id, label: c.name }))}
            plans={planOptions.map((p) => ({ id: p.id, label: p.title }))}
            suggestedClassId={planned.data?.[0]?.classId ?? null}
          />
        }
      />
      <OpenLessons />
      <div className="grid gap-6 lg:grid-cols-[minmax(0,2fr)_minmax(0,1fr)]">
        <div className="grid content-start gap-6">
          <UpcomingLessons classes={ownClasses} plans={planOptions} />
          <Section
            title="Your classes"
            actions={
              <>
                <NewClassAction onCreated={setCreated} />
                <ButtonLink to="/classes" variant="quiet">
                  All classes
                </ButtonLink>
              </>
            }
          >
            {created ? (
              <Notice tone="ok" live="status" className="mb-4">
                <p>Created {created.name}. It is now in your classes below.</p>
              </Notice>
            ) : null}
            {classes.isPending ? (
              <SkeletonList rows={2} label="Loading your classes…" />
            ) : classes.isError ? (
              <ErrorState
                title="Could not load your classes"
                error={classes.error}
                onRetry={() => void classes.refetch()}
                retrying={classes.isFetching}
              />
            ) : classes.data.length === 0 ? (
              <EmptyState icon={<PeopleIcon />} title="No classes yet">
                Create your first class with “New class”, then add its roster.
              </EmptyState>
            ) : (
              <ClassList classes={classes.data} highlightId={created?.id} className="md:grid-cols-1 xl:grid-cols-2" />
            )}
          </Section>
        </div>
        <div className="grid content-start gap-6">
          <RecentLessons />
          <PlansGlance />
          {me.role === "head_of_department" ? <DepartmentShortcut departmentName={me.department?.name ?? null} /> : null}
          <Guides />
        </div>
      </div>
    </>
  );
}

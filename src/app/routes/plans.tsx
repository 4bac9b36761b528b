import { useState } from "react";
import type { LessonPlanListItem } from "@contracts/lesson-plans";
import { ButtonLink } from "@/components/ui/button";
import { EmptyState } from "@/components/ui/empty-state";
import { ErrorState } from "@/components/ui/error-state";
import { ListIcon, PlusIcon } from "@/components/ui/icons";
import { PageHeader } from "@/components/ui/page-header";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { usePlans } from "@/features/lesson-plans/api/get-plans";
import { PlanList } from "@/features/lesson-plans/components/plan-list";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { RequireRole } from "../layouts/require-role";
import { StartFromPlanDialog } from "../plans/start-from-plan-dialog";

export function Component() {
  useDocumentTitle("Lesson plans");
  return (
    <RequireRole roles={["teacher", "head_of_department"]} forWhom="teachers and heads of department">
      <PlansPage />
    </RequireRole>
  );
}

function PlansPage() {
  const plans = usePlans();
  const [starting, setStarting] = useState<LessonPlanListItem | null>(null);
  const newPlan = (
    <ButtonLink to="/plans/new" variant="primary" icon={<PlusIcon />}>
      New plan
    </ButtonLink>
  );

  const mine = plans.data?.filter((p) => p.mine) ?? [];
  const shared = plans.data?.filter((p) => !p.mine) ?? [];
  return (
    <>
      <PageHeader
        title="Lesson plans"
        description="A plan is a list of trials, each with its set-up and question, ready to start as a live lesson with any of your classes."
        actions={newPlan}
      />
      {plans.isPending ? (
        <SkeletonList rows={4} label="Loading the plans…" className="md:grid-cols-2" />
      ) : plans.isError ? (
        <ErrorState title="Could not load the plans" error={plans.error} onRetry={() => void plans.refetch()} retrying={plans.isFetching} />
      ) : (
        <div className="grid gap-6">
          <Section title="Your plans">
            {mine.length === 0 ? (
              <EmptyState icon={<ListIcon />} title="No plans of your own yet" action={newPlan}>
                Make a plan, or duplicate one of your department’s below and change it.
              </EmptyState>
            ) : (
              <PlanList plans={mine} label="Your plans, most recently changed first" onStart={setStarting} />
            )}
          </Section>
          <Section title="Shared in your department" description="Colleagues’ plans: open, start or duplicate them; only their owner can change them.">
            {shared.length === 0 ? (
              <p className="text-ink-muted">No colleague has shared a plan yet.</p>
            ) : (
              <PlanList plans={shared} label="Plans shared in your department" onStart={setStarting} />
            )}
          </Section>
        </div>
      )}
      <StartFromPlanDialog plan={starting} onClose={() => setStarting(null)} />
    </>
  );
}

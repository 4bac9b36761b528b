import { useState } from "react";
import { Link, useNavigate, useParams } from "react-router";
import { Button } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/error-state";
import { ArrowLeftIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { PageHeader } from "@/components/ui/page-header";
import { SkeletonList } from "@/components/ui/skeleton";
import { useDuplicatePlan } from "@/features/lesson-plans/api/duplicate-plan";
import { usePlan } from "@/features/lesson-plans/api/get-plan";
import { PlanEditor } from "@/features/lesson-plans/components/plan-editor";
import { PlanView } from "@/features/lesson-plans/components/plan-view";
import { useDocumentTitle } from "@/hooks/use-document-title";
import { errorMessage } from "@/lib/api-client";
import type { AppNavigationState } from "@/lib/navigation-state";
import { RequireRole } from "../layouts/require-role";
import { StartFromPlanDialog } from "../plans/start-from-plan-dialog";
import { useMe } from "../use-me";

export function Component() {
  return (
    <RequireRole roles={["teacher", "head_of_department"]} forWhom="teachers and heads of department">
      <PlanPage />
    </RequireRole>
  );
}

function BackLink() {
  return (
    <Link to="/plans" className="mb-3 inline-flex min-h-touch items-center gap-1.5 font-bold">
      <ArrowLeftIcon className="size-5" /> Lesson plans
    </Link>
  );
}

/** `/plans/new` and `/plans/:planId`: the editor for your own plans, a read-only view of a colleague's shared one. */
function PlanPage() {
  const { planId = null } = useParams();
  const plan = usePlan(planId);
  const navigate = useNavigate();
  const duplicate = useDuplicatePlan();
  const me = useMe();
  const [starting, setStarting] = useState(false);
  useDocumentTitle(planId === null ? "New lesson plan" : (plan.data?.title ?? "Lesson plan"));

  if (planId === null) {
    return (
      <>
        <BackLink />
        <PageHeader title="New lesson plan" description="Add the trials in the order you will run them. Each shows a sketch of its set-up and the theory’s value." />
        <PlanEditor
          plan={null}
          departmentName={me.department?.name ?? null}
          onSaved={(saved) =>
            // Saved: the guard may pass, and the address becomes the plan's own.
            void navigate(`/plans/${saved.id}`, { replace: true, state: { leaveUnsaved: true } satisfies AppNavigationState })
          }
        />
      </>
    );
  }
  if (plan.isPending) {
    return (
      <>
        <BackLink />
        <SkeletonList rows={3} label="Loading the plan…" />
      </>
    );
  }
  if (plan.isError) {
    return (
      <>
        <BackLink />
        <ErrorState title="Could not open this plan" error={plan.error} onRetry={() => void plan.refetch()} retrying={plan.isFetching} />
      </>
    );
  }
  const data = plan.data;
  const startButton = (
    <Button variant="primary" onClick={() => setStarting(true)}>
      Start a lesson
    </Button>
  );
  return (
    <>
      <BackLink />
      {data.mine ? (
        <>
          <PageHeader title={data.title} eyebrow="Lesson plan" actions={startButton} />
          <PlanEditor key={data.id} plan={data} departmentName={me.department?.name ?? null} onSaved={() => undefined} />
        </>
      ) : (
        <>
          <PageHeader
            title={data.title}
            eyebrow={`Shared by ${data.ownerName}`}
            actions={
              <>
                {startButton}
                <Button
                  busy={duplicate.isPending}
                  onClick={() => duplicate.mutate(data.id, { onSuccess: (copy) => void navigate(`/plans/${copy.id}`) })}
                >
                  Duplicate to edit
                </Button>
              </>
            }
          />
          <Notice tone="info" className="mb-6">
            <p>This plan is {data.ownerName}’s. You can start lessons with it; to change it, duplicate it and edit your copy.</p>
          </Notice>
          {duplicate.isError ? (
            <Notice tone="danger" live="alert" className="mb-6">
              <p>Could not duplicate the plan: {errorMessage(duplicate.error)}</p>
            </Notice>
          ) : null}
          <PlanView plan={data} />
        </>
      )}
      <StartFromPlanDialog plan={starting ? data : null} onClose={() => setStarting(false)} />
    </>
  );
}

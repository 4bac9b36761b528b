import { useState } from "react";
import { Link, useNavigate } from "react-router";
import type { LessonPlanListItem } from "@contracts/lesson-plans";
import { Badge } from "@/components/ui/badge";
import { Button, ButtonLink } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { PeopleIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { errorMessage } from "@/lib/api-client";
import { useDeletePlan } from "../api/delete-plan";
import { useDuplicatePlan } from "../api/duplicate-plan";
import { formatPlanDate } from "../utils/format-plan-date";
import { formatTheory } from "./theory-value";

/**
 * Plans as cards: title, trials and rigs, when it last changed, and whether it is shared. The
 * owner can edit and delete; anyone who sees it can duplicate it and start a lesson with it.
 */
export function PlanList({ plans, label, onStart }: {
  plans: readonly LessonPlanListItem[];
  label: string;
  /** Start a live lesson from this plan (the page asks which class). */
  onStart: (plan: LessonPlanListItem) => void;
}) {
  const navigate = useNavigate();
  const duplicate = useDuplicatePlan();
  const remove = useDeletePlan();
  const [deleting, setDeleting] = useState<LessonPlanListItem | null>(null);

  return (
    <>
      {duplicate.isError ? (
        <Notice tone="danger" live="alert" className="mb-4">
          <p>Could not duplicate the plan: {errorMessage(duplicate.error)}</p>
        </Notice>
      ) : null}
      <ul className="grid gap-3 md:grid-cols-2" aria-label={label}>
        {plans.map((plan) => (
          <li key={plan.id} className="flex flex-col gap-3 rounded-card border-2 border-line bg-surface p-4 shadow-card" data-testid="plan-card">
            <div className="min-w-0">
              <p className="flex flex-wrap items-center gap-2">
                <Link to={`/plans/${plan.id}`} className="text-lg font-bold text-ink">
                  {plan.title}
                </Link>
                {plan.shared ? (
                  <Badge tone="accent" icon={<PeopleIcon className="size-4" />}>
                    Shared
                  </Badge>
                ) : null}
              </p>
              <p className="text-ink-muted">
                {plan.trialCount} trial{plan.trialCount === 1 ? "" : "s"} · {plan.rigs.join(", ")}
              </p>
              <p className="text-sm text-ink-muted">
                {plan.mine ? "Yours" : `By ${plan.ownerName}`} · changed {formatPlanDate(plan.updatedAt)}
              </p>
              <ol className="mt-2 grid gap-0.5 text-sm">
                {plan.trials.slice(0, 4).map((t, i) => (
                  <li key={i} className="truncate">
                    {i + 1}. {t.prompt}
                    {t.theory ? <span className="text-ink-muted"> · theory {formatTheory(t.theory)}</span> : null}
                  </li>
                ))}
                {plan.trials.length > 4 ? <li className="text-ink-muted">and {plan.trials.length - 4} more</li> : null}
              </ol>
            </div>
            <div className="mt-auto flex flex-wrap gap-2">
              <Button variant="primary" onClick={() => onStart(plan)} aria-label={`Start a lesson from ${plan.title}`}>
                Start a lesson
              </Button>
              <ButtonLink to={`/plans/${plan.id}`} aria-label={`${plan.mine ? "Edit" : "Open"} ${plan.title}`}>
                {plan.mine ? "Edit" : "Open"}
              </ButtonLink>
              <Button
                variant="quiet"
                busy={duplicate.isPending && duplicate.variables === plan.id}
                onClick={() => duplicate.mutate(plan.id, { onSuccess: (copy) => void navigate(`/plans/${copy.id}`) })}
                aria-label={`Duplicate ${plan.title}`}
              >
                Duplicate
              </Button>
              {plan.mine ? (
                <Button variant="quiet" onClick={() => setDeleting(plan)} aria-label={`Delete ${plan.title}`}>
                  Delete
                </Button>
              ) : null}
            </div>
          </li>
        ))}
      </ul>
      <ConfirmDialog
        open={deleting !== null}
        title={`Delete “${deleting?.title ?? ""}”?`}
        confirmLabel="Delete plan"
        tone="danger"
        busy={remove.isPending}
        error={remove.error}
        onCancel={() => {
          remove.reset();
          setDeleting(null);
        }}
        onConfirm={() => deleting && remove.mutate(deleting.id, { onSuccess: () => setDeleting(null) })}
      >
        <p>
          The plan goes for good{deleting?.shared ? ", and colleagues in your department will no longer see it" : ""}. Lessons already run with it
          keep their trials.
        </p>
      </ConfirmDialog>
    </>
  );
}

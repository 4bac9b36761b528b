import { Link } from "react-router";
import { Badge } from "@/components/ui/badge";
import { ButtonLink } from "@/components/ui/button";
import { ErrorState } from "@/components/ui/error-state";
import { ListIcon, PlusIcon } from "@/components/ui/icons";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { usePlans } from "../api/get-plans";

const SHOWN = 4;

/** Home's short list of plans (the teacher's own first), with the way to all of them and to a new one. */
export function PlansGlance() {
  const plans = usePlans();
  const sorted = [...(plans.data ?? [])].sort((a, b) => Number(b.mine) - Number(a.mine));
  return (
    <Section
      title="Lesson plans"
      actions={
        <ButtonLink to="/plans/new" variant="quiet" icon={<PlusIcon />}>
          New plan
        </ButtonLink>
      }
    >
      {plans.isPending ? (
        <SkeletonList rows={2} label="Loading plans…" />
      ) : plans.isError ? (
        <ErrorState title="Could not load the plans" error={plans.error} onRetry={() => void plans.refetch()} retrying={plans.isFetching} />
      ) : sorted.length === 0 ? (
        <div className="flex items-start gap-3 rounded-control border-2 border-dashed border-line px-4 py-5">
          <ListIcon className="mt-0.5 size-6 shrink-0 text-ink-muted" />
          <p>No plans yet. A plan keeps a lesson's trials in order, ready to run again with any class.</p>
        </div>
      ) : (
        <>
          <ul className="grid gap-2" aria-label="Lesson plans">
            {sorted.slice(0, SHOWN).map((plan) => (
              <li key={plan.id}>
                <Link
                  to={`/plans/${plan.id}`}
                  className="block rounded-control border border-line px-3 py-2 hover:border-accent hover:bg-sunken focus-visible:outline-2"
                >
                  <span className="flex flex-wrap items-center gap-2 font-bold">
                    {plan.title}
                    {plan.mine ? (plan.shared ? <Badge>Shared</Badge> : null) : <Badge tone="accent">{plan.ownerName}</Badge>}
                  </span>
                  <span className="block text-ink-muted">
                    {plan.trialCount} trial{plan.trialCount === 1 ? "" : "s"} · {[...new Set(plan.trials.map((t) => t.rigLabel))].join(", ")}
                  </span>
                </Link>
              </li>
            ))}
          </ul>
          <ButtonLink to="/plans" variant="quiet" className="mt-3">
            All plans ({sorted.length})
          </ButtonLink>
        </>
      )}
    </Section>
  );
}

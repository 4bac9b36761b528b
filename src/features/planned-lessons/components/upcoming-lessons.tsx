import { useState } from "react";
import { useNavigate } from "react-router";
import type { PlannedLessonItem } from "@contracts/planned-lessons";
import { Button } from "@/components/ui/button";
import { ConfirmDialog } from "@/components/ui/dialog";
import { ErrorState } from "@/components/ui/error-state";
import { ClockIcon, PlusIcon } from "@/components/ui/icons";
import { Notice } from "@/components/ui/notice";
import { Section } from "@/components/ui/section";
import { SkeletonList } from "@/components/ui/skeleton";
import { usePlannedLessons } from "../api/get-planned-lessons";
import { useRemovePlannedLesson } from "../api/remove-planned-lesson";
import { useStartPlannedLesson } from "../api/start-planned-lesson";
import { plannedDayLabel } from "../utils/planned-time";
import { PlanLessonDialog, type ClassOption, type PlanOption } from "./plan-lesson-dialog";

/** Home's "Next lessons": the diary, soonest first, each one click from its board. */
export function UpcomingLessons({ classes, plans }: { classes: ClassOption[]; plans: PlanOption[] }) {
  const planned = usePlannedLessons();
  const start = useStartPlannedLesson();
  const remove = useRemovePlannedLesson();
  const navigate = useNavigate();
  const [adding, setAdding] = useState(false);
  const [removing, setRemoving] = useState<PlannedLessonItem | null>(null);
  const now = new Date();

  return (
    <Section
      title="Next lessons"
      actions={
        classes.length > 0 ? (
          <Button icon={<PlusIcon />} onClick={() => setAdding(true)}>
            Plan a lesson
          </Button>
        ) : null
      }
    >
      {start.isError ? (
        <Notice tone="danger" live="alert" className="mb-4">
          <p>Could not start the lesson: {start.error.message}</p>
        </Notice>
      ) : null}
      {planned.isPending ? (
        <SkeletonList rows={2} label="Loading your next lessons…" />
      ) : planned.isError ? (
        <ErrorState title="Could not load your next lessons" error={planned.error} onRetry={() => void planned.refetch()} retrying={planned.isFetching} />
      ) : planned.data.length === 0 ? (
        <div className="flex items-start gap-3 rounded-control border-2 border-dashed border-line px-4 py-5">
          <ClockIcon className="mt-0.5 size-6 shrink-0 text-ink-muted" />
          <p>
            Nothing planned. {classes.length > 0 ? "Use “Plan a lesson” to put a class and a plan in the diary." : "Create a class first."}
          </p>
        </div>
      ) : (
        <ul className="grid gap-3" aria-label="Next lessons, soonest first">
          {planned.data.map((item) => (
            <li key={item.id} className="flex flex-wrap items-center justify-between gap-3 rounded-control border border-line px-4 py-3">
              <div className="min-w-0">
                <p className="font-bold">
                  {plannedDayLabel(item.plannedFor, now)} · {item.className}
                </p>
                <p className="text-ink-muted">
                  {item.planTitle
                    ? `${item.planTitle} (${item.trialCount ?? 0} trial${item.trialCount === 1 ? "" : "s"})`
                    : item.planId === null
                      ? "No plan: one fountain trial"
                      : "Plan deleted: one fountain trial"}
                </p>
              </div>
              <div className="flex flex-wrap gap-2">
                <Button
                  variant="primary"
                  busy={start.isPending && start.variables === item.id}
                  aria-label={`Start the live lesson with ${item.className}`}
                  onClick={() => start.mutate(item.id, { onSuccess: (started) => void navigate(`/lessons/${started.lessonId}/board`) })}
                >
                  Start
                </Button>
                <Button variant="quiet" aria-label={`Take the ${item.className} lesson off the list`} onClick={() => setRemoving(item)}>
                  Remove
                </Button>
              </div>
            </li>
          ))}
        </ul>
      )}
      <PlanLessonDialog open={adding} onClose={() => setAdding(false)} classes={classes} plans={plans} />
      <ConfirmDialog
        open={removing !== null}
        title="Take this lesson off the list?"
        confirmLabel="Remove"
        tone="danger"
        busy={remove.isPending}
        error={remove.error}
        onCancel={() => {
          remove.reset();
          setRemoving(null);
        }}
        onConfirm={() => removing && remove.mutate(removing.id, { onSuccess: () => setRemoving(null) })}
      >
        <p>
          {removing ? `${removing.className}, ${plannedDayLabel(removing.plannedFor, now)}.` : null} Its plan and the class are kept.
        </p>
      </ConfirmDialog>
    </Section>
  );
}

import { useEffect, useState } from "react";
import { useNavigate } from "react-router";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { SelectField } from "@/components/ui/field";
import { Notice } from "@/components/ui/notice";
import { LoadingState } from "@/components/ui/spinner";
import { useClasses } from "@/features/classes/api/get-classes";
import { useStartLesson } from "@/features/live-lessons/api/start-lesson";
import { ButtonLink } from "@/components/ui/button";
import { errorMessage } from "@/lib/api-client";

/**
 * Starting a live lesson from a plan: pick one of your classes, and the board opens with the
 * plan's trials in order. Composed here because it joins three features (plans, classes, lessons).
 */
export function StartFromPlanDialog({ plan, onClose }: { plan: { id: string; title: string } | null; onClose: () => void }) {
  const classes = useClasses("exclude");
  const own = (classes.data ?? []).filter((c) => c.access === "owner" && !c.archivedAt);
  const [classId, setClassId] = useState("");
  useEffect(() => {
    if (!classId && own[0]) setClassId(own[0].id);
  }, [classId, own]);
  const start = useStartLesson(classId);
  const navigate = useNavigate();

  return (
    <Dialog open={plan !== null} onClose={onClose} title="Start a live lesson" description={plan ? `From the plan “${plan.title}”.` : undefined}>
      {classes.isPending ? (
        <LoadingState label="Loading your classes…" />
      ) : classes.isError ? (
        <Notice tone="danger" live="alert">
          <p>Could not load your classes: {errorMessage(classes.error)}</p>
        </Notice>
      ) : own.length === 0 ? (
        <div className="grid gap-3">
          <p>You have no current classes to teach it to. Create a class first.</p>
          <div>
            <ButtonLink to="/classes">Go to your classes</ButtonLink>
          </div>
        </div>
      ) : (
        <form
          className="grid gap-4"
          onSubmit={(e) => {
            e.preventDefault();
            if (!plan || !classId) return;
            start.mutate({ planId: plan.id }, { onSuccess: (started) => void navigate(`/lessons/${started.lessonId}/board`) });
          }}
        >
          <SelectField label="Class" value={classId} onChange={(e) => setClassId(e.target.value)}>
            {own.map((c) => (
              <option key={c.id} value={c.id}>
                {c.name}
              </option>
            ))}
          </SelectField>
          <p className="text-ink-muted">The board opens on the projector with the plan’s trials, in order. Pupils join with the code it shows.</p>
          {start.isError ? (
            <Notice tone="danger" live="alert">
              <p>Could not start the lesson: {errorMessage(start.error)}</p>
            </Notice>
          ) : null}
          <div className="flex flex-col-reverse gap-3 sm:flex-row sm:justify-end">
            <Button onClick={onClose}>Cancel</Button>
            <Button type="submit" variant="primary" busy={start.isPending}>
              Start the lesson
            </Button>
          </div>
        </form>
      )}
    </Dialog>
  );
}

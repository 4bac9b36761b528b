import { useState, type FormEvent } from "react";
import { useNavigate } from "react-router";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { SelectField } from "@/components/ui/field";
import { FormErrorNotice } from "@/components/ui/notice";
import { errorMessage } from "@/lib/api-client";
import { useStartClassLesson } from "../api/start-lesson";

interface Option {
  id: string;
  label: string;
}

/**
 * Home's "Start a live lesson": the class (the next planned one first) and, optionally, a plan;
 * Start goes straight to the board. Two clicks from home when the suggestion is right.
 */
export function QuickStartAction({ classes, plans, suggestedClassId }: {
  classes: Option[];
  plans: Option[];
  suggestedClassId?: string | null;
}) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button variant="primary" disabled={classes.length === 0} onClick={() => setOpen(true)}>
        Start a live lesson
      </Button>
      {open ? <QuickStartDialog onClose={() => setOpen(false)} classes={classes} plans={plans} suggestedClassId={suggestedClassId ?? null} /> : null}
    </>
  );
}

function QuickStartDialog({ onClose, classes, plans, suggestedClassId }: {
  onClose: () => void;
  classes: Option[];
  plans: Option[];
  suggestedClassId: string | null;
}) {
  const [classId, setClassId] = useState(() => (classes.some((c) => c.id === suggestedClassId) ? suggestedClassId! : classes[0]?.id ?? ""));
  const [planId, setPlanId] = useState("");
  const start = useStartClassLesson();
  const navigate = useNavigate();

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (start.isPending || !classId) return;
    start.mutate({ classId, planId: planId || null }, { onSuccess: (started) => void navigate(`/lessons/${started.lessonId}/board`) });
  };

  return (
    <Dialog open onClose={onClose} title="Start a live lesson" description="The board opens at once; pupils join with the code it shows.">
      <form noValidate onSubmit={submit} className="grid gap-4">
        <SelectField label="Class" value={classId} onChange={(e) => setClassId(e.target.value)}>
          {classes.map((c) => (
            <option key={c.id} value={c.id}>
              {c.label}
            </option>
          ))}
        </SelectField>
        <SelectField label="Plan" hint="Without a plan the lesson starts with one fountain trial, set up on the board." value={planId} onChange={(e) => setPlanId(e.target.value)}>
          <option value="">No plan</option>
          {plans.map((p) => (
            <option key={p.id} value={p.id}>
              {p.label}
            </option>
          ))}
        </SelectField>
        {start.isError ? <FormErrorNotice>Could not start the lesson: {errorMessage(start.error)}</FormErrorNotice> : null}
        <div className="mt-2 flex flex-col-reverse gap-3 sm:flex-row sm:justify-end">
          <Button onClick={onClose}>Cancel</Button>
          <Button type="submit" variant="primary" busy={start.isPending} data-autofocus>
            Start
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

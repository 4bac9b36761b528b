import { useState, type FormEvent } from "react";
import type { FieldErrors } from "@contracts/errors";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { SelectField, TextField } from "@/components/ui/field";
import { FormErrorNotice } from "@/components/ui/notice";
import { errorMessage, isApiError } from "@/lib/api-client";
import { usePlanLesson } from "../api/plan-lesson";
import { defaultPlannedSlot, plannedForIso } from "../utils/planned-time";

export interface ClassOption {
  id: string;
  name: string;
}
export interface PlanOption {
  id: string;
  title: string;
}

/** Puts a lesson in the diary: a class, a day and time, and optionally one of the plans. */
export function PlanLessonDialog({ open, onClose, classes, plans }: {
  open: boolean;
  onClose: () => void;
  classes: ClassOption[];
  plans: PlanOption[];
}) {
  const [classId, setClassId] = useState("");
  const [planId, setPlanId] = useState("");
  const [slot, setSlot] = useState(() => defaultPlannedSlot(new Date()));
  const [errors, setErrors] = useState<FieldErrors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const plan = usePlanLesson();
  const chosenClass = classId || classes[0]?.id || "";

  const close = () => {
    setErrors({});
    setFormError(null);
    plan.reset();
    onClose();
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (plan.isPending) return;
    const plannedFor = plannedForIso(slot.date, slot.time);
    if (!chosenClass || !plannedFor) {
      setErrors({
        ...(chosenClass ? {} : { classId: ["Pick a class."] }),
        ...(plannedFor ? {} : { plannedFor: ["Give the lesson's date and time."] }),
      });
      return;
    }
    setErrors({});
    setFormError(null);
    plan.mutate(
      { classId: chosenClass, planId: planId || null, plannedFor },
      {
        onSuccess: () => {
          setSlot(defaultPlannedSlot(new Date()));
          close();
        },
        onError: (error) => {
          const fields = isApiError(error) ? error.fields : {};
          setErrors(fields);
          const placed = ["classId", "planId", "plannedFor"].some((key) => fields[key]?.length);
          setFormError(placed ? null : errorMessage(error));
        },
      },
    );
  };

  return (
    <Dialog open={open} onClose={close} title="Plan a lesson" description="It appears under “Next lessons”, ready to start on the day.">
      <form noValidate onSubmit={submit} className="grid gap-4">
        <SelectField label="Class" value={chosenClass} onChange={(e) => setClassId(e.target.value)} error={errors.classId?.[0]}>
          {classes.map((c) => (
            <option key={c.id} value={c.id}>
              {c.name}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Plan"
          hint="Without a plan the lesson starts with one fountain trial, set up on the board."
          value={planId}
          onChange={(e) => setPlanId(e.target.value)}
          error={errors.planId?.[0]}
        >
          <option value="">No plan</option>
          {plans.map((p) => (
            <option key={p.id} value={p.id}>
              {p.title}
            </option>
          ))}
        </SelectField>
        <div className="grid gap-4 sm:grid-cols-2">
          <TextField
            label="Day"
            type="date"
            required
            value={slot.date}
            onChange={(e) => setSlot((s) => ({ ...s, date: e.target.value }))}
            error={errors.plannedFor?.[0]}
          />
          <TextField label="Time" type="time" required value={slot.time} onChange={(e) => setSlot((s) => ({ ...s, time: e.target.value }))} />
        </div>
        {formError ? <FormErrorNotice>{formError}</FormErrorNotice> : null}
        <div className="mt-2 flex flex-col-reverse gap-3 sm:flex-row sm:justify-end">
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" variant="primary" busy={plan.isPending}>
            Add to next lessons
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

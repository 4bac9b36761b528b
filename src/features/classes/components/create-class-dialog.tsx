import { useRef, useState, type FormEvent } from "react";
import type { ClassSummary } from "@contracts/classes";
import type { FieldErrors } from "@contracts/errors";
import { Button } from "@/components/ui/button";
import { Dialog } from "@/components/ui/dialog";
import { PlusIcon } from "@/components/ui/icons";
import { FormErrorNotice } from "@/components/ui/notice";
import { useFocusFirstError } from "@/hooks/use-focus-first-error";
import { isApiError, errorMessage } from "@/lib/api-client";
import { useCreateClass } from "../api/create-class";
import { checkClassFields } from "../utils/class-form";
import { ClassFields, DEFAULT_SUBJECT, type ClassFieldValues } from "./class-fields";

const EMPTY: ClassFieldValues = { name: "", yearGroup: "", subject: DEFAULT_SUBJECT };

/** The "New class" button and the form it opens. */
export function NewClassAction({ onCreated, variant = "primary" }: {
  onCreated?: (created: ClassSummary) => void;
  variant?: "primary" | "secondary";
}) {
  const [open, setOpen] = useState(false);
  return (
    <>
      <Button variant={variant} icon={<PlusIcon />} onClick={() => setOpen(true)}>
        New class
      </Button>
      <CreateClassDialog
        open={open}
        onClose={() => setOpen(false)}
        onCreated={(created) => {
          setOpen(false);
          onCreated?.(created);
        }}
      />
    </>
  );
}

function CreateClassDialog({ open, onClose, onCreated }: {
  open: boolean;
  onClose: () => void;
  onCreated: (created: ClassSummary) => void;
}) {
  const [values, setValues] = useState<ClassFieldValues>(EMPTY);
  const [errors, setErrors] = useState<FieldErrors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const formRef = useRef<HTMLFormElement>(null);
  const focusFirstError = useFocusFirstError(formRef);
  const create = useCreateClass();

  const close = () => {
    setValues(EMPTY);
    setErrors({});
    setFormError(null);
    create.reset();
    onClose();
  };

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (create.isPending) return;
    const checked = checkClassFields(values);
    if (!checked.ok) {
      setErrors(checked.fields);
      setFormError(checked.fields._form?.[0] ?? null);
      focusFirstError();
      return;
    }
    setErrors({});
    setFormError(null);
    create.mutate(checked.value, {
      onSuccess: (created) => {
        setValues(EMPTY);
        onCreated(created);
      },
      onError: (error) => {
        const fields = isApiError(error) ? error.fields : {};
        setErrors(fields);
        // A message with nowhere better to go (not a field error) is shown above the buttons.
        const placed = ["name", "yearGroup", "subject"].some((key) => fields[key]?.length);
        setFormError(placed ? null : (fields._form?.[0] ?? errorMessage(error)));
        focusFirstError();
      },
    });
  };

  return (
    <Dialog open={open} onClose={close} title="New class" description="A class keeps its roster and, later, its lessons together.">
      <form ref={formRef} noValidate onSubmit={submit}>
        <ClassFields values={values} errors={errors} onChange={setValues} />
        {formError ? (
          <FormErrorNotice className="mt-5">{formError}</FormErrorNotice>
        ) : null}
        <div className="mt-6 flex flex-col-reverse gap-3 sm:flex-row sm:justify-end">
          <Button onClick={close}>Cancel</Button>
          <Button type="submit" variant="primary" busy={create.isPending}>
            Create class
          </Button>
        </div>
      </form>
    </Dialog>
  );
}

import { useEffect, useRef, useState, type FormEvent } from "react";
import type { ClassSummary } from "@contracts/classes";
import type { FieldErrors } from "@contracts/errors";
import { Button } from "@/components/ui/button";
import { PencilIcon } from "@/components/ui/icons";
import { FormErrorNotice, Notice } from "@/components/ui/notice";
import { Section } from "@/components/ui/section";
import { useFocusFirstError } from "@/hooks/use-focus-first-error";
import { errorMessage, isApiError } from "@/lib/api-client";
import { useUpdateClass } from "../api/update-class";
import { changedClassFields, checkClassFields } from "../utils/class-form";
import { ClassFields, type ClassFieldValues } from "./class-fields";

const valuesOf = (item: ClassSummary): ClassFieldValues => ({ name: item.name, yearGroup: item.yearGroup, subject: item.subject });
const formatDate = (iso: string) => new Date(iso).toLocaleDateString("en-GB", { day: "numeric", month: "long", year: "numeric" });

/** The class's name, year group and subject; its own teacher can edit them. */
export function ClassDetailsSection({ item, onDirtyChange }: {
  item: ClassSummary;
  /** Reports unsaved edits, so the page can warn before leaving. */
  onDirtyChange?: (dirty: boolean) => void;
}) {
  const canEdit = item.access === "owner";
  const [editing, setEditing] = useState(false);
  const [values, setValues] = useState<ClassFieldValues>(() => valuesOf(item));
  const [errors, setErrors] = useState<FieldErrors>({});
  const [formError, setFormError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  const formRef = useRef<HTMLFormElement>(null);
  const editButtonRef = useRef<HTMLButtonElement>(null);
  const focusFirstError = useFocusFirstError(formRef);
  const update = useUpdateClass();

  const dirty = editing && (values.name !== item.name || values.yearGroup !== item.yearGroup || values.subject !== item.subject);
  useEffect(() => onDirtyChange?.(dirty), [dirty, onDirtyChange]);

  const startEditing = () => {
    setValues(valuesOf(item));
    setErrors({});
    setFormError(null);
    setSaved(false);
    setEditing(true);
  };
  const stopEditing = () => {
    setEditing(false);
    update.reset();
    requestAnimationFrame(() => editButtonRef.current?.focus());
  };

  // Focus the first field when the form opens.
  useEffect(() => {
    if (editing) formRef.current?.querySelector<HTMLElement>("input")?.focus();
  }, [editing]);

  const submit = (event: FormEvent<HTMLFormElement>) => {
    event.preventDefault();
    if (update.isPending) return;
    const checked = checkClassFields(values);
    if (!checked.ok) {
      setErrors(checked.fields);
      focusFirstError();
      return;
    }
    const changes = changedClassFields(item, checked.value);
    if (Object.keys(changes).length === 0) {
      stopEditing();
      return;
    }
    update.mutate(
      { classId: item.id, changes },
      {
        onSuccess: () => {
          setErrors({});
          setFormError(null);
          setSaved(true);
          stopEditing();
        },
        onError: (error) => {
          const fields = isApiError(error) ? error.fields : {};
          setErrors(fields);
          const placed = ["name", "yearGroup", "subject"].some((key) => fields[key]?.length);
          setFormError(placed ? null : errorMessage(error));
          focusFirstError();
        },
      },
    );
  };

  return (
    <Section
      title="Details"
      actions={
        canEdit && !editing ? (
          <Button ref={editButtonRef} icon={<PencilIcon />} onClick={startEditing}>
            Edit details
          </Button>
        ) : null
      }
    >
      {editing ? (
        <form
          ref={formRef}
          noValidate
          onSubmit={submit}
          onKeyDown={(event) => {
            if (event.key === "Escape" && !update.isPending) stopEditing();
          }}
          aria-label="Edit class details"
        >
          <ClassFields values={values} errors={errors} onChange={setValues} />
          {formError ? (
            <FormErrorNotice className="mt-5">{formError}</FormErrorNotice>
          ) : null}
          <div className="mt-6 flex flex-col-reverse gap-3 sm:flex-row">
            <Button type="submit" variant="primary" busy={update.isPending}>
              Save details
            </Button>
            <Button onClick={stopEditing}>Cancel</Button>
          </div>
        </form>
      ) : (
        <>
          <dl className="grid grid-cols-2 gap-4 sm:grid-cols-3">
            <div>
              <dt className="text-sm font-bold text-ink-muted">Class name</dt>
              <dd className="text-lg break-words">{item.name}</dd>
            </div>
            <div>
              <dt className="text-sm font-bold text-ink-muted">Year group</dt>
              <dd className="text-lg">{item.yearGroup}</dd>
            </div>
            <div>
              <dt className="text-sm font-bold text-ink-muted">Subject</dt>
              <dd className="text-lg">{item.subject}</dd>
            </div>
            <div>
              <dt className="text-sm font-bold text-ink-muted">Teacher</dt>
              <dd className="text-lg">{item.teacher.displayName}</dd>
            </div>
            <div>
              <dt className="text-sm font-bold text-ink-muted">Created</dt>
              <dd className="text-lg">{formatDate(item.createdAt)}</dd>
            </div>
          </dl>
          {saved ? (
            <Notice tone="ok" live="status" className="mt-5">
              <p>Details saved.</p>
            </Notice>
          ) : null}
        </>
      )}
    </Section>
  );
}

import { useId, type ChangeEvent } from "react";
import { CLASS_LIMITS, type CreateClassInput } from "@contracts/classes";
import type { FieldErrors } from "@contracts/errors";
import { TextField } from "@/components/ui/field";

export type ClassFieldValues = Required<CreateClassInput>;
export const DEFAULT_SUBJECT = "Physics";

const YEAR_GROUP_SUGGESTIONS = ["Year 9", "Year 10", "Year 11", "Year 12", "Year 13"] as const;

/** Class name, year group and subject, with each field's own error beside it. */
export function ClassFields({ values, errors, onChange }: {
  values: ClassFieldValues;
  errors: FieldErrors;
  onChange: (values: ClassFieldValues) => void;
}) {
  const listId = useId();
  const set = (key: keyof ClassFieldValues) => (event: ChangeEvent<HTMLInputElement>) =>
    onChange({ ...values, [key]: event.target.value });
  return (
    <div className="grid gap-5">
      <TextField
        label="Class name"
        hint="The name you and your pupils use for the group."
        name="name"
        value={values.name}
        onChange={set("name")}
        error={errors.name?.[0]}
        maxLength={CLASS_LIMITS.name + 10}
        autoComplete="off"
        data-autofocus
        required
      />
      <div className="grid gap-5 sm:grid-cols-2">
        <TextField
          label="Year group"
          name="yearGroup"
          value={values.yearGroup}
          onChange={set("yearGroup")}
          error={errors.yearGroup?.[0]}
          list={listId}
          maxLength={CLASS_LIMITS.yearGroup + 10}
          autoComplete="off"
          required
        />
        <TextField
          label="Subject"
          name="subject"
          value={values.subject}
          onChange={set("subject")}
          error={errors.subject?.[0]}
          maxLength={CLASS_LIMITS.subject + 10}
          autoComplete="off"
          required
        />
      </div>
      <datalist id={listId}>
        {YEAR_GROUP_SUGGESTIONS.map((year) => (
          <option key={year} value={year} />
        ))}
      </datalist>
    </div>
  );
}

import {
  createClassInputSchema,
  type ClassSummary,
  type CreateClassInput,
  type CreateClassValues,
  type UpdateClassInput,
} from "@contracts/classes";
import { fieldErrorsFromIssues, type FieldErrors } from "@contracts/errors";

/** Checks the class fields with the contract's schema, so the form says what the server would. */
export function checkClassFields(values: CreateClassInput): { ok: true; value: CreateClassValues } | { ok: false; fields: FieldErrors } {
  const result = createClassInputSchema.safeParse(values);
  return result.success ? { ok: true, value: result.data } : { ok: false, fields: fieldErrorsFromIssues(result.error.issues) };
}

/** Only the fields that differ from the saved class, so a PATCH never rewrites what nobody touched. */
export function changedClassFields(saved: Pick<ClassSummary, "name" | "yearGroup" | "subject">, values: CreateClassValues): UpdateClassInput {
  const changes: UpdateClassInput = {};
  if (values.name !== saved.name) changes.name = values.name;
  if (values.yearGroup !== saved.yearGroup) changes.yearGroup = values.yearGroup;
  if (values.subject !== saved.subject) changes.subject = values.subject;
  return changes;
}

/** "1 pupil", "26 pupils", "No pupils yet". */
export function rosterCountLabel(count: number): string {
  if (count === 0) return "No pupils on the roster yet";
  return `${count} ${count === 1 ? "pupil" : "pupils"} on the roster`;
}

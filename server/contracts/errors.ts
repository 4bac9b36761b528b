import { z } from "zod";
import { ERROR_CODES } from "./error-codes";

/** Field errors keyed by the dotted path of the field, e.g. `name` or `names.3`. */
export const fieldErrorsSchema = z.record(z.string(), z.array(z.string()));
export type FieldErrors = z.infer<typeof fieldErrorsSchema>;

export const apiErrorBodySchema = z.object({
  error: z.object({
    code: z.enum(ERROR_CODES),
    message: z.string(),
    fields: fieldErrorsSchema.optional(),
  }),
});
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;

/** Turns zod issues into `{ "names.3": ["…"] }`; top-level issues go under `_form`. */
export function fieldErrorsFromIssues(issues: readonly z.core.$ZodIssue[]): FieldErrors {
  const fields: FieldErrors = {};
  for (const issue of issues) {
    const key = issue.path.length ? issue.path.map(String).join(".") : "_form";
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}

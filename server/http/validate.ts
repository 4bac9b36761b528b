import type { z } from "zod";
import { fieldErrorsFromIssues } from "../contracts/errors";
import { AppError } from "./app-error";

/** Parses untrusted input with a contract schema or throws a 400 with field errors. */
export function parseInput<S extends z.ZodType>(schema: S, input: unknown): z.output<S> {
  const result = schema.safeParse(input);
  if (result.success) return result.data;
  throw new AppError(
    "validation_failed",
    "Some of the details need correcting.",
    fieldErrorsFromIssues(result.error.issues),
  );
}

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Route ids that are not UUIDs cannot name anything: answer 404, as for any unknown id. */
export function parseId(value: unknown, what: string): string {
  if (typeof value !== "string" || !UUID.test(value)) throw new AppError("not_found", `${what} was not found.`);
  return value.toLowerCase();
}

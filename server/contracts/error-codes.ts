/**
 * The closed set of error codes the API and the socket acknowledgements may return, as plain
 * values without zod so the client's first page load can check them. Messages are for people;
 * codes are for programs. Internal details never leave the server.
 */
export const ERROR_CODES = [
  "bad_request",
  "validation_failed",
  "unauthenticated",
  "forbidden",
  "not_found",
  "class_name_taken",
  "last_admin",
  "already_staff",
  "invitation_pending",
  "invitation_closed",
  "mail_not_sent",
  "file_too_large",
  "unsupported_file_type",
  "protocol_mismatch",
  "lesson_ended",
  "phase_closed",
  "name_taken",
  "already_started",
  "internal_error",
] as const;
export type ErrorCode = (typeof ERROR_CODES)[number];

export const isErrorCode = (value: unknown): value is ErrorCode =>
  typeof value === "string" && (ERROR_CODES as readonly string[]).includes(value);

import type { ErrorCode } from "../contracts/error-codes";
import type { FieldErrors } from "../contracts/errors";

const STATUS: Record<ErrorCode, number> = {
  bad_request: 400,
  validation_failed: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  class_name_taken: 409,
  last_admin: 409,
  already_staff: 409,
  invitation_pending: 409,
  invitation_closed: 409,
  // The change was saved, but the mail server did not take the message.
  mail_not_sent: 502,
  file_too_large: 413,
  unsupported_file_type: 415,
  protocol_mismatch: 400,
  lesson_ended: 409,
  phase_closed: 409,
  name_taken: 409,
  already_started: 409,
  internal_error: 500,
};

/** The one error type handlers throw; the error middleware turns it into `{ error }` JSON. */
export class AppError extends Error {
  readonly status: number;
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: FieldErrors,
  ) {
    super(message);
    this.status = STATUS[code];
  }
}

export const notFound = (what = "That page") => new AppError("not_found", `${what} was not found.`);
export const forbidden = (message = "Your role does not allow this.") => new AppError("forbidden", message);
export const unauthenticated = () => new AppError("unauthenticated", "Sign in to continue.");

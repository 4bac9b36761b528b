import type { ErrorRequestHandler, RequestHandler } from "express";
import type { ApiErrorBody } from "../contracts/errors";
import { AppError } from "./app-error";

/** Unknown API paths answer JSON, never the client's HTML. */
export const apiNotFound: RequestHandler = (_req, _res, next) => {
  next(new AppError("not_found", "No such API route."));
};

/** Turns any thrown error into the public `{ error: { code, message, fields? } }` shape. */
export function errorMiddleware(log: (msg: string, error: unknown) => void): ErrorRequestHandler {
  return (error, req, res, next) => {
    if (res.headersSent) return next(error);
    let appError: AppError;
    if (error instanceof AppError) {
      appError = error;
    } else if (isBodyParserError(error)) {
      appError = new AppError(
        "bad_request",
        error.type === "entity.too.large" ? "The request is too large." : "The request body is not valid JSON.",
      );
    } else {
      log(`[http] ${req.method} ${req.originalUrl} failed`, error);
      appError = new AppError("internal_error", "Something went wrong on our side. Please try again.");
    }
    const body: ApiErrorBody = {
      error: { code: appError.code, message: appError.message, ...(appError.fields ? { fields: appError.fields } : {}) },
    };
    res.status(appError.status).json(body);
  };
}

function isBodyParserError(error: unknown): error is { type: string; status: number } {
  return typeof error === "object" && error !== null && "type" in error && typeof (error as { type: unknown }).type === "string" && "status" in error;
}

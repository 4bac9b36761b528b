import { isErrorCode, type ErrorCode } from "@contracts/error-codes";
import type { ApiErrorBody, FieldErrors } from "@contracts/errors";

/** Codes the client adds to the server's closed set: it never reached the server, or could not read the answer. */
export type ClientErrorCode = "network_error" | "bad_response";

export const NETWORK_ERROR_MESSAGE = "Could not reach Linkleap — check the connection.";

/**
 * Every failed API call becomes one of these. `message` is written for people and may be shown
 * as is; `fields` holds per-field messages keyed by dotted path (`name`, `names.3`, `_form`).
 */
export class ApiError extends Error {
  override readonly name = "ApiError";
  constructor(
    /** HTTP status, or 0 when the server was not reached. */
    readonly status: number,
    readonly code: ErrorCode | ClientErrorCode,
    message: string,
    readonly fields: FieldErrors = {},
  ) {
    super(message);
  }

  /** The first message for one field, if the server sent any. */
  fieldMessage(path: string): string | undefined {
    return this.fields[path]?.[0];
  }
}

export const isApiError = (error: unknown): error is ApiError => error instanceof ApiError;

/** What to say when a response carries no readable error body (a proxy page, an empty 502…). */
function fallbackFor(status: number): { code: ErrorCode | ClientErrorCode; message: string } {
  if (status === 401) return { code: "unauthenticated", message: "Sign in to continue." };
  if (status === 403) return { code: "forbidden", message: "Your role does not allow this." };
  if (status === 404) return { code: "not_found", message: "That was not found." };
  if (status >= 500) return { code: "internal_error", message: "Something went wrong on our side. Please try again." };
  return { code: "bad_response", message: `Linkleap answered in a way this page did not understand (status ${status}).` };
}

function isFieldErrors(value: unknown): value is FieldErrors {
  if (typeof value !== "object" || value === null || Array.isArray(value)) return false;
  return Object.values(value).every((messages) => Array.isArray(messages) && messages.every((m) => typeof m === "string"));
}

/** Turns a failed response's status and parsed body (anything, possibly not JSON) into an ApiError. */
export function errorFromResponse(status: number, body: unknown): ApiError {
  const error = (body as Partial<ApiErrorBody> | null)?.error;
  if (error && isErrorCode(error.code) && typeof error.message === "string" && error.message.trim()) {
    return new ApiError(status, error.code, error.message, isFieldErrors(error.fields) ? error.fields : {});
  }
  const { code, message } = fallbackFor(status);
  return new ApiError(status, code, message);
}

export interface RequestOptions {
  method?: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  /** Sent as JSON. */
  body?: unknown;
  /** Sent as multipart form data instead (file uploads); the browser sets the boundary. */
  form?: FormData;
  /** Query string parameters; undefined values are left out. */
  query?: Record<string, string | undefined>;
  signal?: AbortSignal;
}

/** `/api/classes` + `{ archived: "only" }` → `/api/classes?archived=only`. */
export function buildUrl(path: string, query?: RequestOptions["query"]): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) if (value !== undefined) params.set(key, value);
  const search = params.toString();
  return search ? `${path}?${search}` : path;
}

async function readJson(response: Response): Promise<unknown> {
  const text = await response.text();
  if (!text) return undefined;
  try {
    return JSON.parse(text) as unknown;
  } catch {
    return undefined;
  }
}

/**
 * Calls Linkleap's API on this origin with the session cookie. Resolves with the parsed JSON
 * body (undefined for 204), or rejects with an ApiError. Cancellation (AbortError) is passed on
 * untouched so React Query can tell it apart from a failure.
 */
export async function apiRequest<T>(path: string, options: RequestOptions = {}, fetchImpl: typeof fetch = fetch): Promise<T> {
  const { method = "GET", body, form, query, signal } = options;
  const headers: Record<string, string> = { Accept: "application/json" };
  if (body !== undefined && !form) headers["Content-Type"] = "application/json";

  let response: Response;
  try {
    response = await fetchImpl(buildUrl(path, query), {
      method,
      headers,
      body: form ?? (body === undefined ? undefined : JSON.stringify(body)),
      credentials: "same-origin",
      signal,
    });
  } catch (error) {
    if (error instanceof DOMException && error.name === "AbortError") throw error;
    throw new ApiError(0, "network_error", NETWORK_ERROR_MESSAGE);
  }

  if (response.status === 204) return undefined as T;
  const parsed = await readJson(response);
  if (!response.ok) throw errorFromResponse(response.status, parsed);
  if (parsed === undefined) {
    throw new ApiError(response.status, "bad_response", "Linkleap sent an answer this page could not read. Reload and try again.");
  }
  return parsed as T;
}

/** A message fit to show for any error thrown by a query or mutation. */
export function errorMessage(error: unknown): string {
  if (isApiError(error)) return error.message;
  return "Something went wrong in this page. Reload and try again.";
}

/** Server-side client errors are not worth retrying; network trouble and 5xx are. */
export function shouldRetry(failureCount: number, error: unknown, maxRetries = 2): boolean {
  if (isApiError(error) && error.status >= 400 && error.status < 500) return false;
  return failureCount < maxRetries;
}

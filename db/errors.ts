/** Domain errors raised by the data access layer; route handlers turn them into the one error shape. */
export type ErrorCode =
  | "bad_request"
  | "validation_failed"
  | "unauthenticated"
  | "forbidden"
  | "not_found"
  | "conflict"
  | "version_conflict"
  | "payload_too_large"
  | "unsupported_media_type"
  | "unprocessable"
  | "compute_too_costly"
  | "compute_over_budget"
  | "rate_limited"
  | "service_unavailable";

export interface FieldIssue {
  path: string;
  message: string;
}

export class AppError extends Error {
  constructor(
    readonly code: ErrorCode,
    message: string,
    readonly fields?: FieldIssue[],
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
    this.name = "AppError";
  }
}

export const notFound = (what: string) => new AppError("not_found", `${what} was not found`);
export const forbidden = (message: string) => new AppError("forbidden", message);
export const conflict = (message: string, fields?: FieldIssue[]) => new AppError("conflict", message, fields);
export const invalid = (message: string, fields: FieldIssue[]) => new AppError("validation_failed", message, fields);

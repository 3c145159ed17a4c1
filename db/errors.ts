/** Domain errors raised by the data access layer; route handlers turn them into the one error shape. */
import type { ErrorCode, FieldIssue } from "../contracts/errors";

export type { ErrorCode, FieldIssue };

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

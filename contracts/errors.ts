/**
 * The API's one error shape, `{ error: { code, message, fields?, ...details } }`, its codes and the HTTP status
 * each code goes out with. Shared by the server (db/errors.ts raises them, lib/http.ts answers them) and every
 * reader (the browser's API client, the CLI, notebooks).
 */

export const HTTP_STATUS_OF_ERROR = {
  bad_request: 400,
  validation_failed: 400,
  unauthenticated: 401,
  forbidden: 403,
  not_found: 404,
  conflict: 409,
  version_conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  unprocessable: 422,
  compute_too_costly: 422,
  compute_over_budget: 422,
  rate_limited: 429,
  service_unavailable: 503,
} as const;

export type ErrorCode = keyof typeof HTTP_STATUS_OF_ERROR;

/** A field that was refused: its dotted path in the request ("document.protocol.rampSeconds") and why. */
export interface FieldIssue {
  path: string;
  message: string;
}

export interface ErrorBody {
  error: { code: ErrorCode; message: string; fields?: FieldIssue[] } & Record<string, unknown>;
}

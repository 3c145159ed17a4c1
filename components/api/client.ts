/**
 * The one way the browser talks to our JSON API. Every failure, whatever its cause, becomes an ApiError carrying
 * the server's error shape ({ error: { code, message, fields? } }), so forms and panels handle one kind of error.
 */

import type { FieldIssue } from "@/contracts/errors";

export type { FieldIssue };

export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: FieldIssue[] = [],
    /** Extra members of the error object, e.g. `currentVersion` on a stale save. */
    readonly details: Record<string, unknown> = {},
  ) {
    super(message);
    this.name = "ApiError";
  }

  get isNotFound() {
    return this.status === 404;
  }
}

export interface ApiInit extends Omit<RequestInit, "body"> {
  /** Sent as a JSON body with the matching Content-Type. */
  json?: unknown;
}

export async function apiFetch<T>(path: string, init: ApiInit = {}): Promise<T> {
  const { json, headers, ...rest } = init;
  let response: Response;
  try {
    response = await fetch(path, {
      ...rest,
      credentials: "same-origin",
      headers: { Accept: "application/json", ...(json !== undefined ? { "Content-Type": "application/json" } : {}), ...headers },
      body: json !== undefined ? JSON.stringify(json) : undefined,
    });
  } catch {
    throw new ApiError(0, "network", "could not reach the server; check your connection and try again");
  }
  if (response.status === 204) return undefined as T;
  const body: unknown = await response.json().catch(() => undefined);
  if (!response.ok) throw errorFromBody(response.status, body);
  return body as T;
}

/** The ApiError for a failed answer's parsed body (anything: a body that is not our error shape says so). */
export function errorFromBody(status: number, body: unknown): ApiError {
  const error = (body as { error?: Record<string, unknown> } | undefined)?.error;
  if (!error || typeof error.message !== "string") {
    return new ApiError(status, "unexpected", `the server answered with status ${status}; try again in a moment`);
  }
  const { code, message, fields, ...details } = error;
  return new ApiError(status, String(code ?? "unexpected"), message, Array.isArray(fields) ? (fields as FieldIssue[]) : [], details);
}

/** A message fit to show a person, for any error a query or mutation may throw. */
export function messageOf(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  return "something went wrong; try again";
}

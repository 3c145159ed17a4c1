import "server-only";
import { NextResponse, type NextRequest } from "next/server";
import type { z } from "zod";
import type { Actor } from "../db/access";
import { HTTP_STATUS_OF_ERROR } from "../contracts/errors";
import { AppError, type FieldIssue } from "../db/errors";
import { firstTextProblem } from "../physics/scenario/text";
import { readBodyText } from "./request-body";
import { actorFromRequest } from "./session";

/** Largest JSON body a route accepts (a sampled protocol of many points fits). */
export const MAX_JSON_BYTES = 8 * 1024 * 1024;

export function errorResponse(error: AppError): NextResponse {
  const body = { error: { code: error.code, message: error.message, ...(error.fields ? { fields: error.fields } : {}), ...error.details } };
  // 429 and 503 say when to come back: details.retryAfterSeconds, in the body and as the standard header.
  const retryAfter = error.details?.retryAfterSeconds;
  const headers = typeof retryAfter === "number" ? { "Retry-After": String(Math.max(1, Math.ceil(retryAfter))) } : undefined;
  return NextResponse.json(body, { status: HTTP_STATUS_OF_ERROR[error.code], headers });
}

function zodIssues(error: z.ZodError, prefix = ""): FieldIssue[] {
  return error.issues.map((i) => ({ path: [prefix, ...i.path.map(String)].filter(Boolean).join("."), message: i.message }));
}

/** Where a text problem sits, as a field path the client can show ("the request body" for the body itself). */
function textIssue(where: string, found: { path: string; message: string }): AppError {
  const field = found.path || where;
  return new AppError("validation_failed", `${field} ${found.message}`, [{ path: found.path, message: found.message }]);
}

/**
 * Reads a JSON body through the one streaming reader (lib/request-body.ts) and validates it: 413 past
 * `limitBytes`, 400 for broken JSON, a NUL or lone surrogate anywhere (naming the field), or a schema failure.
 */
export async function readJson<T extends z.ZodType>(req: Request, schema: T, limitBytes = MAX_JSON_BYTES): Promise<z.infer<T>> {
  const text = await readBodyText(req, { limit: limitBytes, what: "the request body" });
  let json: unknown;
  try {
    json = text ? JSON.parse(text) : undefined;
  } catch {
    throw new AppError("bad_request", "the request body is not valid JSON");
  }
  const problem = firstTextProblem(json);
  if (problem) throw textIssue("the request body", problem);
  const parsed = schema.safeParse(json);
  if (!parsed.success) throw new AppError("validation_failed", "the request body is not valid", zodIssues(parsed.error));
  return parsed.data;
}

export function readQuery<T extends z.ZodType>(req: NextRequest, schema: T): z.infer<T> {
  const query = Object.fromEntries(req.nextUrl.searchParams);
  const problem = firstTextProblem(query);
  if (problem) throw textIssue("the query", problem);
  const parsed = schema.safeParse(query);
  if (!parsed.success) throw new AppError("validation_failed", "the query parameters are not valid", zodIssues(parsed.error));
  return parsed.data;
}

export async function requireActor(req: NextRequest): Promise<Actor> {
  const actor = await actorFromRequest(req);
  if (!actor) throw new AppError("unauthenticated", "sign in first");
  return actor;
}

type RouteContext<P> = { params: Promise<P> };

/**
 * Wraps a route handler: known errors become the one error shape with their status; anything else is logged on
 * the server and answered as a plain 500 without details, so no stack trace ever reaches a client.
 */
export function route<P = Record<string, string>>(
  handler: (req: NextRequest, params: P) => Promise<Response>,
): (req: NextRequest, ctx: RouteContext<P>) => Promise<Response> {
  return async (req, ctx) => {
    try {
      return await handler(req, (await ctx?.params) ?? ({} as P));
    } catch (error) {
      if (error instanceof AppError) return errorResponse(error);
      console.error("[api] unexpected error", req.method, req.nextUrl?.pathname, error);
      return NextResponse.json({ error: { code: "internal", message: "something went wrong on the server; the error has been logged" } }, { status: 500 });
    }
  };
}

export const json = (body: unknown, status = 200) => NextResponse.json(body, { status });
export const noContent = () => new NextResponse(null, { status: 204 });

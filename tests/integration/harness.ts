/**
 * Calls route handlers for real (the exported GET/POST/... of app/api/** modules) with a NextRequest carrying
 * a genuine next-auth session cookie, against the test database.
 */
import { encode } from "next-auth/jwt";
import { NextRequest } from "next/server";
import { getDb } from "@/db";
import { createUser } from "@/db/users";

// Route handlers type their own params; the harness passes whatever the case names.
type Handler = (req: NextRequest, ctx: { params: Promise<any> }) => Promise<Response>;

export interface CallOptions {
  params?: Record<string, string>;
  body?: unknown;
  rawBody?: string;
  query?: Record<string, string>;
  as?: TestUser | null;
  headers?: Record<string, string>;
}

export interface TestUser {
  id: string;
  email: string;
  name: string;
  cookie: string;
}

export interface CallResult<T = any> {
  status: number;
  body: T;
  headers: Headers;
}

export async function sessionCookie(userId: string): Promise<string> {
  const token = await encode({ token: { sub: userId }, secret: process.env.NEXTAUTH_SECRET! });
  return `next-auth.session-token=${token}`;
}

let counter = 0;

/** A new account with a unique e-mail address, signed in (its session cookie ready). */
export async function makeUser(label: string, options: { siteRole?: "admin" | "member"; password?: string } = {}): Promise<TestUser> {
  counter += 1;
  const email = `${label}-${counter}-${Date.now()}@example.test`;
  const user = await createUser(getDb(), { email, name: `${label} ${counter}`, password: options.password, siteRole: options.siteRole });
  return { id: user.id, email: user.email, name: user.name, cookie: await sessionCookie(user.id) };
}

export async function call<T = any>(handler: Handler | undefined, method: string, path: string, options: CallOptions = {}): Promise<CallResult<T>> {
  if (!handler) throw new Error(`no ${method} handler for ${path}`);
  const url = new URL(path, "http://localhost:3999");
  for (const [k, v] of Object.entries(options.query ?? {})) url.searchParams.set(k, v);
  const headers: Record<string, string> = { ...options.headers };
  if (options.as) headers.cookie = options.as.cookie;
  let body: string | undefined = options.rawBody;
  if (options.body !== undefined) {
    body = JSON.stringify(options.body);
    headers["content-type"] = "application/json";
  }
  const req = new NextRequest(url, { method, headers, body });
  const res = await handler(req, { params: Promise.resolve(options.params ?? {}) });
  const text = await res.text();
  let parsed: unknown = text;
  try {
    parsed = text ? JSON.parse(text) : null;
  } catch {
    /* not JSON: keep the text so a failing assertion shows it */
  }
  return { status: res.status, body: parsed as T, headers: res.headers };
}

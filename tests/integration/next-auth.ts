/**
 * Drives next-auth's own request handler (AuthHandler, what app/api/auth/[...nextauth] runs once Next.js has read
 * the headers and cookies) with Branchline's authOptions: the CSRF round trip, the credentials callback, the
 * session endpoint and sign-out, with the cookies it sets carried from one request to the next like a browser.
 * next-auth does not export its core by name, hence the path.
 */
import { AuthHandler } from "../../node_modules/next-auth/core/index.js";
import { authOptions } from "@/lib/auth";
import { withSocketAddress } from "@/lib/client-address";

export interface CookieJar {
  [name: string]: string;
}

export interface SetCookie {
  name: string;
  value: string;
  options: { secure?: boolean; httpOnly?: boolean; sameSite?: unknown; expires?: Date; maxAge?: number };
}

export interface AuthAnswer {
  status: number;
  body: any;
  redirect?: string;
  cookies: SetCookie[];
}

const cookieHeader = (jar: CookieJar) =>
  Object.entries(jar)
    .map(([k, v]) => `${k}=${v}`)
    .join("; ");

/**
 * One request to /api/auth/{path}, handed over as the Next.js glue (next-auth/next's route handler) hands it:
 * the form body parsed, the cookies and headers as plain objects, the action and provider from the path. The
 * cookies the answer sets (or clears) land in the jar.
 */
export async function authRequest(jar: CookieJar, method: "GET" | "POST", path: string, form?: Record<string, string>): Promise<AuthAnswer> {
  const [action, providerId] = path.split("/");
  const req = {
    method,
    body: form,
    query: {},
    cookies: { ...jar },
    headers: { host: new URL(process.env.NEXTAUTH_URL ?? "http://localhost:3999").host, cookie: cookieHeader(jar) },
    action,
    providerId,
    error: providerId,
  };
  // As the glue does: the secret from the environment (the spread reads useSecureCookies afresh).
  const options = { ...authOptions, secret: process.env.NEXTAUTH_SECRET };
  const answer = (await AuthHandler({ req: req as never, options })) as AuthAnswer;
  for (const cookie of answer.cookies ?? []) {
    if (cookie.value === "" || cookie.options?.maxAge === 0) delete jar[cookie.name];
    else jar[cookie.name] = cookie.value;
  }
  return { ...answer, cookies: answer.cookies ?? [] };
}

/** The name of the session cookie next-auth uses (Secure-prefixed behind https). */
export const sessionCookieName = () => `${authOptions.useSecureCookies ? "__Secure-" : ""}next-auth.session-token`;

/** Signs in with a password from the given socket address, as the sign-in form does; the jar then holds the session. */
export async function signInWithPassword(jar: CookieJar, email: string, password: string, address: string): Promise<AuthAnswer> {
  return withSocketAddress(address, async () => {
    const { body } = await authRequest(jar, "GET", "csrf");
    return authRequest(jar, "POST", "callback/credentials", { csrfToken: body.csrfToken, email, password, json: "true" });
  });
}

export async function signOut(jar: CookieJar): Promise<AuthAnswer> {
  const { body } = await authRequest(jar, "GET", "csrf");
  return authRequest(jar, "POST", "signout", { csrfToken: body.csrfToken, json: "true" });
}

/** The Cookie header of the jar's session alone, for the API route handlers. */
export function sessionCookieOf(jar: CookieJar): string {
  const name = sessionCookieName();
  if (!jar[name]) throw new Error(`no ${name} in the jar: ${Object.keys(jar).join(", ")}`);
  return `${name}=${jar[name]}`;
}

/**
 * Sessions that end: signed in through next-auth's own handler (CSRF round trip, credentials callback), the
 * session cookie it sets is then used on the API route handlers, before and after each way a session ends.
 */
import { afterEach, describe, expect, it } from "vitest";
import * as accountRoute from "@/app/api/account/route";
import * as sessionsRoute from "@/app/api/account/sessions/route";
import * as resetRoute from "@/app/api/password-reset/route";
import * as resetConfirmRoute from "@/app/api/password-reset/confirm/route";
import { getDb } from "@/db";
import { call, makeUser, type TestUser } from "./harness";
import { waitForMailTo } from "./mailbox";
import { authRequest, type CookieJar, sessionCookieName, sessionCookieOf, signInWithPassword, signOut } from "./next-auth";

const password = "correct horse battery";
let host = 0;
const address = () => `2001:db8:5e55::${(host += 1).toString(16)}`;

/** A browser of its own: a cookie jar signed in as this user through next-auth. */
async function browserSignedIn(user: TestUser): Promise<CookieJar> {
  const jar: CookieJar = {};
  const answer = await signInWithPassword(jar, user.email, password, address());
  expect(answer.redirect).not.toContain("error");
  expect(jar[sessionCookieName()]).toBeTruthy();
  return jar;
}

const account = (jar: CookieJar) => call(accountRoute.GET, "GET", "/api/account", { headers: { cookie: sessionCookieOf(jar) } });

const originalUrl = process.env.NEXTAUTH_URL;
afterEach(() => {
  if (originalUrl === undefined) delete process.env.NEXTAUTH_URL;
  else process.env.NEXTAUTH_URL = originalUrl;
});

describe("sessions that end", () => {
  it("signs in through next-auth with a password and the cookie works on the API", async () => {
    const user = await makeUser("session", { password });
    const jar = await browserSignedIn(user);
    const res = await account(jar);
    expect(res.status).toBe(200);
    expect(res.body.user.id).toBe(user.id);
    const session = await authRequest(jar, "GET", "session");
    expect(session.body.user).toMatchObject({ email: user.email, id: user.id });
  });

  it("an old cookie after sign-out gets 401 on the API, and the session endpoint answers signed out", async () => {
    const user = await makeUser("signout", { password });
    const jar = await browserSignedIn(user);
    const oldCookie = sessionCookieOf(jar);
    const out = await signOut(jar);
    expect(out.cookies.find((c) => c.name === sessionCookieName())?.value).toBe("");
    const replay = await call(accountRoute.GET, "GET", "/api/account", { headers: { cookie: oldCookie } });
    expect(replay.status).toBe(401);
    expect(replay.body.error.code).toBe("unauthenticated");
    // Replayed against next-auth itself: no session, and the cookie is cleared.
    const replayJar: CookieJar = { [sessionCookieName()]: oldCookie.split("=").slice(1).join("=") };
    const session = await authRequest(replayJar, "GET", "session");
    expect(session.body?.user).toBeUndefined();
    expect(replayJar[sessionCookieName()]).toBeUndefined();
  });

  it("an old cookie after a password reset gets 401, on every browser", async () => {
    const user = await makeUser("reset-ends", { password });
    const [laptop, phone] = [await browserSignedIn(user), await browserSignedIn(user)];
    expect((await call(resetRoute.POST, "POST", "/api/password-reset", { body: { email: user.email } })).status).toBe(202);
    const [mail] = await waitForMailTo(user.email);
    const token = new URL(mail.text.match(/https?:\/\/\S+/)![0]).searchParams.get("token")!;
    expect((await call(resetConfirmRoute.POST, "POST", "/x", { body: { token, password: "a brand new password" } })).status).toBe(200);
    expect((await account(laptop)).status).toBe(401);
    expect((await account(phone)).status).toBe(401);
    const fresh: CookieJar = {};
    await signInWithPassword(fresh, user.email, "a brand new password", address());
    expect((await account(fresh)).status).toBe(200);
  });

  it("\"sign out everywhere\" ends every session of the account at once, and only of that account", async () => {
    const user = await makeUser("everywhere", { password });
    const other = await makeUser("bystander", { password });
    const [laptop, phone, theirs] = [await browserSignedIn(user), await browserSignedIn(user), await browserSignedIn(other)];
    const ended = await call(sessionsRoute.DELETE, "DELETE", "/api/account/sessions", { headers: { cookie: sessionCookieOf(laptop) } });
    expect(ended.status).toBe(204);
    expect((await account(laptop)).status).toBe(401);
    expect((await account(phone)).status).toBe(401);
    expect((await account(theirs)).status).toBe(200);
    // A new sign-in afterwards works as usual.
    expect((await account(await browserSignedIn(user))).status).toBe(200);
  });

  it("a removed account's cookie gets 401", async () => {
    const user = await makeUser("removed", { password });
    const jar = await browserSignedIn(user);
    await getDb().deleteFrom("users").where("id", "=", user.id).execute();
    expect((await account(jar)).status).toBe(401);
  });

  it("sets Secure, prefixed cookies when the public URL is https, and reads them back", async () => {
    process.env.NEXTAUTH_URL = "https://branchline.example";
    const user = await makeUser("secure", { password });
    const jar: CookieJar = {};
    const csrf = await authRequest(jar, "GET", "csrf");
    const csrfCookie = csrf.cookies.find((c) => c.name.endsWith("next-auth.csrf-token"));
    expect(csrfCookie).toMatchObject({ name: "__Host-next-auth.csrf-token", options: { secure: true, httpOnly: true } });
    const answer = await signInWithPassword(jar, user.email, password, address());
    const session = answer.cookies.find((c) => c.name.endsWith("next-auth.session-token"));
    expect(session).toMatchObject({ name: "__Secure-next-auth.session-token", options: { secure: true, httpOnly: true } });
    expect((await account(jar)).status).toBe(200);
  });

  it("sets cookies without Secure on a plain-http loopback URL (the demo)", async () => {
    process.env.NEXTAUTH_URL = "http://localhost:3999";
    const user = await makeUser("plain", { password });
    const jar: CookieJar = {};
    const answer = await signInWithPassword(jar, user.email, password, address());
    const session = answer.cookies.find((c) => c.name.endsWith("next-auth.session-token"));
    expect(session).toMatchObject({ name: "next-auth.session-token", options: { secure: false } });
  });
});

/** Sign-in pieces that run without a browser: password check with rate limiting, reset by e-mail, magic-link tokens. */
import { describe, expect, it } from "vitest";
import * as resetRoute from "@/app/api/password-reset/route";
import * as resetConfirmRoute from "@/app/api/password-reset/confirm/route";
import { getDb } from "@/db";
import { branchlineAuthAdapter } from "@/db/auth-adapter";
import { MAX_FAILURES_PER_ACCOUNT } from "@/db/sign-in-limits";
import { authOptions, RATE_LIMITED_MESSAGE } from "@/lib/auth";
import { call, makeUser } from "./harness";
import { mailboxMessagesTo, waitForMailTo } from "./mailbox";

type Authorize = (credentials: Record<string, string>, req: { headers: Record<string, string> }) => Promise<{ id: string } | null>;

function credentialsAuthorize(): Authorize {
  const provider = authOptions.providers.find((p) => p.id === "credentials") as unknown as { options: { authorize: Authorize } };
  return provider.options.authorize;
}

describe("password sign-in", () => {
  it("accepts the right password and refuses a wrong one", async () => {
    const user = await makeUser("signin", { password: "correct horse battery" });
    const authorize = credentialsAuthorize();
    const headers = { "x-forwarded-for": "203.0.113.10" };
    expect(await authorize({ email: user.email.toUpperCase(), password: "correct horse battery" }, { headers })).toMatchObject({ id: user.id });
    expect(await authorize({ email: user.email, password: "wrong password" }, { headers })).toBeNull();
  });

  it("locks an account after repeated failures, even with the right password", async () => {
    const user = await makeUser("locked", { password: "correct horse battery" });
    const authorize = credentialsAuthorize();
    for (let i = 0; i < MAX_FAILURES_PER_ACCOUNT; i++) {
      // A different forged X-Forwarded-For each time: without TRUST_PROXY it is not believed, so these are all one
      // client, and that client is held back (for 30 s, then longer with each failure; db/sign-in-limits.ts).
      expect(await authorize({ email: user.email, password: `wrong ${i}` }, { headers: { "x-forwarded-for": `198.51.100.${i}` } })).toBeNull();
    }
    await expect(authorize({ email: user.email, password: "correct horse battery" }, { headers: { "x-forwarded-for": "198.51.100.99" } })).rejects.toThrow(
      RATE_LIMITED_MESSAGE,
    );
  });
});

describe("password reset by e-mail", () => {
  it("mails a one-time link that sets a new password and lifts a lock", async () => {
    const user = await makeUser("reset", { password: "the old password" });
    const asked = await call(resetRoute.POST, "POST", "/api/password-reset", { body: { email: user.email } });
    expect(asked.status).toBe(202);
    const [mail] = await waitForMailTo(user.email);
    expect(mail.subject).toBe("Reset your Branchline password");
    const token = new URL(mail.text.match(/https?:\/\/\S+/)![0]).searchParams.get("token")!;
    const done = await call(resetConfirmRoute.POST, "POST", "/x", { body: { token, password: "the new password" } });
    expect(done.status).toBe(200);
    const again = await call(resetConfirmRoute.POST, "POST", "/x", { body: { token, password: "another new password" } });
    expect(again.status).toBe(422);
    expect(await credentialsAuthorize()({ email: user.email, password: "the new password" }, { headers: {} })).toMatchObject({ id: user.id });
  });

  it("answers exactly the same for an address with an account and one without, and mails only the account", async () => {
    const user = await makeUser("probe", { password: "the old password" });
    const nobody = `nobody-probe-${Date.now()}@example.test`;
    const known = await call(resetRoute.POST, "POST", "/api/password-reset", { body: { email: user.email } });
    const unknown = await call(resetRoute.POST, "POST", "/api/password-reset", { body: { email: nobody } });
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    // The known address's mail arrives (in the background, after the answer); by then the other would have too.
    expect(await waitForMailTo(user.email)).toHaveLength(1);
    expect(await mailboxMessagesTo(nobody)).toEqual([]);
  });

  it("answers the same for an address without an account, and sends nothing", async () => {
    const address = `nobody-${Date.now()}@example.test`;
    const res = await call(resetRoute.POST, "POST", "/api/password-reset", { body: { email: address } });
    expect(res.status).toBe(202);
    expect(await mailboxMessagesTo(address)).toEqual([]);
  });
});

describe("magic-link tokens", () => {
  it("stores a verification token and lets it be used exactly once", async () => {
    const adapter = branchlineAuthAdapter(getDb());
    const token = { identifier: `magic-${Date.now()}@example.test`, token: "hashed-token-value", expires: new Date(Date.now() + 60_000) };
    await adapter.createVerificationToken!(token);
    expect(await adapter.useVerificationToken!({ identifier: token.identifier, token: token.token })).toMatchObject({ identifier: token.identifier });
    expect(await adapter.useVerificationToken!({ identifier: token.identifier, token: token.token })).toBeNull();
  });

  it("signs up a new address on first use, with a name from the address", async () => {
    const adapter = branchlineAuthAdapter(getDb());
    const email = `First.Visit.${Date.now()}@Example.test`;
    const user = await adapter.createUser!({ email, emailVerified: new Date() } as never);
    expect(user).toMatchObject({ email: email.toLowerCase(), name: email.toLowerCase().split("@")[0] });
    expect(await adapter.getUserByEmail!(email)).toMatchObject({ id: user.id });
  });
});

/**
 * The sign-in limits under concurrency, on the real PostgreSQL: bcrypt comparisons are counted by the process's own
 * counter (db/users.ts) and by the recorded attempts, never mocked. Each test signs in from addresses of its own
 * (documentation ranges), set as the socket address the server would stamp.
 */
import { sql } from "kysely";
import { afterEach, describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { ACCOUNT_FROM_ADDRESS_POLICY, ACCOUNT_POLICY, ADDRESS_POLICY } from "@/db/sign-in-limits";
import { passwordComparisonCount } from "@/db/users";
import { authOptions, RATE_LIMITED_MESSAGE } from "@/lib/auth";
import { withSocketAddress } from "@/lib/client-address";
import { makeUser } from "./harness";

type Authorize = (credentials: Record<string, string>, req: { headers: Record<string, string> }) => Promise<{ id: string } | null>;

function authorize(address: string, email: string, password: string, headers: Record<string, string> = {}) {
  const provider = authOptions.providers.find((p) => p.id === "credentials") as unknown as { options: { authorize: Authorize } };
  return withSocketAddress(address, () => provider.options.authorize({ email, password }, { headers }));
}

/** Settles every attempt; refusals by the limiter become "limited", wrong passwords null. */
async function attempt(address: string, email: string, password: string, headers?: Record<string, string>) {
  try {
    return await authorize(address, email, password, headers);
  } catch (error) {
    if (error instanceof Error && error.message.startsWith(RATE_LIMITED_MESSAGE)) return "limited" as const;
    throw error;
  }
}

async function recordedChecks(email: string): Promise<number> {
  const row = await getDb().selectFrom("signInAttempts").select(sql<string>`count(*)`.as("n")).where("email", "=", email).executeTakeFirstOrThrow();
  return Number(row.n);
}

/** Lets time pass for the limiter: every key of this account (or address) opens now, its failures kept. */
async function openKeys(fragment: string): Promise<void> {
  await sql`update sign_in_limits set next_attempt_at = now() - interval '1 second' where key like ${`%${fragment}%`}`.execute(getDb());
}

async function waitSeconds(key: string): Promise<number> {
  const row = await sql<{ s: number }>`select extract(epoch from next_attempt_at - now())::float8 as s from sign_in_limits where key = ${key}`.execute(getDb());
  return row.rows[0].s;
}

let net = 0;
/** A fresh /64 of the IPv6 documentation prefix (RFC 3849) per call, so that tests never share an address key. */
const freshNet = () => {
  net += 1;
  const prefix = `2001:db8:${(Date.now() % 0xffff).toString(16)}:${net.toString(16)}`;
  return (host: number) => `${prefix}::${host.toString(16)}`;
};

afterEach(() => {
  delete process.env.TRUST_PROXY;
});

// bcryptjs runs on the main thread: twenty checks take seconds each on a loaded machine.
describe("sign-in limits", { timeout: 180_000 }, () => {
  it("100 concurrent wrong passwords from one address check at most the account-from-address limit, then refuse the right one", async () => {
    const user = await makeUser("stampede", { password: "correct horse battery" });
    const address = freshNet()(7);
    const before = passwordComparisonCount();
    const results = await Promise.all(Array.from({ length: 100 }, (_, i) => attempt(address, user.email, `wrong ${i}`)));
    const checked = passwordComparisonCount() - before;
    expect(checked).toBeGreaterThan(0);
    expect(checked).toBeLessThanOrEqual(ACCOUNT_FROM_ADDRESS_POLICY.freeFailures);
    expect(await recordedChecks(user.email)).toBe(checked);
    expect(results.filter((r) => r === null)).toHaveLength(checked);
    expect(results.filter((r) => r === "limited")).toHaveLength(100 - checked);
    expect(await attempt(address, user.email, "correct horse battery")).toBe("limited");
    expect(passwordComparisonCount() - before).toBe(checked);
  });

  it("100 concurrent wrong passwords from 100 addresses check at most the account-wide limit, and the owner's usual address still signs in", async () => {
    const user = await makeUser("botnet", { password: "correct horse battery" });
    const owner = freshNet()(1);
    expect(await attempt(owner, user.email, "correct horse battery")).toMatchObject({ id: user.id });
    const bots = freshNet();
    const before = passwordComparisonCount();
    const results = await Promise.all(Array.from({ length: 100 }, (_, i) => attempt(bots(i + 1), user.email, `wrong ${i}`)));
    const checked = passwordComparisonCount() - before;
    expect(checked).toBeLessThanOrEqual(ACCOUNT_POLICY.freeFailures);
    expect(results.filter((r) => r === "limited")).toHaveLength(100 - checked);
    // The owner's address has signed in before: the account-wide key does not hold it back.
    expect(await attempt(owner, user.email, "correct horse battery")).toMatchObject({ id: user.id });
  });

  it("back-off, not lock-out: an attacker at another address holds back only itself; the owner signs in from a new address at once", async () => {
    const user = await makeUser("target", { password: "correct horse battery" });
    const attacker = freshNet()(66);
    const results = await Promise.all(Array.from({ length: 50 }, (_, i) => attempt(attacker, user.email, `guess ${i}`)));
    expect(results).toContain("limited");
    // Still refused after many more tries: the attacker's own key stays closed, …
    for (let i = 0; i < 10; i++) expect(await attempt(attacker, user.email, `guess again ${i}`)).toBe("limited");
    // … while the owner, from an address never seen before, is not held back at all.
    expect(await attempt(freshNet()(9), user.email, "correct horse battery")).toMatchObject({ id: user.id });
  });

  it("each failure past the free ones doubles the wait (30 s, 60 s, 120 s), and hammering a closed key does not extend it", async () => {
    const user = await makeUser("backoff", { password: "correct horse battery" });
    const address = freshNet()(12);
    const key = `account-from-address:${user.email}|${address}`;
    for (let i = 0; i < ACCOUNT_FROM_ADDRESS_POLICY.freeFailures; i++) expect(await attempt(address, user.email, `wrong ${i}`)).toBeNull();
    const first = await waitSeconds(key);
    expect(first).toBeGreaterThan(ACCOUNT_FROM_ADDRESS_POLICY.baseDelaySeconds - 5);
    expect(first).toBeLessThanOrEqual(ACCOUNT_FROM_ADDRESS_POLICY.baseDelaySeconds);
    for (let i = 0; i < 5; i++) expect(await attempt(address, user.email, "while closed")).toBe("limited");
    expect(await waitSeconds(key)).toBeLessThanOrEqual(first);
    const waits: number[] = [];
    for (let round = 0; round < 2; round++) {
      await openKeys(address);
      expect(await attempt(address, user.email, `late guess ${round}`)).toBeNull();
      waits.push(await waitSeconds(key));
    }
    expect(waits[0]).toBeGreaterThan(2 * ACCOUNT_FROM_ADDRESS_POLICY.baseDelaySeconds - 5);
    expect(waits[1]).toBeGreaterThan(4 * ACCOUNT_FROM_ADDRESS_POLICY.baseDelaySeconds - 5);
    expect(waits[1]).toBeLessThanOrEqual(ACCOUNT_FROM_ADDRESS_POLICY.maxDelaySeconds);
    // The right password once the key opens again: accepted, and the key is cleared.
    await openKeys(address);
    expect(await attempt(address, user.email, "correct horse battery")).toMatchObject({ id: user.id });
    const left = await getDb().selectFrom("signInLimits").select("key").where("key", "=", key).execute();
    expect(left).toEqual([]);
  });

  it("forgets a key untouched for a day: its failures start over, and stale keys are cleared away", async () => {
    const user = await makeUser("forgotten", { password: "correct horse battery" });
    const address = freshNet()(40);
    for (let i = 0; i < ACCOUNT_FROM_ADDRESS_POLICY.freeFailures; i++) await attempt(address, user.email, `wrong ${i}`);
    expect(await attempt(address, user.email, "correct horse battery")).toBe("limited");
    await sql`update sign_in_limits set updated_at = now() - interval '25 hours' where key like ${`%${address}%`}`.execute(getDb());
    const staleKey = `address:stale-${Date.now()}`;
    await sql`insert into sign_in_limits (key, failures, next_attempt_at, updated_at) values (${staleKey}, 3, now() - interval '2 days', now() - interval '2 days')`.execute(getDb());
    expect(await attempt(address, user.email, "correct horse battery")).toMatchObject({ id: user.id });
    expect(await getDb().selectFrom("signInLimits").select("key").where("key", "=", staleKey).execute()).toEqual([]);
  });

  it("ignores X-Forwarded-For without TRUST_PROXY: a spray with a new forged address each time is one client", async () => {
    const address = freshNet()(20);
    const stamp = Date.now();
    const results = [];
    for (let i = 0; i < ADDRESS_POLICY.freeFailures + 1; i++) {
      results.push(await attempt(address, `spray-${stamp}-${i}@example.test`, "password1234", { "x-forwarded-for": `192.0.2.${i + 1}` }));
    }
    expect(results.slice(0, ADDRESS_POLICY.freeFailures).every((r) => r === null)).toBe(true);
    expect(results.at(-1)).toBe("limited");
  });

  it("believes X-Forwarded-For from a proxy that TRUST_PROXY names", async () => {
    process.env.TRUST_PROXY = "loopback";
    const stamp = Date.now();
    const clients = freshNet();
    for (let i = 0; i < ADDRESS_POLICY.freeFailures + 1; i++) {
      // Each sign-in comes through the local proxy for a different client: none of them is held back.
      expect(await attempt("127.0.0.1", `proxied-${stamp}-${i}@example.test`, "password1234", { "x-forwarded-for": clients(i + 1) })).toBeNull();
    }
  });

  it("makes exactly one bcrypt comparison for a known address, an unknown one and a password-less account (the dummy hash)", async () => {
    const known = await makeUser("known", { password: "correct horse battery" });
    const passwordless = await makeUser("magic-only");
    const address = freshNet()(30);
    for (const email of [known.email, `unknown-${Date.now()}@example.test`, passwordless.email]) {
      const before = passwordComparisonCount();
      expect(await attempt(address, email, "not the password")).toBeNull();
      expect(passwordComparisonCount() - before).toBe(1);
    }
  });
});

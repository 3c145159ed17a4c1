import "server-only";
import { type Kysely, type RawBuilder, sql } from "kysely";
import type { Database } from "./schema";

/**
 * Sign-in limits that hold under concurrency, with exponential back-off instead of a lock-out.
 *
 * Every password attempt first *consumes* a slot on each of its keys, in one transaction, before the password is
 * checked: one `INSERT … ON CONFLICT … DO UPDATE … WHERE next_attempt_at <= now() RETURNING` per key. PostgreSQL
 * locks the key's row for the statement, so concurrent attempts are counted one after another and no two can
 * take the same slot. A key allows `freeFailures` attempts at once; each attempt past those pushes the key's next
 * slot out by `baseDelaySeconds · 2^(n − freeFailures)`, at most `maxDelaySeconds`. An attempt that finds a key
 * not yet open is refused without touching any key (the transaction rolls back), so hammering a closed key does
 * not extend its delay. A successful sign-in gives its slot back; a key untouched for a day starts over.
 *
 * The keys (common practice for credential-stuffing defences; the numbers are ours):
 * - the client address alone: spraying many accounts from one address;
 * - the account from one address: guessing one account from one place (the tight one);
 * - the account from everywhere, skipped for addresses this account has signed in from before: guessing one
 *   account from many addresses. An attacker elsewhere can slow the account's owner on a new address for a
 *   while, never lock them out (and a password reset clears the account's keys); the owner's usual addresses
 *   are not slowed at all.
 */
export interface LimitPolicy {
  freeFailures: number;
  baseDelaySeconds: number;
  maxDelaySeconds: number;
}

export const ADDRESS_POLICY: LimitPolicy = { freeFailures: 20, baseDelaySeconds: 30, maxDelaySeconds: 3600 };
export const ACCOUNT_FROM_ADDRESS_POLICY: LimitPolicy = { freeFailures: 5, baseDelaySeconds: 30, maxDelaySeconds: 3600 };
export const ACCOUNT_POLICY: LimitPolicy = { freeFailures: 20, baseDelaySeconds: 30, maxDelaySeconds: 900 };

/** Failed attempts a new account allows from one address before the back-off starts. */
export const MAX_FAILURES_PER_ACCOUNT = ACCOUNT_FROM_ADDRESS_POLICY.freeFailures;
export const MAX_FAILURES_PER_ADDRESS = ADDRESS_POLICY.freeFailures;

/** A key not touched for this long forgets its failures. */
const FORGET_AFTER_HOURS = 24;
/** How far back a successful sign-in makes an address "known" to the account. */
const KNOWN_ADDRESS_DAYS = 180;

interface LimitKey {
  key: string;
  account: string | null;
  policy: LimitPolicy;
}

export type SignInSlot = { allowed: true; keys: LimitKey[] } | { allowed: false; retryAfterSeconds: number };

const lower = (email: string) => email.trim().toLowerCase();

function delayFor(failures: RawBuilder<number>, policy: LimitPolicy) {
  // Exponent clamped so that 2^k stays a small finite number before the cap applies.
  return sql`case when ${failures} < ${policy.freeFailures} then interval '0'
    else make_interval(secs => least(${policy.baseDelaySeconds}::float8 * power(2, least(${failures} - ${policy.freeFailures}, 30)), ${policy.maxDelaySeconds}::float8)) end`;
}

class KeyClosed extends Error {
  constructor(readonly key: string) {
    super(`sign-in key ${key} is closed`);
  }
}

async function keysFor(db: Kysely<Database>, email: string, address: string): Promise<LimitKey[]> {
  const account = lower(email);
  const keys: LimitKey[] = [
    { key: `address:${address}`, account: null, policy: ADDRESS_POLICY },
    { key: `account-from-address:${account}|${address}`, account, policy: ACCOUNT_FROM_ADDRESS_POLICY },
  ];
  const known = await db
    .selectFrom("signInAttempts")
    .select("id")
    .where("email", "=", account)
    .where("address", "=", address)
    .where("succeeded", "=", true)
    .where("attemptedAt", ">", sql<Date>`now() - make_interval(days => ${KNOWN_ADDRESS_DAYS})`)
    .limit(1)
    .executeTakeFirst();
  if (!known) keys.push({ key: `account:${account}`, account, policy: ACCOUNT_POLICY });
  // One order for every attempt, so that concurrent transactions lock rows in the same order and never deadlock.
  return keys.sort((a, b) => (a.key < b.key ? -1 : 1));
}

/**
 * Takes one attempt's slot on every key of (email, address), all or none, before the password is checked.
 * Refused: how long until every key is open again.
 */
export async function consumeSignInSlot(db: Kysely<Database>, email: string, address: string): Promise<SignInSlot> {
  const keys = await keysFor(db, email, address);
  try {
    await db.transaction().execute(async (trx) => {
      for (const { key, account, policy } of keys) {
        if (!(await takeSlot(trx, key, account, policy))) throw new KeyClosed(key);
      }
    });
    return { allowed: true, keys };
  } catch (error) {
    if (!(error instanceof KeyClosed)) throw error;
    return { allowed: false, retryAfterSeconds: (await secondsUntilOpen(db, keys.map((k) => k.key))) ?? 1 };
  }
}

/** Takes one slot on a key when it is open (counting one more attempt against it); false when it is closed. */
async function takeSlot(db: Kysely<Database>, key: string, account: string | null, policy: LimitPolicy): Promise<boolean> {
  const forgotten = sql<boolean>`l.updated_at < now() - make_interval(hours => ${FORGET_AFTER_HOURS})`;
  const next = sql<number>`(case when ${forgotten} then 0 else l.failures end) + 1`;
  const row = await sql<{ failures: number }>`
    insert into sign_in_limits as l (key, account, failures, next_attempt_at, updated_at)
    values (${key}, ${account}, 1, now() + ${delayFor(sql<number>`1`, policy)}, now())
    on conflict (key) do update set
      failures = ${next},
      next_attempt_at = now() + ${delayFor(next, policy)},
      updated_at = now()
    where l.next_attempt_at <= now() or ${forgotten}
    returning failures`.execute(db);
  return row.rows.length > 0;
}

/** Seconds until every one of `keys` is open again, or null when all are open now. */
async function secondsUntilOpen(db: Kysely<Database>, keys: string[]): Promise<number | null> {
  const row = await db
    .selectFrom("signInLimits")
    .select(sql<number | null>`ceil(extract(epoch from max(next_attempt_at) - now()))`.as("seconds"))
    .where("key", "in", keys)
    .where("nextAttemptAt", ">", sql<Date>`now()`)
    .executeTakeFirst();
  return row?.seconds == null ? null : Math.max(1, Number(row.seconds));
}

/**
 * The same back-off for a credential that is not a password (a personal API token), keyed by client address:
 * `limitKeyWait` before the credential is looked up (null when the key is open), `countLimitFailure` after an
 * unknown one. Unlike a password attempt, a success takes no slot, so that a script's every request costs one
 * read here; concurrent guesses can overshoot the free failures by the number in flight, which is harmless against
 * a 256-bit secret and still closes the key for everyone after.
 */
export const limitKeyWait = (db: Kysely<Database>, key: string) => secondsUntilOpen(db, [key]);

export async function countLimitFailure(db: Kysely<Database>, key: string, policy: LimitPolicy): Promise<void> {
  await takeSlot(db, key, null, policy);
}

/**
 * After the password check: a success gives the slot back (the account-from-address key is cleared, the shared
 * keys count one failure less) and makes the address known to the account; either way the attempt is recorded.
 */
export async function settleSignInSlot(db: Kysely<Database>, slot: { keys: LimitKey[] }, email: string, address: string, succeeded: boolean): Promise<void> {
  await db.insertInto("signInAttempts").values({ email: lower(email), address, succeeded }).execute();
  await forgetStaleKeys(db);
  if (!succeeded) return;
  for (const { key, policy } of slot.keys) {
    if (policy === ACCOUNT_FROM_ADDRESS_POLICY) {
      await db.deleteFrom("signInLimits").where("key", "=", key).execute();
      continue;
    }
    const fewer = sql<number>`greatest(failures - 1, 0)`;
    await db
      .updateTable("signInLimits")
      .set({
        failures: fewer,
        nextAttemptAt: sql<Date>`case when ${fewer} < ${policy.freeFailures} then now() else next_attempt_at end`,
      })
      .where("key", "=", key)
      .execute();
  }
}

/** Deletes a bounded batch of keys that are open and untouched for a day (they would start over anyway). */
async function forgetStaleKeys(db: Kysely<Database>): Promise<void> {
  const stale = db
    .selectFrom("signInLimits")
    .select("key")
    .where("updatedAt", "<", sql<Date>`now() - make_interval(hours => ${FORGET_AFTER_HOURS})`)
    .where("nextAttemptAt", "<=", sql<Date>`now()`)
    .limit(100);
  await db.deleteFrom("signInLimits").where("key", "in", stale).execute();
}

/** Forgets the failures against an account (after its owner proved it with a reset link); address keys stay. */
export async function clearAccountLimits(db: Kysely<Database>, email: string): Promise<void> {
  await db.deleteFrom("signInLimits").where("account", "=", lower(email)).execute();
}

export function describeWait(seconds: number): string {
  if (seconds < 90) return `${Math.ceil(seconds)} seconds`;
  const minutes = Math.ceil(seconds / 60);
  return minutes === 1 ? "a minute" : `${minutes} minutes`;
}

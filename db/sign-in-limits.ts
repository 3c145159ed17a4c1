import "server-only";
import { type Kysely, sql } from "kysely";
import type { Database } from "./schema";

/** Failed sign-ins allowed in the window, per account and per client address (common practice: a few per quarter hour). */
export const SIGN_IN_WINDOW_MINUTES = 15;
export const MAX_FAILURES_PER_ACCOUNT = 5;
export const MAX_FAILURES_PER_ADDRESS = 20;

export async function recordSignInAttempt(db: Kysely<Database>, email: string, address: string, succeeded: boolean): Promise<void> {
  await db.insertInto("signInAttempts").values({ email: email.toLowerCase(), address, succeeded }).execute();
}

/** True when the account or the address has used up its failed attempts in the current window. */
export async function signInBlocked(db: Kysely<Database>, email: string, address: string): Promise<boolean> {
  const since = sql<Date>`now() - make_interval(mins => ${SIGN_IN_WINDOW_MINUTES})`;
  const row = await db
    .selectFrom("signInAttempts")
    .select([
      sql<string>`count(*) filter (where email = ${email.toLowerCase()})`.as("byAccount"),
      sql<string>`count(*) filter (where address = ${address})`.as("byAddress"),
    ])
    .where("succeeded", "=", false)
    .where("attemptedAt", ">", since)
    .executeTakeFirstOrThrow();
  return Number(row.byAccount) >= MAX_FAILURES_PER_ACCOUNT || Number(row.byAddress) >= MAX_FAILURES_PER_ADDRESS;
}

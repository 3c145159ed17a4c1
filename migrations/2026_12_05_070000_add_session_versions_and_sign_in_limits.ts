import { type Kysely, sql } from "kysely";

// Frozen in time: imports nothing from the app.
// users.session_version: every session token carries the version it was issued under; raising it ends them all
// (sign-out, password reset, "sign out everywhere").
// sign_in_limits: one row per limiter key (an address, an account, an account from one address), consumed
// atomically before a password is checked; failures past the free ones push next_attempt_at out exponentially.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema.alterTable("users").addColumn("session_version", "integer", (c) => c.notNull().defaultTo(0)).execute();
  await db.schema
    .createTable("sign_in_limits")
    .addColumn("key", "text", (c) => c.primaryKey())
    .addColumn("account", "text")
    .addColumn("failures", "integer", (c) => c.notNull().check(sql`failures >= 0`))
    .addColumn("next_attempt_at", "timestamptz", (c) => c.notNull())
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("sign_in_limits_account_idx").on("sign_in_limits").column("account").execute();
  await db.schema.createIndex("sign_in_limits_updated_idx").on("sign_in_limits").column("updated_at").execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("sign_in_limits").execute();
  await db.schema.alterTable("users").dropColumn("session_version").execute();
}

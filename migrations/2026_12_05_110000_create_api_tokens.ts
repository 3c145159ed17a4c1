import { type Kysely, sql } from "kysely";

// Frozen in time: imports nothing from the app.
// api_tokens: personal tokens for scripts and notebooks (Authorization: Bearer …). Only the SHA-256 of the token
// is kept; the token itself is shown once, when it is made. A token acts for its account with at most its scope
// (read, or read and write), optionally only in one project; it stops working when it expires or is revoked, and
// dies with its account (and with its project, when restricted to one).
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("api_tokens")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("user_id", "uuid", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("name", "text", (c) => c.notNull())
    .addColumn("token_hash", "text", (c) => c.notNull().unique())
    .addColumn("scope", "text", (c) => c.notNull().check(sql`scope in ('read', 'read-write')`))
    .addColumn("project_id", "uuid", (c) => c.references("projects.id").onDelete("cascade"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("expires_at", "timestamptz")
    .addColumn("last_used_at", "timestamptz")
    .addColumn("revoked_at", "timestamptz")
    .execute();
  await db.schema.createIndex("api_tokens_user_idx").on("api_tokens").columns(["user_id", "created_at"]).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("api_tokens").execute();
}

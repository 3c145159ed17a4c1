import { type Kysely, sql } from "kysely";

// Frozen in time: imports nothing from the app.
export async function up(db: Kysely<any>): Promise<void> {
  await sql`create extension if not exists pgcrypto`.execute(db);

  await db.schema
    .createTable("users")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("email", "text", (c) => c.notNull().check(sql`email = lower(email) and position('@' in email) > 1`))
    .addColumn("name", "text", (c) => c.notNull().check(sql`length(name) between 1 and 200`))
    .addColumn("password_hash", "text")
    .addColumn("site_role", "text", (c) => c.notNull().defaultTo("member").check(sql`site_role in ('admin', 'member')`))
    .addColumn("email_verified_at", "timestamptz")
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  // E-mail is stored lower-cased (the check above) and unique case-insensitively.
  await sql`create unique index users_email_lower_key on users (lower(email))`.execute(db);

  await db.schema
    .createTable("verification_tokens")
    .addColumn("identifier", "text", (c) => c.notNull())
    .addColumn("token", "text", (c) => c.notNull())
    .addColumn("expires_at", "timestamptz", (c) => c.notNull())
    .addPrimaryKeyConstraint("verification_tokens_pkey", ["identifier", "token"])
    .execute();
  await db.schema.createIndex("verification_tokens_expires_at_idx").on("verification_tokens").column("expires_at").execute();

  await db.schema
    .createTable("password_reset_tokens")
    .addColumn("token_hash", "text", (c) => c.primaryKey())
    .addColumn("user_id", "uuid", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("expires_at", "timestamptz", (c) => c.notNull())
    .addColumn("used_at", "timestamptz")
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("password_reset_tokens_user_id_idx").on("password_reset_tokens").column("user_id").execute();

  await db.schema
    .createTable("sign_in_attempts")
    .addColumn("id", "bigserial", (c) => c.primaryKey())
    .addColumn("email", "text", (c) => c.notNull())
    .addColumn("address", "text", (c) => c.notNull())
    .addColumn("succeeded", "boolean", (c) => c.notNull())
    .addColumn("attempted_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("sign_in_attempts_email_idx").on("sign_in_attempts").columns(["email", "attempted_at"]).execute();
  await db.schema.createIndex("sign_in_attempts_address_idx").on("sign_in_attempts").columns(["address", "attempted_at"]).execute();

  await db.schema
    .createTable("projects")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("name", "text", (c) => c.notNull().check(sql`length(name) between 1 and 200`))
    .addColumn("description", "text", (c) => c.notNull().defaultTo(""))
    .addColumn("created_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();

  await db.schema
    .createTable("project_members")
    .addColumn("project_id", "uuid", (c) => c.notNull().references("projects.id").onDelete("cascade"))
    .addColumn("user_id", "uuid", (c) => c.notNull().references("users.id").onDelete("cascade"))
    .addColumn("role", "text", (c) => c.notNull().check(sql`role in ('owner', 'editor', 'viewer')`))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint("project_members_pkey", ["project_id", "user_id"])
    .execute();
  await db.schema.createIndex("project_members_user_id_idx").on("project_members").column("user_id").execute();

  await db.schema
    .createTable("scenarios")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("project_id", "uuid", (c) => c.notNull().references("projects.id").onDelete("cascade"))
    .addColumn("title", "text", (c) => c.notNull().check(sql`length(title) between 1 and 200`))
    .addColumn("document", "jsonb", (c) => c.notNull())
    .addColumn("schema_version", "integer", (c) => c.notNull().check(sql`schema_version >= 1`))
    .addColumn("background_kind", "text", (c) => c.notNull())
    .addColumn("version", "integer", (c) => c.notNull().defaultTo(1).check(sql`version >= 1`))
    .addColumn("created_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("updated_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("scenarios_project_updated_idx").on("scenarios").columns(["project_id", "updated_at"]).execute();
  await sql`create index scenarios_project_title_idx on scenarios (project_id, lower(title))`.execute(db);

  await db.schema
    .createTable("scenario_revisions")
    .addColumn("id", "bigserial", (c) => c.primaryKey())
    .addColumn("scenario_id", "uuid", (c) => c.notNull().references("scenarios.id").onDelete("cascade"))
    .addColumn("version", "integer", (c) => c.notNull())
    .addColumn("title", "text", (c) => c.notNull())
    .addColumn("document", "jsonb", (c) => c.notNull())
    .addColumn("schema_version", "integer", (c) => c.notNull())
    .addColumn("created_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addUniqueConstraint("scenario_revisions_scenario_version_key", ["scenario_id", "version"])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const table of [
    "scenario_revisions", "scenarios", "project_members", "projects", "sign_in_attempts", "password_reset_tokens",
    "verification_tokens", "users",
  ]) {
    await db.schema.dropTable(table).ifExists().execute();
  }
}

import { type Kysely, sql } from "kysely";

// Frozen in time: imports nothing from the app. Tokens are never stored, only their SHA-256 (hex).
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("project_invitations")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("project_id", "uuid", (c) => c.notNull().references("projects.id").onDelete("cascade"))
    .addColumn("email", "text", (c) => c.notNull().check(sql`email = lower(email) and position('@' in email) > 1`))
    .addColumn("role", "text", (c) => c.notNull().check(sql`role in ('editor', 'viewer')`))
    .addColumn("token_hash", "text", (c) => c.notNull().unique())
    .addColumn("invited_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("sent_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("expires_at", "timestamptz", (c) => c.notNull())
    .addColumn("accepted_at", "timestamptz")
    .addColumn("accepted_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("revoked_at", "timestamptz")
    .execute();
  // One open invitation per address and project; used and revoked ones stay as history.
  await sql`create unique index project_invitations_open_key on project_invitations (project_id, email)
    where accepted_at is null and revoked_at is null`.execute(db);

  await db.schema
    .createTable("share_links")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("project_id", "uuid", (c) => c.notNull().references("projects.id").onDelete("cascade"))
    .addColumn("scenario_id", "uuid", (c) => c.notNull().references("scenarios.id").onDelete("cascade"))
    .addColumn("label", "text", (c) => c.notNull().check(sql`length(label) between 1 and 200`))
    .addColumn("token_hash", "text", (c) => c.notNull().unique())
    .addColumn("created_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("expires_at", "timestamptz")
    .addColumn("revoked_at", "timestamptz")
    .addColumn("view_count", "integer", (c) => c.notNull().defaultTo(0).check(sql`view_count >= 0`))
    .addColumn("last_viewed_at", "timestamptz")
    .execute();
  await db.schema.createIndex("share_links_scenario_idx").on("share_links").columns(["scenario_id", "created_at"]).execute();

  await db.schema
    .createTable("project_audit")
    .addColumn("id", "bigserial", (c) => c.primaryKey())
    .addColumn("project_id", "uuid", (c) => c.notNull().references("projects.id").onDelete("cascade"))
    .addColumn("actor_id", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("action", "text", (c) =>
      c.notNull().check(sql`action in ('member_added', 'invited', 'invitation_resent', 'invitation_revoked', 'invitation_accepted',
        'role_changed', 'member_removed', 'member_left', 'ownership_transferred')`),
    )
    .addColumn("target_user_id", "uuid", (c) => c.references("users.id").onDelete("set null"))
    // The address at the time, so the entry stays readable after the account is gone (and for invitations).
    .addColumn("target_email", "text", (c) => c.notNull())
    .addColumn("role", "text", (c) => c.check(sql`role in ('owner', 'editor', 'viewer')`))
    .addColumn("previous_role", "text", (c) => c.check(sql`previous_role in ('owner', 'editor', 'viewer')`))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("project_audit_project_idx").on("project_audit").columns(["project_id", "created_at"]).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  for (const table of ["project_audit", "share_links", "project_invitations"]) {
    await db.schema.dropTable(table).ifExists().execute();
  }
}

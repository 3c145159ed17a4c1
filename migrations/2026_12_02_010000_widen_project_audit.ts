import { type Kysely, sql } from "kysely";

/**
 * The project's audit grows beyond membership: share links made and revoked, attachments added and deleted, scenario
 * files imported. Such entries concern a scenario (kept by id, set null when it is deleted) and a subject named at the
 * time (the link's label, the file's name), and may have no person as target.
 */
const MEMBERSHIP_ACTIONS = [
  "member_added",
  "invited",
  "invitation_resent",
  "invitation_revoked",
  "invitation_accepted",
  "role_changed",
  "member_removed",
  "member_left",
  "ownership_transferred",
];
const SCENARIO_ACTIONS = ["share_link_created", "share_link_revoked", "attachment_added", "attachment_deleted", "scenario_imported"];

const inList = (actions: string[]) => sql.raw(actions.map((a) => `'${a}'`).join(", "));

export async function up(db: Kysely<any>): Promise<void> {
  await sql`alter table project_audit drop constraint project_audit_action_check`.execute(db);
  await sql`alter table project_audit add constraint project_audit_action_check check (action in (${inList([...MEMBERSHIP_ACTIONS, ...SCENARIO_ACTIONS])}))`.execute(db);
  await sql`alter table project_audit alter column target_email drop not null`.execute(db);
  await db.schema
    .alterTable("project_audit")
    .addColumn("scenario_id", "uuid", (c) => c.references("scenarios.id").onDelete("set null"))
    .addColumn("subject", "text")
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await sql`delete from project_audit where action in (${inList(SCENARIO_ACTIONS)})`.execute(db);
  await db.schema.alterTable("project_audit").dropColumn("subject").dropColumn("scenario_id").execute();
  await sql`alter table project_audit alter column target_email set not null`.execute(db);
  await sql`alter table project_audit drop constraint project_audit_action_check`.execute(db);
  await sql`alter table project_audit add constraint project_audit_action_check check (action in (${inList(MEMBERSHIP_ACTIONS)}))`.execute(db);
}

import { type Kysely, sql } from "kysely";

// Frozen in time: imports nothing from the app. A file kept with a scenario: its bytes live in object storage
// under object_key; this row says what it is, how big, and who put it there.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("attachments")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("project_id", "uuid", (c) => c.notNull().references("projects.id").onDelete("cascade"))
    .addColumn("scenario_id", "uuid", (c) => c.notNull().references("scenarios.id").onDelete("cascade"))
    .addColumn("file_name", "text", (c) => c.notNull().check(sql`length(file_name) between 1 and 255`))
    .addColumn("media_type", "text", (c) => c.notNull())
    .addColumn("size_bytes", "integer", (c) => c.notNull().check(sql`size_bytes > 0`))
    .addColumn("object_key", "text", (c) => c.notNull().unique())
    .addColumn("uploaded_by", "uuid", (c) => c.references("users.id").onDelete("set null"))
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .execute();
  await db.schema.createIndex("attachments_scenario_idx").on("attachments").columns(["scenario_id", "created_at"]).execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("attachments").execute();
}

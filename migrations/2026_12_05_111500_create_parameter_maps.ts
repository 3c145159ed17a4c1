import { type Kysely, sql } from "kysely";

// Frozen in time: imports nothing from the app. A parameter map: one quantity over a grid of two parameters,
// computed a row at a time by queue workers. parameter_maps holds what was asked (inputs: the document and the
// axes), its status, its progress (rows_done of rows_total) and, once done, the assembled grid (result).
// scenario_id is set for a map of a saved scenario (kept with it, gone with it); project_id with it, for the
// access check; a map of an unsaved document belongs to its creator alone. parameter_map_rows holds each finished
// row once (its primary key makes a retried chunk count once).
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("parameter_maps")
    .addColumn("id", "uuid", (c) => c.primaryKey().defaultTo(sql`gen_random_uuid()`))
    .addColumn("project_id", "uuid", (c) => c.references("projects.id").onDelete("cascade"))
    .addColumn("scenario_id", "uuid", (c) => c.references("scenarios.id").onDelete("cascade"))
    .addColumn("scenario_version", "integer")
    .addColumn("created_by", "uuid", (c) => c.references("users.id").onDelete("cascade"))
    .addColumn("inputs", "jsonb", (c) => c.notNull())
    .addColumn("status", "text", (c) => c.notNull().defaultTo("queued").check(sql`status in ('queued', 'running', 'done', 'cancelled', 'failed')`))
    .addColumn("rows_total", "integer", (c) => c.notNull())
    .addColumn("rows_done", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("result", "jsonb")
    .addColumn("failure", "text")
    .addColumn("created_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("updated_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addColumn("finished_at", "timestamptz")
    .addCheckConstraint("parameter_maps_scenario_has_project", sql`scenario_id is null or project_id is not null`)
    .execute();
  await db.schema.createIndex("parameter_maps_scenario_idx").on("parameter_maps").columns(["scenario_id", "created_at"]).execute();
  await db.schema.createIndex("parameter_maps_creator_status_idx").on("parameter_maps").columns(["created_by", "status"]).execute();
  await db.schema
    .createTable("parameter_map_rows")
    .addColumn("map_id", "uuid", (c) => c.notNull().references("parameter_maps.id").onDelete("cascade"))
    .addColumn("row_index", "integer", (c) => c.notNull())
    .addColumn("row_data", "jsonb", (c) => c.notNull())
    .addColumn("computed_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint("parameter_map_rows_pkey", ["map_id", "row_index"])
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("parameter_map_rows").ifExists().execute();
  await db.schema.dropTable("parameter_maps").ifExists().execute();
}

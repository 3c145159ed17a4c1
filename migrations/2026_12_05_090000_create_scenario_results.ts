import { type Kysely, sql } from "kysely";

// Frozen in time: imports nothing from the app. The computed outcome of a saved scenario at one version, so that
// share views, embeds and exports do not compute it again: a result, or the reasons it could not be computed.
// engine_key names the build that computed it (a new deployment computes again). Rate-limit counters for
// anonymous computation, in the layout rate-limiter-flexible's PostgreSQL store expects.
export async function up(db: Kysely<any>): Promise<void> {
  await db.schema
    .createTable("scenario_results")
    .addColumn("scenario_id", "uuid", (c) => c.notNull().references("scenarios.id").onDelete("cascade"))
    .addColumn("version", "integer", (c) => c.notNull())
    .addColumn("engine_key", "text", (c) => c.notNull())
    .addColumn("outcome", "jsonb", (c) => c.notNull())
    .addColumn("computed_at", "timestamptz", (c) => c.notNull().defaultTo(sql`now()`))
    .addPrimaryKeyConstraint("scenario_results_pkey", ["scenario_id", "version"])
    .execute();
  await db.schema
    .createTable("compute_rate_limits")
    .addColumn("key", "varchar(255)", (c) => c.primaryKey())
    .addColumn("points", "integer", (c) => c.notNull().defaultTo(0))
    .addColumn("expire", "bigint")
    .execute();
}

export async function down(db: Kysely<any>): Promise<void> {
  await db.schema.dropTable("compute_rate_limits").ifExists().execute();
  await db.schema.dropTable("scenario_results").ifExists().execute();
}

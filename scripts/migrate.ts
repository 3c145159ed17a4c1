/** Runs every pending migration (Kysely's Migrator), printing each step; exits non-zero on failure. */
import { Migrator } from "kysely";
import { createDb } from "../db/connect";
import { migrations } from "../migrations";

export async function migrateToLatest(connectionString?: string): Promise<void> {
  const db = createDb(connectionString, 2);
  const migrator = new Migrator({ db, provider: { getMigrations: async () => migrations } });
  const { error, results } = await migrator.migrateToLatest();
  for (const r of results ?? []) {
    console.log(`[migrate] ${r.status === "Success" ? "applied" : r.status.toLowerCase()} ${r.migrationName}`);
  }
  await db.destroy();
  if (error) throw error instanceof Error ? error : new Error(String(error));
  if (!results?.length) console.log("[migrate] database is up to date");
}

if (require.main === module) {
  migrateToLatest().catch((err) => {
    console.error("[migrate] failed:", err instanceof Error ? err.message : err);
    process.exit(1);
  });
}

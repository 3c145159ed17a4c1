/** Runs every pending migration in migrations/ (Kysely's Migrator), printing each step; exits non-zero on failure. */
import { promises as fs } from "node:fs";
import path from "node:path";
import { FileMigrationProvider, Migrator } from "kysely";
import { createDb } from "../db/connect";

export async function migrateToLatest(connectionString?: string): Promise<void> {
  const db = createDb(connectionString, 2);
  const migrator = new Migrator({
    db,
    provider: new FileMigrationProvider({ fs, path, migrationFolder: path.resolve(__dirname, "../migrations") }),
  });
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

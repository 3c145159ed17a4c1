import { CamelCasePlugin, Kysely, PostgresDialect } from "kysely";
import pg from "pg";
import { databaseUrl } from "./config";
import type { Database } from "./schema";

// jsonb arrives parsed; bigint ids stay strings (they can exceed 2^53); timestamps arrive as Date.
export function createDb(connectionString = databaseUrl(), max = 10): Kysely<Database> {
  const pool = new pg.Pool({ connectionString, max });
  return new Kysely<Database>({ dialect: new PostgresDialect({ pool }), plugins: [new CamelCasePlugin()] });
}

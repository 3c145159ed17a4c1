import "server-only";
import type { Kysely } from "kysely";
import { createDb } from "./connect";
import type { Database } from "./schema";

// One pool per server process; kept on globalThis so that hot reloads in development do not leak pools.
const holder = globalThis as unknown as { branchlineDb?: Kysely<Database> };

export function getDb(): Kysely<Database> {
  holder.branchlineDb ??= createDb();
  return holder.branchlineDb;
}

export type { Database } from "./schema";

/**
 * A scratch database for a test run or a bench: created on the server DATABASE_URL (or the project-local cluster)
 * names, migrated from zero, and dropped (even with connections left open) when done.
 */
import pg from "pg";
import { databaseUrl } from "../db/config";
import { migrateToLatest } from "../scripts/migrate";

/** Runs one statement on the server's maintenance database (creating and dropping databases). */
async function admin(serverUrl: URL, statement: string): Promise<void> {
  const url = new URL(serverUrl);
  url.pathname = "/postgres";
  const client = new pg.Client({ connectionString: url.toString() });
  await client.connect();
  try {
    await client.query(statement);
  } finally {
    await client.end();
  }
}

export interface ScratchDatabase {
  /** Its connection URL. */
  url: string;
  drop(): Promise<void>;
}

/** A fresh, migrated database named `name` (letters, digits and underscores). */
export async function createScratchDatabase(name: string): Promise<ScratchDatabase> {
  if (!/^[a-z0-9_]+$/.test(name)) throw new Error(`a scratch database name takes a-z, 0-9 and _ only: "${name}"`);
  const server = new URL(databaseUrl());
  await admin(server, `create database "${name}"`);
  const url = new URL(server);
  url.pathname = `/${name}`;
  await migrateToLatest(url.toString());
  return { url: url.toString(), drop: () => admin(server, `drop database if exists "${name}" with (force)`) };
}

/**
 * A fresh database per integration run, migrated from zero and dropped afterwards, on the server that
 * DATABASE_URL (or the project-local cluster) names. The server itself is started by scripts/test.sh.
 */
import pg from "pg";
import { databaseUrl } from "../../db/config";
import { migrateToLatest } from "../../scripts/migrate";

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

export default async function setup(): Promise<() => Promise<void>> {
  const name = `branchline_test_${Date.now()}_${process.pid}`;
  const url = new URL(databaseUrl());
  await admin(url, `create database "${name}"`);
  url.pathname = `/${name}`;
  await migrateToLatest(url.toString());
  process.env.DATABASE_URL = url.toString();
  process.env.NEXTAUTH_SECRET ??= "integration-test-secret";
  process.env.NEXTAUTH_URL ??= "http://localhost:3999";
  process.env.SMTP_URL ??= `smtp://127.0.0.1:${process.env.SMTP_FAKE_PORT ?? "2525"}`;
  // Many suites compute anonymously from one (absent) address; compute-pool.test.ts sets its own small limit.
  process.env.BRANCHLINE_COMPUTE_RATE_PER_MINUTE ??= "100000";
  process.env.BRANCHLINE_MAILBOX_URL ??= `http://127.0.0.1:${process.env.MAILBOX_PORT ?? "2526"}`;
  return async () => admin(url, `drop database if exists "${name}" with (force)`);
}

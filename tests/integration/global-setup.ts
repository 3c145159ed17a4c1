/**
 * A fresh database per integration run, migrated from zero and dropped afterwards, on the server that
 * DATABASE_URL (or the project-local cluster) names. The server itself is started by scripts/test.sh.
 */
import { createScratchDatabase } from "../scratch-database";

export default async function setup(): Promise<() => Promise<void>> {
  const database = await createScratchDatabase(`branchline_test_${Date.now()}_${process.pid}`);
  process.env.DATABASE_URL = database.url;
  process.env.NEXTAUTH_SECRET ??= "integration-test-secret";
  process.env.NEXTAUTH_URL ??= "http://localhost:3999";
  process.env.SMTP_URL ??= `smtp://127.0.0.1:${process.env.SMTP_FAKE_PORT ?? "2525"}`;
  // Many suites compute anonymously from one (absent) address; compute-pool.test.ts sets its own small limit.
  process.env.BRANCHLINE_COMPUTE_RATE_PER_MINUTE ??= "100000";
  process.env.BRANCHLINE_MAILBOX_URL ??= `http://127.0.0.1:${process.env.MAILBOX_PORT ?? "2526"}`;
  return database.drop;
}

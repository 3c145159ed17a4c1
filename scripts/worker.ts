/**
 * A parameter-map worker: `npm run worker` (DATABASE_URL, or BRANCHLINE_PG_PORT for the local cluster). Takes rows
 * of maps from the PostgreSQL job queue and computes them (lib/map-worker.ts). Start one per core, on any machine
 * that reaches the database; SIGINT or SIGTERM finishes the current row and stops. A worker that dies mid-row
 * leaves its row to be retried by another once it expires (lib/map-queue.ts says when).
 *   BRANCHLINE_WORKER_QUIET=1 prints only start and stop.
 */
import { createDb } from "../db/connect";
import { startMapWorker } from "../lib/map-worker";

async function main(): Promise<void> {
  const db = createDb(undefined, 2);
  const quiet = process.env.BRANCHLINE_WORKER_QUIET === "1";
  const worker = await startMapWorker({ db, log: quiet ? undefined : (line) => console.log(`[worker ${process.pid}] ${line}`) });
  console.log(`[worker ${process.pid}] ready: taking rows of parameter maps`);
  let stopping = false;
  const stop = async (signal: string) => {
    if (stopping) return;
    stopping = true;
    console.log(`[worker ${process.pid}] ${signal}: finishing the current row, then stopping`);
    await worker.stop(true);
    await db.destroy();
    console.log(`[worker ${process.pid}] stopped after ${worker.chunks()} rows`);
    process.exit(0);
  };
  process.on("SIGINT", () => void stop("SIGINT"));
  process.on("SIGTERM", () => void stop("SIGTERM"));
}

main().catch((error) => {
  console.error(`[worker ${process.pid}] could not start:`, error instanceof Error ? error.message : error);
  process.exit(1);
});

import "server-only";
import { CompiledQuery, type Kysely } from "kysely";
import PgBoss from "pg-boss";
import { databaseUrl } from "../db/config";
import type { Database } from "../db/schema";

/**
 * The job queue of parameter maps: pg-boss (its own tables in the schema "pgboss" of Branchline's database, made
 * and upgraded by pg-boss itself when a process starts it). One job per row of a map ("chunk"). A web process only
 * sends; workers (lib/map-worker.ts, `npm run worker`) fetch, compute and complete, and supervise: a job left
 * active past its expiry (its worker died) is failed by pg-boss's maintenance and retried, up to CHUNK_RETRY_LIMIT.
 *
 * Settings (environment, read here only):
 * - BRANCHLINE_MAP_CHUNK_EXPIRE_SECONDS (default 600): how long a chunk may stay active before it counts as
 *   abandoned. Longer than the slowest row (200 points at the cost ceiling, about a second each); a dead worker's
 *   chunk waits this long, plus up to one maintenance interval, before another worker takes it.
 * - BRANCHLINE_MAP_MAINTENANCE_SECONDS (default 30): how often the workers look for expired chunks (pg-boss runs
 *   the maintenance in one worker at a time).
 */
export const MAP_ROWS_QUEUE = "parameter-map-rows";
export const CHUNK_RETRY_LIMIT = 5;

export interface MapRowJob {
  mapId: string;
  row: number;
}

function secondsFromEnv(name: string, fallback: number): number {
  const value = Number(process.env[name]);
  return Number.isInteger(value) && value >= 1 ? value : fallback;
}

export const chunkExpireSeconds = () => secondsFromEnv("BRANCHLINE_MAP_CHUNK_EXPIRE_SECONDS", 600);
export const maintenanceSeconds = () => secondsFromEnv("BRANCHLINE_MAP_MAINTENANCE_SECONDS", 30);

/** A started pg-boss on the configured database, with the map queue created. Workers supervise; web processes do not. */
export async function startQueue(options: { supervise: boolean; connectionString?: string; max?: number }): Promise<PgBoss> {
  const boss = new PgBoss({
    connectionString: options.connectionString ?? databaseUrl(),
    max: options.max ?? 3,
    supervise: options.supervise,
    schedule: false,
    maintenanceIntervalSeconds: maintenanceSeconds(),
  });
  boss.on("error", (error) => console.error("[map-queue]", error));
  await boss.start();
  await boss.createQueue(MAP_ROWS_QUEUE);
  return boss;
}

// One sender per web process and database, kept on globalThis like the Kysely pool.
const holder = globalThis as unknown as { branchlineMapQueue?: { url: string; boss: Promise<PgBoss> } };

function sender(): Promise<PgBoss> {
  const url = databaseUrl();
  if (holder.branchlineMapQueue?.url !== url) {
    const boss = startQueue({ supervise: false, connectionString: url, max: 2 });
    boss.catch(() => {
      if (holder.branchlineMapQueue?.boss === boss) holder.branchlineMapQueue = undefined;
    });
    holder.branchlineMapQueue = { url, boss };
  }
  return holder.branchlineMapQueue!.boss;
}

/** Stops this process's sender, if it started one (tests, shutdown). */
export async function stopMapSender(): Promise<void> {
  const current = holder.branchlineMapQueue;
  holder.branchlineMapQueue = undefined;
  if (current) await (await current.boss).stop({ graceful: false, wait: true });
}

/** pg-boss runs its SQL through any { executeSql }: here, the caller's Kysely transaction. */
function inTransaction(trx: Kysely<Database>) {
  return {
    executeSql: async (text: string, values: unknown[] = []) => {
      const result = await trx.executeQuery(CompiledQuery.raw(text, values));
      return { rows: result.rows as unknown[] };
    },
  };
}

/** Queues one chunk per row of a map, inside the transaction that records the map. */
export async function enqueueMapRows(trx: Kysely<Database>, mapId: string, rows: number): Promise<void> {
  const boss = await sender();
  const jobs = Array.from({ length: rows }, (_, row) => ({
    name: MAP_ROWS_QUEUE,
    data: { mapId, row } satisfies MapRowJob,
    retryLimit: CHUNK_RETRY_LIMIT,
    retryDelay: 1,
    expireInSeconds: chunkExpireSeconds(),
  }));
  await boss.insert(jobs, { db: inTransaction(trx) } as PgBoss.InsertOptions);
}

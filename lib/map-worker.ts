import "server-only";
import type { Kysely } from "kysely";
import type PgBoss from "pg-boss";
import { failParameterMap, isActive, mapStatus, mapWork, recordMapRow, type MapInputs } from "../db/parameter-maps";
import type { Database } from "../db/schema";
import { computeMapPoint, mapRowOf, type MapPoint } from "../physics/maps";
import { MAP_ROWS_QUEUE, type MapRowJob, startQueue } from "./map-queue";

/**
 * A map worker: takes one chunk (a row of a map) at a time from the queue and computes its points in this process
 * with the physics of physics/maps (computeScenario per point). Between points it asks the database, at most every
 * STATUS_CHECK_MS, whether the map is still wanted, so a cancelled map stops within a fraction of a second of work.
 * A finished row goes to db/parameter-maps (recordMapRow), which counts progress and assembles the grid.
 * Run as many as there are cores, on as many machines as reach the database (`npm run worker`).
 */
const STATUS_CHECK_MS = 250;

export interface MapWorker {
  /** Chunks this worker has finished (kept or found unwanted). */
  chunks(): number;
  /** Stops taking chunks; waits for the current one unless `graceful` is false. */
  stop(graceful?: boolean): Promise<void>;
}

export interface MapWorkerOptions {
  db: Kysely<Database>;
  /** How often an idle worker asks for a chunk (default 0.5 s). */
  pollingIntervalSeconds?: number;
  log?: (line: string) => void;
}

/** What a worker remembers of the maps it works on: their inputs, and when it last found each still wanted. */
export interface ChunkMemory {
  inputs: Map<string, MapInputs>;
  checkedAt: Map<string, number>;
}

export const chunkMemory = (): ChunkMemory => ({ inputs: new Map(), checkedAt: new Map() });

/**
 * Computes one chunk: false when the map was gone or cancelled (before or during the row). Whether the map is still
 * wanted is asked at most every STATUS_CHECK_MS, across its rows too: a row of a map asked about a moment ago starts
 * without a query (recordMapRow checks again before it keeps anything).
 */
export async function computeChunk(db: Kysely<Database>, job: MapRowJob, memory: ChunkMemory = chunkMemory()): Promise<boolean> {
  const stillWanted = async () => {
    const at = memory.checkedAt.get(job.mapId);
    if (at !== undefined && Date.now() - at <= STATUS_CHECK_MS) return true;
    const active = isActive(await mapStatus(db, job.mapId));
    if (active) memory.checkedAt.set(job.mapId, Date.now());
    return active;
  };
  let inputs = memory.inputs.get(job.mapId);
  if (!inputs) {
    const work = await mapWork(db, job.mapId);
    if (!work || !isActive(work.status)) return false;
    inputs = work.inputs;
    memory.inputs.set(job.mapId, inputs);
    memory.checkedAt.set(job.mapId, Date.now());
  } else if (!(await stillWanted())) {
    return false;
  }
  const points: MapPoint[] = [];
  for (let column = 0; column < inputs.request.x.points; column++) {
    if (!(await stillWanted())) return false;
    points.push(computeMapPoint(inputs.document, inputs.request, column, job.row));
  }
  return recordMapRow(db, job.mapId, mapRowOf(job.row, points));
}

/**
 * The loop: fetch one chunk, compute it, complete it (or fail it, for pg-boss to retry), and fetch the next at once;
 * only an empty queue waits, `pollingIntervalSeconds`. (pg-boss's own work() loop also waits after a chunk quicker
 * than its polling interval, which would add up to half a second to every row.)
 */
export async function startMapWorker(options: MapWorkerOptions): Promise<MapWorker> {
  const log = options.log ?? (() => undefined);
  const idleMs = (options.pollingIntervalSeconds ?? 0.5) * 1000;
  const boss: PgBoss = await startQueue({ supervise: true });
  const memory = chunkMemory();
  let chunks = 0;
  let stopping = false;
  let wake: (() => void) | null = null;

  const runOne = async (job: PgBoss.JobWithMetadata<MapRowJob>) => {
    log(`map ${job.data.mapId} row ${job.data.row}: started (try ${job.retryCount + 1})`);
    try {
      const kept = await computeChunk(options.db, job.data, memory);
      await boss.complete(MAP_ROWS_QUEUE, job.id);
      chunks++;
      log(`map ${job.data.mapId} row ${job.data.row}: ${kept ? "done" : "not wanted (map cancelled or gone)"}`);
    } catch (error) {
      const message = error instanceof Error ? error.message : String(error);
      log(`map ${job.data.mapId} row ${job.data.row}: failed (${message})`);
      // pg-boss retries the chunk; once its retries are spent, the map cannot complete and says why.
      if (job.retryCount >= job.retryLimit) await failParameterMap(options.db, job.data.mapId, `row ${job.data.row} failed: ${message}`);
      await boss.fail(MAP_ROWS_QUEUE, job.id, { message });
    }
    if (memory.inputs.size > 32) {
      memory.inputs.clear();
      memory.checkedAt.clear();
    }
  };

  const loop = (async () => {
    while (!stopping) {
      let jobs: PgBoss.JobWithMetadata<MapRowJob>[] = [];
      try {
        jobs = await boss.fetch<MapRowJob>(MAP_ROWS_QUEUE, { batchSize: 1, includeMetadata: true });
      } catch (error) {
        console.error("[map-worker] could not fetch a chunk:", error instanceof Error ? error.message : error);
      }
      if (jobs.length > 0) {
        await runOne(jobs[0]);
        continue;
      }
      await new Promise<void>((resolve) => {
        const timer = setTimeout(resolve, idleMs);
        wake = () => {
          clearTimeout(timer);
          resolve();
        };
      });
      wake = null;
    }
  })();

  return {
    chunks: () => chunks,
    stop: async (graceful = true) => {
      stopping = true;
      (wake as (() => void) | null)?.();
      if (graceful) await loop;
      await boss.stop({ graceful, wait: true, timeout: 30_000 });
    },
  };
}

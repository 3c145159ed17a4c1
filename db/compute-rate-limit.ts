import "server-only";
import pg from "pg";
import { RateLimiterPostgres, RateLimiterRes } from "rate-limiter-flexible";
import { databaseUrl } from "./config";

/**
 * The limit on anonymous computations per client address: BRANCHLINE_COMPUTE_RATE_PER_MINUTE (default 60) in any
 * rolling minute, counted in PostgreSQL (table compute_rate_limits, made by its migration) so that every server
 * process shares the count. rate-limiter-flexible's PostgreSQL store consumes a point with one atomic upsert.
 */
const DEFAULT_PER_MINUTE = 60;

export function computeRatePerMinute(): number {
  const value = Number(process.env.BRANCHLINE_COMPUTE_RATE_PER_MINUTE);
  return Number.isInteger(value) && value > 0 ? value : DEFAULT_PER_MINUTE;
}

// One limiter (and its small pool) per server process and database, kept on globalThis like the Kysely pool.
const holder = globalThis as unknown as { branchlineComputeLimiter?: { url: string; points: number; limiter: RateLimiterPostgres } };

function limiter(): RateLimiterPostgres {
  const url = databaseUrl();
  const points = computeRatePerMinute();
  if (holder.branchlineComputeLimiter?.url !== url || holder.branchlineComputeLimiter.points !== points) {
    const pool = new pg.Pool({ connectionString: url, max: 2 });
    const instance = new RateLimiterPostgres({ storeClient: pool, storeType: "pool", tableName: "compute_rate_limits", tableCreated: true, keyPrefix: "compute", points, duration: 60 });
    holder.branchlineComputeLimiter = { url, points, limiter: instance };
  }
  return holder.branchlineComputeLimiter!.limiter;
}

/**
 * Counts `computations` (one, or a sweep's points, at most a minute's worth) for the key: null when allowed, else
 * the seconds until they are.
 */
export async function consumeComputePoint(key: string, computations = 1): Promise<number | null> {
  try {
    await limiter().consume(key, Math.min(Math.max(1, computations), computeRatePerMinute()));
    return null;
  } catch (rejection) {
    if (rejection instanceof RateLimiterRes) return Math.ceil(rejection.msBeforeNext / 1000);
    throw rejection;
  }
}

/**
 * Bench of parameter maps through the queue (figures printed, nothing asserted): a map of BENCH_MAP_SIDE ×
 * BENCH_MAP_SIDE points (default 200 × 200) computed by 1 worker process and then by 2, with the times and the
 * speed-up (target ≥ 1.8× on a 2-core machine); the cost of one map point against one plain computation of the
 * same document; and the queue's overhead per chunk (a row): workers × wall time / rows, less the row's own
 * computing. Runs on a fresh database on the configured server (DATABASE_URL, or the project-local cluster),
 * dropped afterwards. Run: npm run bench (it starts this when the database answers), or directly:
 *   node --conditions react-server --import tsx tests/bench/maps.ts
 */
import { type ChildProcess, spawn } from "node:child_process";
import path from "node:path";
import pg from "pg";
import { createDb } from "../../db/connect";
import { databaseUrl } from "../../db/config";
import { createParameterMap, mapStatus } from "../../db/parameter-maps";
import { createUser } from "../../db/users";
import { stopMapSender, enqueueMapRows } from "../../lib/map-queue";
import { computeScenario } from "../../physics/compute";
import { axisValues, computeMapPoint, type MapRequest } from "../../physics/maps";
import { defaultScenarioDocument, type ScenarioDocument } from "../../physics/scenario/schema";
import { migrateToLatest } from "../../scripts/migrate";

const SIDE = Number(process.env.BENCH_MAP_SIDE ?? 200);
const root = path.resolve(__dirname, "../..");

/** The run.ts bench scenario (Rindler, 10 ms ramps around a 30 ms hold), mapped over both ramp-and-hold times. */
const document: ScenarioDocument = {
  ...defaultScenarioDocument(),
  background: { kind: "rindler", accelerationMetresPerSecondSquared: 9.81 },
  protocol: { kind: "segments", separation: { durationSeconds: 0.01, shape: "minimum-jerk" }, hold: { durationSeconds: 0.03 }, recombination: { durationSeconds: 0.01, shape: "minimum-jerk" } },
};
const request: MapRequest = {
  x: { parameter: "recombination-time", from: 2e-3, to: 5e-2, points: SIDE, scale: "log" },
  y: { parameter: "hold-time", from: 1e-2, to: 1, points: SIDE, scale: "log" },
  quantity: "total-quanta",
};

const median = (values: number[]) => [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)];

async function admin(statement: string): Promise<void> {
  const url = new URL(databaseUrl());
  url.pathname = "/postgres";
  const client = new pg.Client({ connectionString: url.toString() });
  await client.connect();
  try {
    await client.query(statement);
  } finally {
    await client.end();
  }
}

function startWorker(url: string): Promise<ChildProcess> {
  const child = spawn(process.execPath, ["--conditions", "react-server", "--import", "tsx", "scripts/worker.ts"], {
    cwd: root,
    env: { ...process.env, DATABASE_URL: url, BRANCHLINE_WORKER_QUIET: "1" },
    stdio: ["ignore", "pipe", "inherit"],
  });
  return new Promise((resolve, reject) => {
    child.stdout!.on("data", (chunk: Buffer) => chunk.toString().includes("ready") && resolve(child));
    child.once("exit", (code) => reject(new Error(`a worker exited with ${code} before it was ready`)));
  });
}

async function stop(children: ChildProcess[]): Promise<void> {
  await Promise.all(children.map((c) => new Promise((resolve) => (c.exitCode !== null ? resolve(null) : (c.once("exit", resolve), c.kill("SIGTERM"))))));
}

async function main(): Promise<void> {
  // Per point: a map point (parameters set, quantity read off) against one plain computation of the document.
  const single = median(Array.from({ length: 41 }, () => { const t = performance.now(); computeScenario(document); return performance.now() - t; }));
  const columns = axisValues(request.x).length;
  const pointTimes = Array.from({ length: 41 }, (_, k) => { const t = performance.now(); computeMapPoint(document, request, (k * 37) % columns, (k * 53) % SIDE); return performance.now() - t; });
  const perPoint = median(pointTimes);

  const name = `branchline_bench_maps_${process.pid}`;
  const url = new URL(databaseUrl());
  url.pathname = `/${name}`;
  await admin(`create database "${name}"`);
  process.env.DATABASE_URL = url.toString();
  const db = createDb(url.toString(), 4);
  const lines = [`map ${SIDE} × ${SIDE} = ${SIDE * SIDE} points of the Rindler bench scenario (recombination time × hold time), one chunk per row`];
  const wall: Record<number, number> = {};
  try {
    await migrateToLatest(url.toString());
    for (const workers of [1, 2]) {
      const children = await Promise.all(Array.from({ length: workers }, () => startWorker(url.toString())));
      const user = await createUser(db, { email: `bench-${workers}-${Date.now()}@example.test`, name: "Bench" });
      // The clock starts once the rows are queued (the first run also starts this process's queue sender).
      const map = await createParameterMap(db, { userId: user.id, siteRole: "member" }, { document, request }, enqueueMapRows);
      const started = performance.now();
      while ((await mapStatus(db, map.id)) !== "done") await new Promise((r) => setTimeout(r, 200));
      wall[workers] = (performance.now() - started) / 1000;
      await stop(children);
      const overhead = (workers * wall[workers] * 1000) / SIDE - columns * perPoint;
      lines.push(`${workers} worker${workers > 1 ? "s" : ""}: ${wall[workers].toFixed(1)} s (${((wall[workers] * 1000) / (SIDE * SIDE)).toFixed(2)} ms a point of wall time); queue overhead ≈ ${overhead.toFixed(0)} ms a chunk (workers × wall / rows − a row's computing)`);
    }
  } finally {
    await stopMapSender();
    await db.destroy();
    await admin(`drop database if exists "${name}" with (force)`);
  }
  lines.push(
    `speed-up 2 workers / 1: ${(wall[1] / wall[2]).toFixed(2)}× (target ≥ 1.8× on 2 cores: ${wall[1] / wall[2] >= 1.8 ? "met" : "not met"})`,
    `one map point: median ${perPoint.toFixed(2)} ms against ${single.toFixed(2)} ms for one plain computation of the document (${(perPoint / single).toFixed(2)}×)`,
  );
  console.log(lines.join("\n"));
}

main().catch((error) => {
  console.error("map bench failed:", error instanceof Error ? error.message : error);
  process.exitCode = 1;
});

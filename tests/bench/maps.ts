/**
 * Bench of parameter maps through the queue (figures printed, nothing asserted): a map of BENCH_MAP_SIDE ×
 * BENCH_MAP_SIDE points (default 200 × 200) computed by 1 worker process and then by 2, with the times and the
 * speed-up (target ≥ 1.8× on a 2-core machine); the cost of one map point against one plain computation of the
 * same point; the queue's overhead per chunk (a row), from a map of two points a row; and the machine's own ceiling,
 * two plain compute loops at once against one alone (compute-loop.ts), which no number of workers can beat. Runs on a fresh database on the configured server (DATABASE_URL, or the project-local cluster),
 * dropped afterwards. Run: npm run bench (it starts this when the database answers), or directly:
 *   node --conditions react-server --import tsx tests/bench/maps.ts
 */
import { type ChildProcess, spawn } from "node:child_process";
import { cpus, loadavg } from "node:os";
import path from "node:path";
import { createDb } from "../../db/connect";
import { createParameterMap, mapStatus } from "../../db/parameter-maps";
import { createUser } from "../../db/users";
import { stopMapSender, enqueueMapRows } from "../../lib/map-queue";
import { computeScenario } from "../../physics/compute";
import { axisValues, computeMapPoint, documentAt, type MapRequest } from "../../physics/maps";
import type { ScenarioDocument } from "../../physics/scenario/schema";
import { benchMapDocument } from "./map-bench-scenario";
import { createScratchDatabase } from "../scratch-database";

const SIDE = Number(process.env.BENCH_MAP_SIDE ?? 200);
const root = path.resolve(__dirname, "../..");

const document: ScenarioDocument = benchMapDocument;
const request: MapRequest = {
  x: { parameter: "recombination-time", from: 2e-3, to: 5e-2, points: SIDE, scale: "log" },
  y: { parameter: "hold-time", from: 1e-2, to: 1, points: SIDE, scale: "log" },
  quantity: "total-quanta",
};

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

/** Plain computations a second in one process alone, and in each of two running at once (compute-loop.ts). */
async function computeLoops(count: number): Promise<number[]> {
  const runs = Array.from(
    { length: count },
    () =>
      new Promise<number>((resolve, reject) => {
        const child = spawn(process.execPath, ["--import", "tsx", "tests/bench/compute-loop.ts"], { cwd: root, stdio: ["ignore", "pipe", "inherit"] });
        let out = "";
        child.stdout!.on("data", (chunk: Buffer) => (out += chunk.toString()));
        child.once("exit", (code) => (code === 0 ? resolve((JSON.parse(out) as { perSecond: number }).perSecond) : reject(new Error(`a compute loop exited with ${code}`))));
      }),
  );
  return Promise.all(runs);
}

async function stop(children: ChildProcess[]): Promise<void> {
  await Promise.all(children.map((c) => new Promise((resolve) => (c.exitCode !== null ? resolve(null) : (c.once("exit", resolve), c.kill("SIGTERM"))))));
}

async function main(): Promise<void> {
  // Per point, on the same points: a map point (both parameters set, the quantity read off) against one plain
  // computation of the document at that point. Rows sampled across the grid (the cost varies with the durations).
  const columns = axisValues(request.x).length;
  const xs = axisValues(request.x);
  const ys = axisValues(request.y);
  let mapMs = 0;
  let plainMs = 0;
  const sampledRows = [0, Math.floor(SIDE / 2), SIDE - 1];
  // A first pass warms the engine (compiled code, spectrum cache) for both; then each point is timed both ways,
  // in alternating order, so neither side gets the other's warm cache more often.
  for (const row of sampledRows) for (let column = 0; column < columns; column++) computeMapPoint(document, request, column, row);
  for (const row of sampledRows) {
    for (let column = 0; column < columns; column++) {
      const timeMap = () => {
        const t = performance.now();
        computeMapPoint(document, request, column, row);
        mapMs += performance.now() - t;
      };
      const timePlain = () => {
        const t = performance.now();
        computeScenario(documentAt(document, request, xs[column], ys[row]));
        plainMs += performance.now() - t;
      };
      if (column % 2 === 0) (timeMap(), timePlain());
      else (timePlain(), timeMap());
    }
  }
  const points = sampledRows.length * columns;
  const perPoint = mapMs / points;
  const rowMs = mapMs / sampledRows.length;

  const database = await createScratchDatabase(`branchline_bench_maps_${process.pid}`);
  const url = database.url;
  process.env.DATABASE_URL = url;
  const db = createDb(url, 4);
  const lines = [`map ${SIDE} × ${SIDE} = ${SIDE * SIDE} points of the Rindler bench scenario (recombination time × hold time), one chunk per row`];
  const wall: Record<number, number> = {};
  try {
    const runMap = async (workers: number, mapRequest: MapRequest) => {
      const children = await Promise.all(Array.from({ length: workers }, () => startWorker(url)));
      const user = await createUser(db, { email: `bench-${workers}-${Date.now()}@example.test`, name: "Bench" });
      // The clock starts once the rows are queued (the first run also starts this process's queue sender).
      const map = await createParameterMap(db, { userId: user.id, siteRole: "member" }, { document, request: mapRequest }, enqueueMapRows);
      const started = performance.now();
      while ((await mapStatus(db, map.id)) !== "done") await new Promise((r) => setTimeout(r, 100));
      const seconds = (performance.now() - started) / 1000;
      await stop(children);
      return seconds;
    };
    for (const workers of [1, 2]) {
      wall[workers] = await runMap(workers, request);
      lines.push(`${workers} worker${workers > 1 ? "s" : ""}: ${wall[workers].toFixed(1)} s (${((wall[workers] * 1000) / (SIDE * SIDE)).toFixed(2)} ms a point of wall time; a row computed alone: ${rowMs.toFixed(0)} ms)`);
    }
    // The queue's own cost: rows of two points each, so that nearly all of a chunk's time is fetching, recording, completing.
    const thin: MapRequest = { ...request, x: { ...request.x, points: 2 } };
    const thinSeconds = await runMap(1, thin);
    lines.push(`queue overhead per chunk: ${((thinSeconds * 1000) / SIDE - 2 * perPoint).toFixed(1)} ms (a 2 × ${SIDE} map by 1 worker: wall / rows − two points' computing)`);
  } finally {
    await stopMapSender();
    await db.destroy();
    await database.drop();
  }
  // The machine's own ceiling: two plain compute loops at once against one alone (no queue, no database).
  // This machine's speed drifts from minute to minute (a shared host): one loop alone before and after the pair.
  const [aloneBefore] = await computeLoops(1);
  const together = await computeLoops(2);
  const [aloneAfter] = await computeLoops(1);
  const alone = (aloneBefore + aloneAfter) / 2;
  const ceiling = together.reduce((a, b) => a + b, 0) / alone;
  lines.push(
    `speed-up 2 workers / 1: ${(wall[1] / wall[2]).toFixed(2)}× (target ≥ 1.8× on 2 cores: ${wall[1] / wall[2] >= 1.8 ? "met" : "not met"})`,
    `this machine's own ceiling: two plain compute loops at once do ${ceiling.toFixed(2)}× the computations of one alone (${together.map((r) => r.toFixed(0)).join(" + ")} against ${aloneBefore.toFixed(0)} and ${aloneAfter.toFixed(0)} a second alone, before and after): the most a second worker can give here, queue or not`,
    `one map point: ${perPoint.toFixed(2)} ms on average against ${(plainMs / points).toFixed(2)} ms for one plain computation of the same point (${(mapMs / plainMs).toFixed(2)}×; ${points} points of ${sampledRows.length} rows)`,
    `load average while measuring: ${loadavg().map((l) => l.toFixed(1)).join(", ")} on ${cpus().length} cores (other work on the machine slows both runs and hides the speed-up)`,
  );
  console.log(lines.join("\n"));
}

main().catch((error) => {
  console.error("map bench failed:", error instanceof Error ? error.message : error);
  process.exitCode = 1;
});

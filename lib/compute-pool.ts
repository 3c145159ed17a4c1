import { mkdir, readdir, rename, stat } from "node:fs/promises";
import os from "node:os";
import path from "node:path";
import type { Worker as WorkerThread } from "node:worker_threads";
import type { ComputeTaskOutcome } from "./compute-task";

/**
 * Scenario computations off the request thread: a fixed set of worker threads (one per core but one, at least
 * one, or BRANCHLINE_COMPUTE_THREADS) running lib/compute-worker.mjs, a bounded first-in first-out queue in front of them,
 * and a time budget per computation (BRANCHLINE_COMPUTE_BUDGET_MS, 2 s) counted from the moment a thread takes
 * it. A computation past its budget is cancelled by terminating its thread, which is replaced at once, so the
 * pool recovers; its caller learns "over-budget". A full queue, or a computation that waits longer than
 * QUEUE_WAIT_MS for a thread, is "busy" (the caller answers 503 and may retry).
 *
 * Why not run it in the route: the server has one JavaScript thread for every request, and a computation holds
 * it for as long as it runs (seconds for a costly document), so every other request would wait for it.
 */

export type PoolOutcome = ComputeTaskOutcome | { kind: "over-budget"; budgetMs: number } | { kind: "busy"; reason: string };

interface Job {
  id: number;
  input: unknown;
  costCeiling: number | undefined;
  budgetMs: number;
  resolve(outcome: PoolOutcome): void;
  reject(error: Error): void;
  queueTimer: NodeJS.Timeout | null;
}

interface Slot {
  worker: WorkerThread;
  ready: boolean;
  job: Job | null;
  budgetTimer: NodeJS.Timeout | null;
}

const DEFAULT_BUDGET_MS = 2000;
const QUEUE_WAIT_MS = 10_000;
const STARTUP_WAIT_MS = 120_000;

function positiveIntegerFromEnv(name: string, fallback: number): number {
  const value = Number(process.env[name]);
  return Number.isInteger(value) && value > 0 ? value : fallback;
}

/** The per-computation time budget in milliseconds (BRANCHLINE_COMPUTE_BUDGET_MS, default 2000). */
export function computeBudgetMs(): number {
  return positiveIntegerFromEnv("BRANCHLINE_COMPUTE_BUDGET_MS", DEFAULT_BUDGET_MS);
}

/**
 * The worker entry and the task it runs are read from the project folder at run time, never through Next's bundle
 * (a bundled route cannot hand a thread its own modules): Next serves from the project folder (next start, next
 * dev and vitest all run there). The task, lib/compute-task.ts with the physics and mathjs, is bundled by esbuild
 * into one file under .next/compute-worker/ when the pool starts (about a second; esbuild runs in its own process,
 * so the server's thread stays free): a thread loads one file several times faster than the hundreds of modules
 * it comes from, which matters each time a thread is replaced after a cancellation.
 */
const projectFolder = () => process.cwd();

/**
 * Worker threads are reached through process.getBuiltinModule, not an import: Next's bundler rewrites a
 * `new Worker(path)` it can see into its own worker loader, which cannot load a file named at run time.
 */
const { Worker } = process.getBuiltinModule("node:worker_threads") as typeof import("node:worker_threads");
const workerEntry = () => path.join(projectFolder(), "lib", "compute-worker.mjs");

/** Latest modification time of the bundle's sources: the physics, the task, and the installed packages. */
async function newestSourceMs(): Promise<number> {
  const root = projectFolder();
  const physics = (await readdir(path.join(root, "physics"), { recursive: true })).map((file) => path.join(root, "physics", file));
  const files = [...physics, path.join(root, "lib", "compute-task.ts"), path.join(root, "package-lock.json")];
  const times = await Promise.all(files.map((file) => stat(file).then((s) => s.mtimeMs, () => 0)));
  return Math.max(...times);
}

/** The bundle of the task, made again only when a source is newer than it (each vitest file starts a pool). */
async function bundleTask(): Promise<string> {
  const folder = path.join(projectFolder(), ".next", "compute-worker");
  const outfile = path.join(folder, "compute-task.mjs");
  const built = await stat(outfile).then((s) => s.mtimeMs, () => 0);
  if (built > (await newestSourceMs())) return outfile;
  const { build } = await import("esbuild");
  await mkdir(folder, { recursive: true });
  const staging = `${outfile}.${process.pid}.${Date.now()}`;
  await build({
    entryPoints: [path.join(projectFolder(), "lib", "compute-task.ts")],
    bundle: true,
    platform: "node",
    format: "esm",
    target: "node20",
    outfile: staging,
    logLevel: "error",
  });
  // Renamed into place whole, so a process starting meanwhile never loads half a file.
  await rename(staging, outfile);
  return outfile;
}

class ComputePool {
  private readonly slots: Slot[] = [];
  private readonly queue: Job[] = [];
  private nextId = 1;
  private everReady = false;
  /** Computations handed to a thread since the process started (tests and benches read it). */
  started = 0;
  /** Threads terminated for overrunning their budget. */
  cancelled = 0;

  private taskBundle: string | null = null;

  constructor(
    readonly size: number,
    readonly maxQueue: number,
  ) {
    bundleTask().then(
      (bundle) => {
        this.taskBundle = bundle;
        for (let i = 0; i < size; i++) this.slots.push(this.spawn());
      },
      (error) => {
        console.error("[compute] could not bundle lib/compute-task.ts for the worker threads", error);
        this.queue.splice(0).forEach((job) => job.reject(new Error("the compute pool could not start")));
      },
    );
  }

  private spawn(): Slot {
    const worker = new Worker(workerEntry(), { workerData: { taskBundle: this.taskBundle } });
    const slot: Slot = { worker, ready: false, job: null, budgetTimer: null };
    worker.unref();
    worker.on("message", (message: { ready?: true; id?: number; outcome?: ComputeTaskOutcome; failure?: string }) => {
      if (message.ready) {
        slot.ready = true;
        if (!this.everReady) {
          this.everReady = true;
          this.queue.forEach((job) => this.startQueueTimer(job, QUEUE_WAIT_MS));
        }
        this.dispatch();
        return;
      }
      const job = slot.job;
      if (!job || job.id !== message.id) return;
      this.release(slot);
      if (message.outcome) job.resolve(message.outcome);
      else job.reject(new Error(`the computation failed in its worker: ${message.failure}`));
      this.dispatch();
    });
    worker.on("error", (error) => {
      if (slot.ready) this.replace(slot, error);
      else console.error("[compute] a worker failed to start", error);
    });
    worker.on("exit", (code) => {
      if (!this.slots.includes(slot)) return;
      if (slot.ready) return this.replace(slot, new Error(`a compute worker stopped (exit code ${code})`));
      // A thread that cannot even load (a missing file, a syntax error) would fail again at once: try again after
      // a pause rather than in a loop; waiting callers are answered "busy" by their queue timer.
      setTimeout(() => this.replace(slot, null), 1000).unref();
    });
    return slot;
  }

  private release(slot: Slot): void {
    if (slot.budgetTimer) clearTimeout(slot.budgetTimer);
    slot.budgetTimer = null;
    slot.job = null;
  }

  /** Puts a fresh thread in the slot's place; the job it held, if any, fails with `error`. */
  private replace(slot: Slot, error: Error | null): void {
    const index = this.slots.indexOf(slot);
    if (index < 0) return;
    const job = slot.job;
    this.release(slot);
    this.slots[index] = this.spawn();
    void slot.worker.terminate();
    if (job && error) job.reject(error);
  }

  private dispatch(): void {
    for (const slot of this.slots) {
      if (!slot.ready || slot.job) continue;
      const job = this.queue.shift();
      if (!job) return;
      if (job.queueTimer) clearTimeout(job.queueTimer);
      slot.job = job;
      this.started++;
      slot.budgetTimer = setTimeout(() => {
        this.cancelled++;
        this.replace(slot, null);
        job.resolve({ kind: "over-budget", budgetMs: job.budgetMs });
      }, job.budgetMs);
      slot.worker.postMessage({ id: job.id, input: job.input, costCeiling: job.costCeiling });
    }
  }

  run(input: unknown, options: { budgetMs?: number; costCeiling?: number } = {}): Promise<PoolOutcome> {
    if (this.queue.length >= this.maxQueue) {
      return Promise.resolve({ kind: "busy", reason: `${this.queue.length} computations are already waiting` });
    }
    return new Promise<PoolOutcome>((resolve, reject) => {
      const job: Job = { id: this.nextId++, input, costCeiling: options.costCeiling, budgetMs: options.budgetMs ?? computeBudgetMs(), resolve, reject, queueTimer: null };
      this.startQueueTimer(job, this.everReady ? QUEUE_WAIT_MS : STARTUP_WAIT_MS);
      this.queue.push(job);
      this.dispatch();
    });
  }

  /**
   * A job waits at most QUEUE_WAIT_MS for a thread once the pool has loaded; before, STARTUP_WAIT_MS: the first
   * threads of a process take seconds to load the physics, and the first callers wait for them rather than fail.
   */
  private startQueueTimer(job: Job, waitMs: number): void {
    if (job.queueTimer) clearTimeout(job.queueTimer);
    job.queueTimer = setTimeout(() => {
      const at = this.queue.indexOf(job);
      if (at < 0) return;
      this.queue.splice(at, 1);
      job.resolve({ kind: "busy", reason: `no compute thread was free within ${waitMs / 1000} s` });
    }, waitMs);
    job.queueTimer.unref();
  }

  /** Resolves when every thread has loaded the physics (a warm-up, and tests that time the computation alone). */
  async whenReady(): Promise<void> {
    while (this.slots.length < this.size || this.slots.some((s) => !s.ready)) await new Promise((r) => setTimeout(r, 20));
  }
}

// One pool per server process; kept on globalThis so that hot reloads in development do not leak threads.
const holder = globalThis as unknown as { branchlineComputePool?: ComputePool };

export function computePool(): ComputePool {
  holder.branchlineComputePool ??= new ComputePool(
    // One core is left to the request thread, so that light requests stay fast while every thread computes.
    positiveIntegerFromEnv("BRANCHLINE_COMPUTE_THREADS", Math.max(1, os.availableParallelism() - 1)),
    positiveIntegerFromEnv("BRANCHLINE_COMPUTE_QUEUE", 256),
  );
  return holder.branchlineComputePool;
}

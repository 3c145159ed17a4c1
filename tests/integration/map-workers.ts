/**
 * Real map workers for integration tests: `npm run worker`'s script as child processes (node with tsx's loader, not
 * tsx's command, which runs the script in a child: killing the process kills the worker), their output collected.
 */
import { type ChildProcess, spawn } from "node:child_process";
import path from "node:path";

const root = path.resolve(__dirname, "../..");

export interface RunningWorker {
  child: ChildProcess;
  lines: string[];
  exited: Promise<number | null>;
}

const workers: RunningWorker[] = [];

export function startWorker(): RunningWorker {
  const child = spawn(process.execPath, ["--conditions", "react-server", "--import", "tsx", "scripts/worker.ts"], {
    cwd: root,
    env: { ...process.env, BRANCHLINE_MAP_MAINTENANCE_SECONDS: "1" },
    stdio: ["ignore", "pipe", "pipe"],
  });
  const lines: string[] = [];
  const collect = (chunk: Buffer) => lines.push(...chunk.toString().split("\n").filter(Boolean));
  child.stdout!.on("data", collect);
  child.stderr!.on("data", collect);
  const exited = new Promise<number | null>((resolve) => child.on("exit", (code) => resolve(code)));
  const worker = { child, lines, exited };
  workers.push(worker);
  return worker;
}

export async function until<T>(what: string, probe: () => Promise<T | null | undefined | false>, timeoutMs = 150_000): Promise<T> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const value = await probe();
    if (value) return value;
    if (Date.now() > deadline) throw new Error(`timed out waiting for ${what}`);
    await new Promise((r) => setTimeout(r, 150));
  }
}

/** Resolves once the worker says it is ready (it has connected to the queue). */
export const ready = (w: RunningWorker) => until("a worker to start", async () => w.lines.some((l) => l.includes("ready")), 60_000);

/** Stops every worker started here: SIGTERM, then SIGKILL after 15 s. */
export async function stopWorkers(): Promise<void> {
  await Promise.all(
    workers.splice(0).map(async (w) => {
      if (w.child.exitCode === null && w.child.signalCode === null) w.child.kill("SIGTERM");
      await Promise.race([w.exited, new Promise((r) => setTimeout(r, 15_000))]);
      if (w.child.exitCode === null && w.child.signalCode === null) w.child.kill("SIGKILL");
    }),
  );
}

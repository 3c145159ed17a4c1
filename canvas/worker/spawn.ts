/** Starts a compute worker (bundled by Next from the URL beside this file). Browser only. */
import type { WorkerPort } from "../compute-client";

export function spawnComputeWorker(): WorkerPort {
  return new Worker(new URL("./compute.worker.ts", import.meta.url), { type: "module", name: "branchline-compute" }) as unknown as WorkerPort;
}

/**
 * Entry of the compute pool's worker threads (lib/compute-pool.ts). Plain JavaScript that Node loads as it is,
 * outside Next's bundle: it imports the single-file bundle of lib/compute-task.ts that the pool made with esbuild
 * (workerData.taskBundle), says it is ready, then answers one task at a time. A task that overruns its budget is
 * not interrupted here: the pool terminates this thread and starts another.
 */
import { pathToFileURL } from "node:url";
import { parentPort, workerData } from "node:worker_threads";

const { runComputeTask } = await import(pathToFileURL(workerData.taskBundle).href);

parentPort.on("message", ({ id, input, costCeiling }) => {
  try {
    parentPort.postMessage({ id, outcome: runComputeTask(input, costCeiling) });
  } catch (error) {
    parentPort.postMessage({ id, failure: error instanceof Error ? `${error.name}: ${error.message}` : String(error) });
  }
});
parentPort.postMessage({ ready: true });

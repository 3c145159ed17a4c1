/// <reference lib="webworker" />
/** The compute worker: physics off the main thread, for the live budget and for sweeps. */
import type { WorkerRequest } from "../compute-client";
import { handleRequest } from "./handle-request";

const scope = self as unknown as DedicatedWorkerGlobalScope;

scope.onmessage = (event: MessageEvent<WorkerRequest>) => {
  handleRequest(event.data, (response) => scope.postMessage(response), () => performance.now());
};

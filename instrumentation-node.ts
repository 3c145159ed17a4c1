/**
 * Server start, in the Node.js runtime (instrumentation.ts):
 * - every HTTP request from then on carries its socket's address (lib/client-address.ts), for the per-address
 *   limits of sign-in and anonymous compute, because route handlers see headers but not the socket;
 * - the compute pool's threads start, so that the first computation does not wait for them to load.
 */
import { stampSocketAddresses } from "./lib/client-address";
import { computePool } from "./lib/compute-pool";

export async function startServerServices(): Promise<void> {
  await stampSocketAddresses();
  computePool();
}

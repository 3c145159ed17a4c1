/**
 * Runs once when the server starts (Next's instrumentation hook). The work is Node.js-only
 * (instrumentation-node.ts), loaded only in that runtime so that the Edge build never sees node: modules.
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { startServerServices } = await import("./instrumentation-node");
  await startServerServices();
}

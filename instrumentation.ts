/**
 * Runs once when the server starts. In the Node.js server, every HTTP request from then on carries its socket's
 * address in an AsyncLocalStorage, for the per-address sign-in limits (see lib/client-address.ts).
 */
export async function register(): Promise<void> {
  if (process.env.NEXT_RUNTIME !== "nodejs") return;
  const { stampSocketAddresses } = await import("./lib/client-address");
  await stampSocketAddresses();
}

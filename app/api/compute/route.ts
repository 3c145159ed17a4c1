import { z } from "zod";
import { consumeComputePoint, computeRatePerMinute } from "@/db/compute-rate-limit";
import { AppError } from "@/db/errors";
import { clientAddress } from "@/lib/client-address";
import { json, readJson, route } from "@/lib/http";
import { computeRequested } from "@/lib/scenario-compute";
import { actorFromRequest } from "@/lib/session";

/**
 * Computes a scenario document sent as the body: the result JSON (see docs/formats.md), or 400 with every
 * problem and its document path. Needs no sign-in: it reads and stores nothing. Computed in the compute pool
 * (lib/scenario-compute.ts): 422 compute_too_costly for a document over the cost ceiling, 422
 * compute_over_budget past the time budget, 503 when every thread is busy. Anonymous callers are limited per
 * client address (429 with Retry-After).
 */
export const POST = route(async (req) => {
  const actor = await actorFromRequest(req);
  if (!actor) {
    const retryAfterSeconds = await consumeComputePoint(`address:${clientAddress(req)}`);
    if (retryAfterSeconds !== null) {
      throw new AppError("rate_limited", `anonymous computation is limited to ${computeRatePerMinute()} a minute per address; sign in, or try again in ${retryAfterSeconds} s`, undefined, {
        retryAfterSeconds,
      });
    }
  }
  const body = await readJson(req, z.unknown());
  return json({ result: await computeRequested(body) });
});

import { z } from "zod";
import { AppError } from "@/db/errors";
import { json, readJson, route } from "@/lib/http";
import { computeScenarioFromJson } from "@/physics";

/**
 * Computes a scenario document sent as the body: the result JSON (see docs/formats.md), or 400 with every
 * problem and its document path. Needs no sign-in: it reads and stores nothing.
 */
export const POST = route(async (req) => {
  const body = await readJson(req, z.unknown());
  const outcome = computeScenarioFromJson(body);
  if (!outcome.ok) throw new AppError("validation_failed", "the scenario document cannot be computed", outcome.issues);
  return json({ result: outcome.result });
});

import { getDb } from "@/db";
import { openSharedScenarioRecord } from "@/db/share-links";
import { json, route } from "@/lib/http";
import { computeShared } from "@/lib/shared-budget";

type Params = { token: string };

/**
 * The scenario a share link names, for whoever holds the link (no sign-in): its document and computed result
 * (see docs/formats.md), or the reasons it cannot be computed. Counts a view. Read-only: nothing else exists here.
 */
export const GET = route<Params>(async (_req, { token }) => {
  const db = getDb();
  const { scenarioId, scenario } = await openSharedScenarioRecord(db, token);
  return json({ scenario, ...(await computeShared(db, { scenarioId, version: scenario.version, document: scenario.document })) }, 200);
});

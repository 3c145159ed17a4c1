import { getDb } from "@/db";
import { notFound } from "@/db/errors";
import { getRevision } from "@/db/revisions";
import { json, requireActor, route } from "@/lib/http";

type Params = { projectId: string; scenarioId: string; version: string };

export const GET = route<Params>(async (req, { projectId, scenarioId, version }) => {
  const actor = await requireActor(req);
  const n = Number(version);
  if (!Number.isInteger(n) || n < 1) throw notFound("revision");
  return json({ revision: await getRevision(getDb(), actor, projectId, scenarioId, n) });
});

import { getDb } from "@/db";
import { listAudit } from "@/db/audit";
import { json, requireActor, route } from "@/lib/http";

type Params = { projectId: string };

/** The membership history, newest first (owners only: it names addresses that are not members). */
export const GET = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  return json({ entries: await listAudit(getDb(), actor, projectId) });
});

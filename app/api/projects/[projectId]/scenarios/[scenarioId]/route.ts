import { getDb } from "@/db";
import { attachmentObjectKeys, removeStoredObjects } from "@/db/attachments";
import { deleteScenario, getScenario, updateScenario } from "@/db/scenarios";
import { scenarioUpdateSchema } from "@/contracts/requests";
import { json, noContent, readJson, requireActor, route } from "@/lib/http";
import { objectStore } from "@/lib/storage";

type Params = { projectId: string; scenarioId: string };

export const GET = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  return json({ scenario: await getScenario(getDb(), actor, projectId, scenarioId) });
});

/** Saves with optimistic concurrency: send the version you edited; a stale one answers 409 with currentVersion. */
export const PUT = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  const input = await readJson(req, scenarioUpdateSchema);
  return json({ scenario: await updateScenario(getDb(), actor, projectId, scenarioId, input) });
});

export const DELETE = route<Params>(async (req, { projectId, scenarioId }) => {
  const actor = await requireActor(req);
  const files = await attachmentObjectKeys(getDb(), projectId, scenarioId);
  await deleteScenario(getDb(), actor, projectId, scenarioId);
  await removeStoredObjects(objectStore(), files);
  return noContent();
});

import { getDb } from "@/db";
import { attachmentObjectKeys, removeStoredObjects } from "@/db/attachments";
import { deleteProject, getProject, updateProject } from "@/db/projects";
import { projectUpdateSchema } from "@/contracts/requests";
import { json, noContent, readJson, requireActor, route } from "@/lib/http";
import { objectStore } from "@/lib/storage";

type Params = { projectId: string };

export const GET = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  return json({ project: await getProject(getDb(), actor, projectId) });
});

export const PATCH = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  const input = await readJson(req, projectUpdateSchema);
  return json({ project: await updateProject(getDb(), actor, projectId, input) });
});

export const DELETE = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  const files = await attachmentObjectKeys(getDb(), projectId);
  await deleteProject(getDb(), actor, projectId);
  await removeStoredObjects(objectStore(), files);
  return noContent();
});

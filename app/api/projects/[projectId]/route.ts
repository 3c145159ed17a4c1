import { getDb } from "@/db";
import { deleteProject, getProject, updateProject } from "@/db/projects";
import { projectUpdateSchema } from "@/lib/contracts";
import { json, noContent, readJson, requireActor, route } from "@/lib/http";

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
  await deleteProject(getDb(), actor, projectId);
  return noContent();
});

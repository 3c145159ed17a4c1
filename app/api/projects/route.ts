import { getDb } from "@/db";
import { createProject, listProjects } from "@/db/projects";
import { projectCreateSchema } from "@/contracts/requests";
import { json, readJson, requireActor, route } from "@/lib/http";

export const GET = route(async (req) => {
  const actor = await requireActor(req);
  return json({ projects: await listProjects(getDb(), actor) });
});

export const POST = route(async (req) => {
  const actor = await requireActor(req);
  const input = await readJson(req, projectCreateSchema);
  return json({ project: await createProject(getDb(), actor, input) }, 201);
});

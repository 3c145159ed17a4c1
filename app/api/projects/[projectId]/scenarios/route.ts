import { getDb } from "@/db";
import { createScenario, listScenarios } from "@/db/scenarios";
import { scenarioCreateSchema, scenarioListQuerySchema } from "@/contracts/requests";
import { json, readJson, readQuery, requireActor, route } from "@/lib/http";
import { defaultScenarioDocument } from "@/physics/scenario/schema";

type Params = { projectId: string };

export const GET = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  const q = readQuery(req, scenarioListQuerySchema);
  const page = await listScenarios(getDb(), actor, projectId, {
    page: q.page,
    pageSize: q.pageSize,
    sort: q.sort,
    order: q.order,
    search: q.q,
    backgroundKind: q.background,
  });
  return json(page);
});

export const POST = route<Params>(async (req, { projectId }) => {
  const actor = await requireActor(req);
  const input = await readJson(req, scenarioCreateSchema);
  const document = input.document ?? defaultScenarioDocument();
  return json({ scenario: await createScenario(getDb(), actor, projectId, { title: input.title, document }) }, 201);
});

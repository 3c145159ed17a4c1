import "server-only";
import type { Kysely } from "kysely";
import { parseScenarioDocument, type ScenarioDocument } from "../physics/scenario/schema";
import { type Actor, assertProjectAccess } from "./access";
import { notFound } from "./errors";
import { isUuid } from "./ids";
import { roleInProject } from "./members";
import type { Database } from "./schema";
import type { PersonDto } from "./scenarios";

export interface RevisionSummaryDto {
  version: number;
  title: string;
  schemaVersion: number;
  createdAt: string;
  createdBy: PersonDto | null;
}

export interface RevisionDto extends RevisionSummaryDto {
  document: ScenarioDocument | null;
  documentIssues: { path: string; message: string }[] | null;
}

function revisionQuery(db: Kysely<Database>, projectId: string, scenarioId: string) {
  return db
    .selectFrom("scenarioRevisions as r")
    .innerJoin("scenarios as s", "s.id", "r.scenarioId")
    .leftJoin("users as u", "u.id", "r.createdBy")
    .select(["r.version", "r.title", "r.schemaVersion", "r.createdAt", "r.createdBy", "u.name as createdByName"])
    .where("s.projectId", "=", projectId)
    .where("r.scenarioId", "=", scenarioId);
}

type RevisionRow = Awaited<ReturnType<ReturnType<typeof revisionQuery>["executeTakeFirstOrThrow"]>>;

function toSummary(r: RevisionRow): RevisionSummaryDto {
  return {
    version: r.version,
    title: r.title,
    schemaVersion: r.schemaVersion,
    createdAt: r.createdAt.toISOString(),
    createdBy: r.createdBy && r.createdByName ? { id: r.createdBy, name: r.createdByName } : null,
  };
}

async function assertScenarioReadable(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string) {
  assertProjectAccess(await roleInProject(db, projectId, actor.userId), "scenario:read");
  if (!isUuid(scenarioId)) throw notFound("scenario");
  const exists = await db.selectFrom("scenarios").select("id").where("id", "=", scenarioId).where("projectId", "=", projectId).executeTakeFirst();
  if (!exists) throw notFound("scenario");
}

export async function listRevisions(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string): Promise<RevisionSummaryDto[]> {
  await assertScenarioReadable(db, actor, projectId, scenarioId);
  const rows = await revisionQuery(db, projectId, scenarioId).orderBy("r.version", "desc").execute();
  return rows.map(toSummary);
}

export async function getRevision(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  scenarioId: string,
  version: number,
): Promise<RevisionDto> {
  await assertScenarioReadable(db, actor, projectId, scenarioId);
  const row = await revisionQuery(db, projectId, scenarioId).select("r.document").where("r.version", "=", version).executeTakeFirst();
  if (!row) throw notFound("revision");
  const parsed = parseScenarioDocument(row.document);
  return {
    ...toSummary(row),
    document: parsed.ok ? parsed.document : null,
    documentIssues: parsed.ok ? null : parsed.issues,
  };
}

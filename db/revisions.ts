import "server-only";
import type { InferResult, Kysely } from "kysely";
import { parseScenarioDocument, type ScenarioDocument } from "../physics/scenario/schema";
import { type Actor, requireProjectAction } from "./access";
import { diffDocuments, type DocumentDiff } from "../contracts/json-diff";
import { AppError, notFound } from "./errors";
import type { Database } from "./schema";
import { person } from "./people";
import { assertScenarioInProject, saveNextVersion } from "./scenarios";
import type { RevisionDiffDto, RevisionDto, RevisionSummaryDto, ScenarioDto } from "../contracts/dto";

/** Revision numbers are PostgreSQL integers. */
export const MAX_REVISION = 2_147_483_647;

/** A revision number from a URL segment; anything that cannot name a revision is not found. */
export function revisionNumber(segment: string): number {
  const n = Number(segment);
  if (!Number.isInteger(n) || n < 1 || n > MAX_REVISION) throw notFound("revision");
  return n;
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

type RevisionRow = InferResult<ReturnType<typeof revisionQuery>>[number];

function toSummary(r: RevisionRow): RevisionSummaryDto {
  return {
    version: r.version,
    title: r.title,
    schemaVersion: r.schemaVersion,
    createdAt: r.createdAt.toISOString(),
    createdBy: person(r.createdBy, r.createdByName),
  };
}

async function assertScenarioReadable(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string) {
  await requireProjectAction(db, actor, projectId, "scenario:read");
  await assertScenarioInProject(db, projectId, scenarioId);
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

async function storedRevision(db: Kysely<Database>, projectId: string, scenarioId: string, version: number) {
  const row = await revisionQuery(db, projectId, scenarioId).select("r.document").where("r.version", "=", version).executeTakeFirst();
  if (!row) throw notFound(`revision ${version}`);
  return row;
}

/** What changed from revision `against` to revision `version`: document paths with their old and new values, as stored. */
export async function diffRevisions(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  scenarioId: string,
  version: number,
  against: number,
): Promise<RevisionDiffDto> {
  await assertScenarioReadable(db, actor, projectId, scenarioId);
  const [older, newer] = await Promise.all([storedRevision(db, projectId, scenarioId, against), storedRevision(db, projectId, scenarioId, version)]);
  return {
    from: toSummary(older),
    to: toSummary(newer),
    title: older.title === newer.title ? null : { before: older.title, after: newer.title },
    ...diffDocuments(older.document, newer.document),
  };
}

/**
 * Restores an old revision as a new one: the scenario's next version gets that revision's title and document
 * (upgraded to the current schema). Nothing is deleted; the versions in between stay in the history.
 */
export async function restoreRevision(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  scenarioId: string,
  version: number,
): Promise<ScenarioDto> {
  await requireProjectAction(db, actor, projectId, "scenario:write");
  await assertScenarioInProject(db, projectId, scenarioId);
  const revision = await storedRevision(db, projectId, scenarioId, version);
  const parsed = parseScenarioDocument(revision.document);
  if (!parsed.ok) {
    throw new AppError(
      "unprocessable",
      `revision ${version}'s document cannot be read by this version of Branchline, so it cannot be restored`,
      parsed.issues.map((i) => ({ path: i.path ? `document.${i.path}` : "document", message: i.message })),
    );
  }
  return saveNextVersion(db, actor, projectId, scenarioId, () => ({ title: revision.title, document: parsed.document }));
}

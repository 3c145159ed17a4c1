import "server-only";
import { type InferResult, type Kysely, sql } from "kysely";
import { differsOnlyInDisplay } from "../physics/scenario/compare";
import { parseScenarioDocument, type ScenarioDocument } from "../physics/scenario/schema";
import { type Actor, requireProjectAction } from "./access";
import { AppError, invalid, notFound } from "./errors";
import { isUuid } from "./ids";
import { recordAudit } from "./audit";
import { person } from "./people";
import type { Database } from "./schema";
import type { ScenarioDto, ScenarioPage, ScenarioSummaryDto } from "../contracts/dto";

export type ScenarioSortKey = "title" | "updatedAt" | "createdAt" | "backgroundKind";

export interface ScenarioListQuery {
  page: number;
  pageSize: number;
  sort: ScenarioSortKey;
  order: "asc" | "desc";
  /** Case-insensitive substring of the title. */
  search?: string;
  backgroundKind?: string;
}

/**
 * The stored document, re-read (and upgraded) to be kept as it is when only the title changes; a stored document
 * that cannot be read refuses the change with its problems. Documents from clients are validated by the request
 * contract (contracts/requests.ts), not here.
 */
function storedDocument(stored: unknown): ScenarioDocument {
  const parsed = parseScenarioDocument(stored);
  if (!parsed.ok) {
    throw invalid(
      "the stored scenario document cannot be read",
      parsed.issues.map((i) => ({ path: i.path ? `document.${i.path}` : "document", message: i.message })),
    );
  }
  return parsed.document;
}

function baseQuery(db: Kysely<Database>) {
  return db
    .selectFrom("scenarios as s")
    .leftJoin("users as uu", "uu.id", "s.updatedBy")
    .leftJoin("users as uc", "uc.id", "s.createdBy")
    .select([
      "s.id",
      "s.projectId",
      "s.title",
      "s.backgroundKind",
      "s.schemaVersion",
      "s.version",
      "s.createdAt",
      "s.updatedAt",
      "s.updatedBy",
      "uu.name as updatedByName",
      "s.createdBy",
      "uc.name as createdByName",
    ]);
}

type SummaryRow = InferResult<ReturnType<typeof baseQuery>>[number];


function toSummary(row: SummaryRow): ScenarioSummaryDto {
  return {
    id: row.id,
    projectId: row.projectId,
    title: row.title,
    backgroundKind: row.backgroundKind,
    schemaVersion: row.schemaVersion,
    version: row.version,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    updatedBy: person(row.updatedBy, row.updatedByName),
  };
}

function toDto(row: SummaryRow & { document: unknown }): ScenarioDto {
  const parsed = parseScenarioDocument(row.document);
  return {
    ...toSummary(row),
    document: parsed.ok ? parsed.document : null,
    documentIssues: parsed.ok ? null : parsed.issues,
    createdBy: person(row.createdBy, row.createdByName),
  };
}

const sortColumns = {
  title: sql`lower(s.title)`,
  updatedAt: sql`s.updated_at`,
  createdAt: sql`s.created_at`,
  backgroundKind: sql`s.background_kind`,
} as const;

export async function listScenarios(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  query: ScenarioListQuery,
): Promise<ScenarioPage> {
  await requireProjectAction(db, actor, projectId, "scenario:read");
  let filtered = baseQuery(db).where("s.projectId", "=", projectId);
  if (query.search) {
    const pattern = `%${query.search.replace(/[\\%_]/g, (ch) => `\\${ch}`)}%`;
    filtered = filtered.where(sql<boolean>`s.title ilike ${pattern}`);
  }
  if (query.backgroundKind) filtered = filtered.where("s.backgroundKind", "=", query.backgroundKind);
  const direction = query.order === "asc" ? sql`asc` : sql`desc`;
  const [rows, count] = await Promise.all([
    filtered
      .orderBy(sql`${sortColumns[query.sort]} ${direction}`)
      .orderBy("s.id")
      .limit(query.pageSize)
      .offset((query.page - 1) * query.pageSize)
      .execute(),
    filtered.clearSelect().select((eb) => eb.fn.countAll<string>().as("n")).executeTakeFirstOrThrow(),
  ]);
  return { items: rows.map(toSummary), total: Number(count.n), page: query.page, pageSize: query.pageSize };
}

async function fetchScenario(db: Kysely<Database>, projectId: string, scenarioId: string) {
  if (!isUuid(scenarioId)) throw notFound("scenario");
  const row = await baseQuery(db)
    .select("s.document")
    .where("s.projectId", "=", projectId)
    .where("s.id", "=", scenarioId)
    .executeTakeFirst();
  if (!row) throw notFound("scenario");
  return row;
}

/** 404 unless the scenario exists in this project; call it after checking the caller's access to the project. */
export async function assertScenarioInProject(db: Kysely<Database>, projectId: string, scenarioId: string): Promise<void> {
  if (!isUuid(scenarioId)) throw notFound("scenario");
  const exists = await db.selectFrom("scenarios").select("id").where("id", "=", scenarioId).where("projectId", "=", projectId).executeTakeFirst();
  if (!exists) throw notFound("scenario");
}

export async function getScenario(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string): Promise<ScenarioDto> {
  await requireProjectAction(db, actor, projectId, "scenario:read");
  return toDto(await fetchScenario(db, projectId, scenarioId));
}

async function insertRevision(
  db: Kysely<Database>,
  scenario: { id: string; version: number; title: string; document: ScenarioDocument },
  userId: string,
) {
  await db
    .insertInto("scenarioRevisions")
    .values({
      scenarioId: scenario.id,
      version: scenario.version,
      title: scenario.title,
      document: JSON.stringify(scenario.document),
      schemaVersion: scenario.document.schemaVersion,
      createdBy: userId,
    })
    .execute();
}

export async function createScenario(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  /** `importedFrom`: the scenario file's name, recorded in the project's history with the new scenario. */
  input: { title: string; document: ScenarioDocument; importedFrom?: string },
): Promise<ScenarioDto> {
  const id = await db.transaction().execute(async (trx) => {
    await requireProjectAction(trx, actor, projectId, "scenario:write");
    const row = await trx
      .insertInto("scenarios")
      .values({
        projectId,
        title: input.title,
        document: JSON.stringify(input.document),
        schemaVersion: input.document.schemaVersion,
        backgroundKind: input.document.background.kind,
        createdBy: actor.userId,
        updatedBy: actor.userId,
      })
      .returning(["id", "version"])
      .executeTakeFirstOrThrow();
    await insertRevision(trx, { id: row.id, version: row.version, title: input.title, document: input.document }, actor.userId);
    if (input.importedFrom !== undefined) {
      await recordAudit(trx, { projectId, actorId: actor.userId, action: "scenario_imported", scenarioId: row.id, subject: input.importedFrom });
    }
    await trx.updateTable("projects").set({ updatedAt: new Date() }).where("id", "=", projectId).execute();
    return row.id;
  });
  return getScenario(db, actor, projectId, id);
}

/**
 * Saves a scenario if the caller holds its current version (optimistic concurrency): a stale version answers
 * 409 with the version now stored, and nothing is overwritten. Every save becomes a revision.
 */
export async function updateScenario(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  scenarioId: string,
  input: { version: number; title?: string; document?: ScenarioDocument },
): Promise<ScenarioDto> {
  return saveNextVersion(db, actor, projectId, scenarioId, (current) => {
    if (current.version !== input.version) {
      throw new AppError(
        "version_conflict",
        `this scenario was changed by someone else (you edited version ${input.version}; version ${current.version} is stored)`,
        [{ path: "version", message: "stale version" }],
        { currentVersion: current.version },
      );
    }
    return { title: input.title ?? current.title, document: input.document ?? storedDocument(current.document) };
  }, { amendDisplay: true });
}

/**
 * Stores the next version of a scenario and its revision, in one transaction that checks the caller's role and
 * holds the scenario's row lock.
 * `next` sees what is stored now and answers the title and document to store, or throws to store nothing.
 */
export async function saveNextVersion(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  scenarioId: string,
  next: (current: { version: number; title: string; document: unknown }) => { title: string; document: ScenarioDocument },
  { amendDisplay = false }: { amendDisplay?: boolean } = {},
): Promise<ScenarioDto> {
  await db.transaction().execute(async (trx) => {
    await requireProjectAction(trx, actor, projectId, "scenario:write");
    if (!isUuid(scenarioId)) throw notFound("scenario");
    const current = await trx
      .selectFrom("scenarios")
      .select(["version", "title", "document", "updatedBy"])
      .where("projectId", "=", projectId)
      .where("id", "=", scenarioId)
      .forUpdate()
      .executeTakeFirst();
    if (!current) throw notFound("scenario");
    const { title, document } = next(current);
    // Changing only the figures' look amends the caller's own latest version: toggling the grid or the dark
    // theme changes no number, so it starts no new version.
    if (amendDisplay && current.updatedBy === actor.userId && title === current.title && differsOnlyInDisplay(current.document, document)) {
      const stored = JSON.stringify(document);
      await trx.updateTable("scenarios").set({ document: stored, updatedAt: new Date() }).where("id", "=", scenarioId).execute();
      await trx.updateTable("scenarioRevisions").set({ document: stored }).where("scenarioId", "=", scenarioId).where("version", "=", current.version).execute();
      return;
    }
    const version = current.version + 1;
    await trx
      .updateTable("scenarios")
      .set({
        title,
        document: JSON.stringify(document),
        schemaVersion: document.schemaVersion,
        backgroundKind: document.background.kind,
        version,
        updatedBy: actor.userId,
        updatedAt: new Date(),
      })
      .where("id", "=", scenarioId)
      .execute();
    await insertRevision(trx, { id: scenarioId, version, title, document }, actor.userId);
  });
  return getScenario(db, actor, projectId, scenarioId);
}

export async function duplicateScenario(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  scenarioId: string,
  title?: string,
): Promise<ScenarioDto> {
  const source = await getScenario(db, actor, projectId, scenarioId);
  if (!source.document) {
    throw new AppError("unprocessable", "this scenario's document cannot be read, so it cannot be duplicated", source.documentIssues ?? []);
  }
  return createScenario(db, actor, projectId, { title: title ?? `${source.title} (copy)`.slice(0, 200), document: source.document });
}

export async function deleteScenario(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string): Promise<void> {
  await requireProjectAction(db, actor, projectId, "scenario:write");
  if (!isUuid(scenarioId)) throw notFound("scenario");
  const deleted = await db.deleteFrom("scenarios").where("projectId", "=", projectId).where("id", "=", scenarioId).executeTakeFirst();
  if (deleted.numDeletedRows === 0n) throw notFound("scenario");
}

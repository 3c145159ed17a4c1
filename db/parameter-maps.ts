import "server-only";
import { type Kysely, sql } from "kysely";
import { assembleMap, mapRefusal, type MapGrid, type MapRequest, type MapRow } from "../physics/maps";
import { parseScenarioDocument, type ScenarioDocument } from "../physics/scenario/schema";
import { type Actor, requireProjectAction } from "./access";
import { AppError, invalid, notFound } from "./errors";
import { isUuid } from "./ids";
import type { ParameterMapDto, ParameterMapStatus, ParameterMapSummary } from "../contracts/dto";
import type { Database } from "./schema";

/**
 * Parameter maps: created by a caller (POST /api/maps), computed a row at a time by queue workers (lib/map-worker.ts),
 * read and cancelled by the caller. Access: a map of a saved scenario follows the scenario (scenario:write to make
 * or cancel one, scenario:read to see it) and is kept with it; a map of an unsaved document belongs to the account
 * that made it, and is not found for anyone else. Signed-out callers cannot make maps (a map is up to 40,000
 * computations of shared worker time), and each account has at most MAX_ACTIVE_MAPS queued or running at once.
 */

export const MAX_ACTIVE_MAPS = 4;

export type { ParameterMapDto, ParameterMapSummary };

export interface MapInputs {
  document: ScenarioDocument;
  request: MapRequest;
}

const ACTIVE: ParameterMapStatus[] = ["queued", "running"];

export const mapUrl = (id: string) => `/api/maps/${id}`;

type MapRowRecord = {
  id: string;
  projectId: string | null;
  scenarioId: string | null;
  scenarioVersion: number | null;
  createdBy: string | null;
  inputs: unknown;
  status: ParameterMapStatus;
  rowsTotal: number;
  rowsDone: number;
  failure: string | null;
  createdAt: Date;
  updatedAt: Date;
  finishedAt: Date | null;
};

const summaryColumns = [
  "id",
  "projectId",
  "scenarioId",
  "scenarioVersion",
  "createdBy",
  "inputs",
  "status",
  "rowsTotal",
  "rowsDone",
  "failure",
  "createdAt",
  "updatedAt",
  "finishedAt",
] as const;

function toSummary(row: MapRowRecord): ParameterMapSummary {
  const inputs = row.inputs as MapInputs;
  return {
    id: row.id,
    url: mapUrl(row.id),
    status: row.status,
    progress: { rowsDone: row.rowsDone, rowsTotal: row.rowsTotal, fraction: row.rowsTotal > 0 ? row.rowsDone / row.rowsTotal : 0 },
    request: inputs.request,
    scenario: row.scenarioId && row.projectId ? { projectId: row.projectId, scenarioId: row.scenarioId, version: row.scenarioVersion ?? 0 } : null,
    failure: row.failure,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
    finishedAt: row.finishedAt?.toISOString() ?? null,
  };
}

/** What a refusal of the physics (physics/maps) answers: 400 for what cannot be mapped, 422 for what costs too much. */
function refusalError(document: ScenarioDocument, request: MapRequest): AppError | null {
  const refusal = mapRefusal(document, request);
  if (!refusal) return null;
  const path = /^[xy]\./.test(refusal.path) ? refusal.path : refusal.path ? `document.${refusal.path}` : "document";
  const fields = [{ path, message: refusal.message }];
  return refusal.kind === "too-costly"
    ? new AppError("compute_too_costly", "a point of this map would cost more to compute than a worker spends on one: relax the numerics named in the fields, or narrow the axes", fields)
    : new AppError("validation_failed", "this map cannot be made", fields);
}

export interface NewMapInput {
  scenario?: { projectId: string; scenarioId: string };
  /** Parsed and checked by the request contract (contracts/requests.ts, scenarioDocumentInput). */
  document?: ScenarioDocument;
  request: MapRequest;
}

/**
 * Records a map and hands its rows to the queue in the same transaction (`enqueue` runs on it), so that a map
 * exists exactly when its chunks do.
 */
export async function createParameterMap(
  db: Kysely<Database>,
  actor: Actor,
  input: NewMapInput,
  enqueue: (trx: Kysely<Database>, mapId: string, rows: number) => Promise<void>,
): Promise<ParameterMapDto> {
  return db.transaction().execute(async (trx) => {
    let document: ScenarioDocument;
    let scenario: { projectId: string; scenarioId: string; version: number } | null = null;
    if (input.scenario) {
      const { projectId, scenarioId } = input.scenario;
      await requireProjectAction(trx, actor, projectId, "scenario:write");
      const saved = isUuid(scenarioId)
        ? await trx.selectFrom("scenarios").select(["document", "version"]).where("id", "=", scenarioId).where("projectId", "=", projectId).executeTakeFirst()
        : undefined;
      if (!saved) throw notFound("scenario");
      const parsed = parseScenarioDocument(saved.document);
      if (!parsed.ok) throw invalid("the saved scenario's document cannot be read, so it cannot be mapped", parsed.issues.map((i) => ({ path: `document.${i.path}`, message: i.message })));
      document = parsed.document;
      scenario = { projectId, scenarioId, version: saved.version };
    } else if (input.document) {
      document = input.document;
    } else {
      throw invalid("give either scenario or document", [{ path: "scenario", message: "a map needs a saved scenario or a document" }]);
    }
    const refused = refusalError(document, input.request);
    if (refused) throw refused;

    const active = await trx
      .selectFrom("parameterMaps")
      .select((eb) => eb.fn.countAll<string>().as("n"))
      .where("createdBy", "=", actor.userId)
      .where("status", "in", ACTIVE)
      .executeTakeFirstOrThrow();
    if (Number(active.n) >= MAX_ACTIVE_MAPS) {
      throw new AppError("rate_limited", `you have ${MAX_ACTIVE_MAPS} maps queued or running; wait for one to finish or cancel one`, undefined, { retryAfterSeconds: 30 });
    }

    const inputs: MapInputs = { document, request: input.request };
    const row = await trx
      .insertInto("parameterMaps")
      .values({
        projectId: scenario?.projectId ?? null,
        scenarioId: scenario?.scenarioId ?? null,
        scenarioVersion: scenario?.version ?? null,
        createdBy: actor.userId,
        inputs: JSON.stringify(inputs),
        rowsTotal: input.request.y.points,
        updatedAt: new Date(),
      })
      .returning(summaryColumns)
      .executeTakeFirstOrThrow();
    await enqueue(trx, row.id, input.request.y.points);
    return { ...toSummary(row), document, result: null };
  });
}

/** The map, after checking that the caller may `action` it (a stranger's map is not found). */
async function mapFor(db: Kysely<Database>, actor: Actor, mapId: string, action: "scenario:read" | "scenario:write", lock = false) {
  if (!isUuid(mapId)) throw notFound("map");
  let query = db.selectFrom("parameterMaps").select([...summaryColumns, "result"]).where("id", "=", mapId);
  if (lock) query = query.forUpdate();
  const row = await query.executeTakeFirst();
  if (!row) throw notFound("map");
  if (row.projectId) await requireProjectAction(db, actor, row.projectId, action);
  else if (row.createdBy !== actor.userId) throw notFound("map");
  return row;
}

export async function getParameterMap(db: Kysely<Database>, actor: Actor, mapId: string): Promise<ParameterMapDto> {
  const row = await mapFor(db, actor, mapId, "scenario:read");
  return { ...toSummary(row), document: (row.inputs as MapInputs).document, result: (row.result as MapGrid | null) ?? null };
}

/**
 * Cancels a queued or running map (its remaining chunks find it cancelled and stop) and answers it; a finished
 * map (done, cancelled or failed) is deleted instead, and null answered.
 */
export async function cancelParameterMap(db: Kysely<Database>, actor: Actor, mapId: string): Promise<ParameterMapSummary | null> {
  return db.transaction().execute(async (trx) => {
    const row = await mapFor(trx, actor, mapId, "scenario:write", true);
    if (!ACTIVE.includes(row.status)) {
      await trx.deleteFrom("parameterMaps").where("id", "=", mapId).execute();
      return null;
    }
    const now = new Date();
    const updated = await trx
      .updateTable("parameterMaps")
      .set({ status: "cancelled", updatedAt: now, finishedAt: now })
      .where("id", "=", mapId)
      .returning(summaryColumns)
      .executeTakeFirstOrThrow();
    return toSummary(updated);
  });
}

/** The maps kept with a saved scenario, newest first, without their grids. */
export async function listScenarioMaps(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string): Promise<ParameterMapSummary[]> {
  await requireProjectAction(db, actor, projectId, "scenario:read");
  if (!isUuid(scenarioId)) throw notFound("scenario");
  const rows = await db
    .selectFrom("parameterMaps")
    .select(summaryColumns)
    .where("projectId", "=", projectId)
    .where("scenarioId", "=", scenarioId)
    .orderBy("createdAt", "desc")
    .limit(100)
    .execute();
  return rows.map(toSummary);
}

// ---- The workers' side: trusted processes, no caller to check. ----

export interface MapWork {
  status: ParameterMapStatus;
  inputs: MapInputs;
}

export async function mapWork(db: Kysely<Database>, mapId: string): Promise<MapWork | null> {
  const row = await db.selectFrom("parameterMaps").select(["status", "inputs"]).where("id", "=", mapId).executeTakeFirst();
  return row ? { status: row.status, inputs: row.inputs as MapInputs } : null;
}

export async function mapStatus(db: Kysely<Database>, mapId: string): Promise<ParameterMapStatus | null> {
  const row = await db.selectFrom("parameterMaps").select("status").where("id", "=", mapId).executeTakeFirst();
  return row?.status ?? null;
}

export const isActive = (status: ParameterMapStatus | null) => status !== null && ACTIVE.includes(status);

/**
 * Keeps a finished row (once: a retried chunk's second copy is ignored), sets the progress to the count of kept rows
 * and, with the last row, assembles the grid and marks the map done. The map's row is locked first, so two workers
 * finishing the last two rows at once count one after the other. Answers false when the map is gone or no longer
 * active (cancelled meanwhile): the row is then dropped.
 */
export async function recordMapRow(db: Kysely<Database>, mapId: string, row: MapRow): Promise<boolean> {
  return db.transaction().execute(async (trx) => {
    const map = await trx.selectFrom("parameterMaps").select(["status", "inputs", "rowsTotal"]).where("id", "=", mapId).forUpdate().executeTakeFirst();
    if (!map || !isActive(map.status)) return false;
    await trx
      .insertInto("parameterMapRows")
      .values({ mapId, rowIndex: row.row, rowData: JSON.stringify(row) })
      .onConflict((oc) => oc.columns(["mapId", "rowIndex"]).doNothing())
      .execute();
    const { n } = await trx
      .selectFrom("parameterMapRows")
      .select((eb) => eb.fn.countAll<string>().as("n"))
      .where("mapId", "=", mapId)
      .executeTakeFirstOrThrow();
    const rowsDone = Number(n);
    const now = new Date();
    if (rowsDone < map.rowsTotal) {
      await trx.updateTable("parameterMaps").set({ status: "running", rowsDone, updatedAt: now }).where("id", "=", mapId).execute();
      return true;
    }
    const rows = await trx.selectFrom("parameterMapRows").select("rowData").where("mapId", "=", mapId).execute();
    const grid = assembleMap((map.inputs as MapInputs).request, rows.map((r) => r.rowData as MapRow));
    await trx
      .updateTable("parameterMaps")
      .set({ status: "done", rowsDone, result: JSON.stringify(grid), updatedAt: now, finishedAt: now })
      .where("id", "=", mapId)
      .execute();
    await trx.deleteFrom("parameterMapRows").where("mapId", "=", mapId).execute();
    return true;
  });
}

/** A chunk failed for good (its retries spent): the map cannot complete, and says why. */
export async function failParameterMap(db: Kysely<Database>, mapId: string, reason: string): Promise<void> {
  const now = new Date();
  await db
    .updateTable("parameterMaps")
    .set({ status: "failed", failure: reason.slice(0, 2000), updatedAt: now, finishedAt: now })
    .where("id", "=", mapId)
    .where("status", "in", ACTIVE)
    .execute();
}

/** For the tests and the bench: rows kept so far (a finished map has none left). */
export async function keptRowCount(db: Kysely<Database>, mapId: string): Promise<number> {
  const { n } = await db.selectFrom("parameterMapRows").select(sql<string>`count(*)`.as("n")).where("mapId", "=", mapId).executeTakeFirstOrThrow();
  return Number(n);
}

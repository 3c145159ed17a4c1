import "server-only";
/**
 * Files kept with a scenario (figures, notes, data). The row says what the file is; its bytes are in object storage
 * under the row's object key. Readers list and download; editors and owners upload and delete. A file is stored
 * whole or not at all: the row is written in a transaction that commits only once the object is in the store, and
 * the object is removed again if the commit fails.
 */
import { randomUUID } from "node:crypto";
import type { InferResult, Kysely } from "kysely";
import { type Actor, requireProjectAction } from "./access";
import { recordAudit } from "./audit";
import { notFound } from "./errors";
import { isUuid } from "./ids";
import { person } from "./people";
import { assertScenarioInProject } from "./scenarios";
import type { Database } from "./schema";
import type { AttachmentDto } from "../contracts/dto";

/** Throws unless the caller may read the scenario's files (404 for a project or scenario they cannot see). */
export async function assertMayReadScenario(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string): Promise<void> {
  await requireProjectAction(db, actor, projectId, "scenario:read");
  await assertScenarioInProject(db, projectId, scenarioId);
}

/**
 * Throws unless the caller may change the project's scenarios (and, given one, that it is in the project). Routes
 * that take a file call it before reading the body, so a stranger learns nothing from how a file is refused.
 */
export async function assertMayWriteScenarios(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId?: string): Promise<void> {
  await requireProjectAction(db, actor, projectId, "scenario:write");
  if (scenarioId !== undefined) await assertScenarioInProject(db, projectId, scenarioId);
}

function attachmentQuery(db: Kysely<Database>, projectId: string, scenarioId: string) {
  return db
    .selectFrom("attachments as a")
    .leftJoin("users as u", "u.id", "a.uploadedBy")
    .select(["a.id", "a.scenarioId", "a.fileName", "a.mediaType", "a.sizeBytes", "a.uploadedBy", "u.name as uploadedByName", "a.createdAt", "a.objectKey"])
    .where("a.projectId", "=", projectId)
    .where("a.scenarioId", "=", scenarioId);
}

type AttachmentRow = InferResult<ReturnType<typeof attachmentQuery>>[number];

function toDto(r: AttachmentRow): AttachmentDto {
  return {
    id: r.id,
    scenarioId: r.scenarioId,
    fileName: r.fileName,
    mediaType: r.mediaType,
    sizeBytes: Number(r.sizeBytes),
    uploadedBy: person(r.uploadedBy, r.uploadedByName),
    createdAt: r.createdAt.toISOString(),
  };
}

export async function listAttachments(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string): Promise<AttachmentDto[]> {
  await assertMayReadScenario(db, actor, projectId, scenarioId);
  const rows = await attachmentQuery(db, projectId, scenarioId).orderBy("a.createdAt", "desc").orderBy("a.id").execute();
  return rows.map(toDto);
}

async function findAttachment(db: Kysely<Database>, projectId: string, scenarioId: string, attachmentId: string): Promise<AttachmentRow> {
  if (!isUuid(attachmentId)) throw notFound("attachment");
  const row = await attachmentQuery(db, projectId, scenarioId).where("a.id", "=", attachmentId).executeTakeFirst();
  if (!row) throw notFound("attachment");
  return row;
}

export interface NewAttachmentInput {
  fileName: string;
  /** Decided from the content by the caller (lib/sniff.ts). */
  mediaType: string;
  bytes: Uint8Array;
}

/** A file name safe to keep and show: no path, no control characters, at most 255 characters. */
export function cleanFileName(name: string): string {
  const base = name.split(/[\\/]/).pop() ?? "";
  // eslint-disable-next-line no-control-regex
  const cleaned = base.replace(/[\u0000-\u001f\u007f]/g, "").trim().slice(-255);
  return cleaned || "file";
}

/** The project history's entry for a file added or deleted: about the scenario, naming the file, no person as target. */
function auditFile(db: Kysely<Database>, actor: Actor, action: "attachment_added" | "attachment_deleted", file: { projectId: string; scenarioId: string; fileName: string }) {
  return recordAudit(db, {
    projectId: file.projectId,
    actorId: actor.userId,
    action,
    scenarioId: file.scenarioId,
    subject: file.fileName,
    targetUserId: null,
    targetEmail: null,
    role: null,
    previousRole: null,
  });
}

/**
 * What this repository needs of an object store (lib/storage.ts's store is one): the port is declared here, by
 * its user, so the data access layer depends on no server integration of its own.
 */
export interface ObjectStore {
  put(key: string, body: Uint8Array, contentType: string): Promise<void>;
  delete(key: string): Promise<void>;
  /** A signed GET link to the object, served as a download with this file name. */
  downloadUrl(key: string, fileName: string, contentType: string): Promise<{ url: string; expiresAt: Date }>;
}

/**
 * The object keys of every file of a project, or of one of its scenarios. Read before deleting the project or the
 * scenario (the rows go with them by cascade), so that the objects can be removed from the store afterwards.
 */
export async function attachmentObjectKeys(db: Kysely<Database>, projectId: string, scenarioId?: string): Promise<string[]> {
  if (!isUuid(projectId) || (scenarioId !== undefined && !isUuid(scenarioId))) return [];
  let query = db.selectFrom("attachments").select("objectKey").where("projectId", "=", projectId);
  if (scenarioId !== undefined) query = query.where("scenarioId", "=", scenarioId);
  return (await query.execute()).map((r) => r.objectKey);
}

/** Removes objects whose rows are gone; a failure is logged, not raised (the deletion the caller asked for is done). */
export async function removeStoredObjects(store: ObjectStore, keys: string[]): Promise<void> {
  for (const key of keys) {
    await store.delete(key).catch((error: unknown) => console.error("[attachments] could not remove an object whose row is gone", key, error));
  }
}

export async function uploadAttachment(
  db: Kysely<Database>,
  store: ObjectStore,
  actor: Actor,
  projectId: string,
  scenarioId: string,
  input: NewAttachmentInput,
): Promise<AttachmentDto> {
  await assertMayWriteScenarios(db, actor, projectId, scenarioId);
  const id = randomUUID();
  const objectKey = `projects/${projectId}/scenarios/${scenarioId}/attachments/${id}`;
  const fileName = cleanFileName(input.fileName);
  let stored = false;
  try {
    await db.transaction().execute(async (trx) => {
      await trx
        .insertInto("attachments")
        .values({ id, projectId, scenarioId, fileName, mediaType: input.mediaType, sizeBytes: input.bytes.byteLength, objectKey, uploadedBy: actor.userId })
        .execute();
      await auditFile(trx, actor, "attachment_added", { projectId, scenarioId, fileName });
      await store.put(objectKey, input.bytes, input.mediaType);
      stored = true;
    });
  } catch (error) {
    if (stored) await store.delete(objectKey).catch((e) => console.error("[attachments] could not remove an orphaned object", objectKey, e));
    throw error;
  }
  return toDto(await findAttachment(db, projectId, scenarioId, id));
}

/** A short-lived link to download the file (readers). */
export async function attachmentDownload(
  db: Kysely<Database>,
  store: ObjectStore,
  actor: Actor,
  projectId: string,
  scenarioId: string,
  attachmentId: string,
): Promise<{ attachment: AttachmentDto; url: string; expiresAt: string }> {
  await assertMayReadScenario(db, actor, projectId, scenarioId);
  const row = await findAttachment(db, projectId, scenarioId, attachmentId);
  const link = await store.downloadUrl(row.objectKey, row.fileName, row.mediaType);
  return { attachment: toDto(row), url: link.url, expiresAt: link.expiresAt.toISOString() };
}

/** Removes the file: the object first, then the row, in one transaction holding the row (editors and owners). */
export async function deleteAttachment(
  db: Kysely<Database>,
  store: ObjectStore,
  actor: Actor,
  projectId: string,
  scenarioId: string,
  attachmentId: string,
): Promise<void> {
  await assertMayWriteScenarios(db, actor, projectId, scenarioId);
  if (!isUuid(attachmentId)) throw notFound("attachment");
  await db.transaction().execute(async (trx) => {
    const row = await trx
      .selectFrom("attachments")
      .select(["objectKey", "fileName"])
      .where("id", "=", attachmentId)
      .where("projectId", "=", projectId)
      .where("scenarioId", "=", scenarioId)
      .forUpdate()
      .executeTakeFirst();
    if (!row) throw notFound("attachment");
    await trx.deleteFrom("attachments").where("id", "=", attachmentId).execute();
    await auditFile(trx, actor, "attachment_deleted", { projectId, scenarioId, fileName: row.fileName });
    await store.delete(row.objectKey);
  });
}

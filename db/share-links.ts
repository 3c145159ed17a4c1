import "server-only";
import type { InferResult, Kysely } from "kysely";
import { parseScenarioDocument, type ScenarioDocument } from "../physics/scenario/schema";
import { recordAudit } from "./audit";
import { type Actor, assertShareLinkAccess, shareLinkIsOpen, requireProjectAction } from "./access";
import { conflict, notFound } from "./errors";
import { isUuid } from "./ids";
import { person } from "./people";
import { assertScenarioInProject } from "./scenarios";
import { hashToken, newToken } from "./tokens";
import type { Database } from "./schema";
import type { ShareLinkDto, SharedScenarioDto } from "../contracts/dto";

function linkQuery(db: Kysely<Database>, projectId: string, scenarioId: string) {
  return db
    .selectFrom("shareLinks as l")
    .leftJoin("users as u", "u.id", "l.createdBy")
    .select(["l.id", "l.label", "l.createdAt", "l.createdBy", "u.name as createdByName", "l.expiresAt", "l.revokedAt", "l.viewCount", "l.lastViewedAt"])
    .where("l.projectId", "=", projectId)
    .where("l.scenarioId", "=", scenarioId);
}

type LinkRow = InferResult<ReturnType<typeof linkQuery>>[number];

function toDto(r: LinkRow, now = new Date()): ShareLinkDto {
  const status = r.revokedAt ? "revoked" : r.expiresAt && r.expiresAt <= now ? "expired" : "active";
  return {
    id: r.id,
    label: r.label,
    status,
    createdAt: r.createdAt.toISOString(),
    createdBy: person(r.createdBy, r.createdByName),
    expiresAt: r.expiresAt?.toISOString() ?? null,
    revokedAt: r.revokedAt?.toISOString() ?? null,
    viewCount: r.viewCount,
    lastViewedAt: r.lastViewedAt?.toISOString() ?? null,
  };
}

async function assertManages(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string): Promise<void> {
  await requireProjectAction(db, actor, projectId, "share:manage");
  await assertScenarioInProject(db, projectId, scenarioId);
}

/** Every link of a scenario, live or not, newest first (revoked ones stay listed with their view counts). */
export async function listShareLinks(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string): Promise<ShareLinkDto[]> {
  await assertManages(db, actor, projectId, scenarioId);
  const rows = await linkQuery(db, projectId, scenarioId).orderBy("l.createdAt", "desc").orderBy("l.id").execute();
  return rows.map((r) => toDto(r));
}

/** Creates a read-only link; the token is returned once, here, and only its hash is kept. */
export async function createShareLink(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  scenarioId: string,
  input: { label: string; expiresInDays?: number | null },
): Promise<{ link: ShareLinkDto; token: string }> {
  const token = newToken();
  const expiresAt = input.expiresInDays ? new Date(Date.now() + input.expiresInDays * 24 * 3600_000) : null;
  const id = await db.transaction().execute(async (trx) => {
    await assertManages(trx, actor, projectId, scenarioId);
    const row = await trx
      .insertInto("shareLinks")
      .values({ projectId, scenarioId, label: input.label, tokenHash: hashToken(token), createdBy: actor.userId, expiresAt })
      .returning("id")
      .executeTakeFirstOrThrow();
    await recordAudit(trx, { projectId, actorId: actor.userId, action: "share_link_created", scenarioId, subject: input.label });
    return row.id;
  });
  return { link: toDto(await linkQuery(db, projectId, scenarioId).where("l.id", "=", id).executeTakeFirstOrThrow()), token };
}

export async function revokeShareLink(db: Kysely<Database>, actor: Actor, projectId: string, scenarioId: string, linkId: string): Promise<void> {
  const revoked = await db.transaction().execute(async (trx) => {
    await assertManages(trx, actor, projectId, scenarioId);
    if (!isUuid(linkId)) throw notFound("share link");
    const row = await trx
      .updateTable("shareLinks")
      .set({ revokedAt: new Date() })
      .where("id", "=", linkId)
      .where("projectId", "=", projectId)
      .where("scenarioId", "=", scenarioId)
      .where("revokedAt", "is", null)
      .returning("label")
      .executeTakeFirst();
    if (row) await recordAudit(trx, { projectId, actorId: actor.userId, action: "share_link_revoked", scenarioId, subject: row.label });
    return row;
  });
  if (revoked) return;
  const exists = await linkQuery(db, projectId, scenarioId).where("l.id", "=", linkId).executeTakeFirst();
  if (!exists) throw notFound("share link");
  throw conflict("this share link is already revoked");
}

/** Whether a token names a live share link, without counting a view (for answering 404 before a page renders). */
export async function shareLinkIsLive(db: Kysely<Database>, token: string): Promise<boolean> {
  const link = await db.selectFrom("shareLinks").select(["expiresAt", "revokedAt"]).where("tokenHash", "=", hashToken(token)).executeTakeFirst();
  return shareLinkIsOpen(link);
}

/**
 * Opens a share link for its holder, signed in or not: counts the view and answers the scenario as it is now.
 * A revoked, expired or unknown token is not found.
 */
export async function openSharedScenario(db: Kysely<Database>, token: string): Promise<SharedScenarioDto> {
  return (await openSharedScenarioRecord(db, token)).scenario;
}

/**
 * openSharedScenario with the scenario's id beside the DTO, for the server's own use (the result cache's key);
 * the DTO that leaves the server does not carry it.
 */
export async function openSharedScenarioRecord(db: Kysely<Database>, token: string): Promise<{ scenarioId: string; scenario: SharedScenarioDto }> {
  const link = await db
    .selectFrom("shareLinks")
    .select(["id", "scenarioId", "expiresAt", "revokedAt"])
    .where("tokenHash", "=", hashToken(token))
    .executeTakeFirst();
  assertShareLinkAccess(link, "scenario:read");
  await db
    .updateTable("shareLinks")
    .set((eb) => ({ viewCount: eb("viewCount", "+", 1), lastViewedAt: new Date() }))
    .where("id", "=", link.id)
    .execute();
  const row = await db
    .selectFrom("scenarios")
    .select(["title", "backgroundKind", "version", "updatedAt", "document"])
    .where("id", "=", link.scenarioId)
    .executeTakeFirst();
  // The link row cascades with its scenario; this only guards a deletion between the two reads.
  if (!row) throw notFound("share link");
  const parsed = parseScenarioDocument(row.document);
  const scenario: SharedScenarioDto = {
    title: row.title,
    backgroundKind: row.backgroundKind,
    version: row.version,
    updatedAt: row.updatedAt.toISOString(),
    document: parsed.ok ? parsed.document : null,
    documentIssues: parsed.ok ? null : parsed.issues,
    linkExpiresAt: link.expiresAt?.toISOString() ?? null,
  };
  return { scenarioId: link.scenarioId, scenario };
}

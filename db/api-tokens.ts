import "server-only";
import { randomBytes } from "node:crypto";
import type { Kysely } from "kysely";
import type { ApiTokenDto } from "../contracts/dto";
import { type Actor, requireProjectAction } from "./access";
import { AppError, conflict, notFound } from "./errors";
import { isUuid } from "./ids";
import type { ApiTokenScope, Database } from "./schema";
import { ADDRESS_POLICY, countLimitFailure, limitKeyWait } from "./sign-in-limits";
import { hashToken } from "./tokens";

/**
 * Personal API tokens: an account's scripts and notebooks acting for it over `Authorization: Bearer …`, under the
 * access policy of db/access.ts narrowed by the token's scope and project (see TokenGrant there).
 *
 * A token is 256 random bits behind a fixed prefix (so that secret scanners and people can tell what it is); only
 * its SHA-256 is stored, and it is shown once, when made. Unknown tokens count against the caller's address with
 * the sign-in back-off (db/sign-in-limits.ts); a revoked or expired token is refused (401) without counting, since
 * it is a real token left in a script rather than a guess.
 */
export const API_TOKEN_PREFIX = "bltok_";
/** Live tokens one account may hold at once. */
export const MAX_LIVE_TOKENS = 50;
/** Last use is recorded to the minute: a script's every request reads the token, but writes at most once a minute. */
const LAST_USE_RESOLUTION_MS = 60_000;


function tokenQuery(db: Kysely<Database>, userId: string) {
  return db
    .selectFrom("apiTokens as t")
    .leftJoin("projects as p", "p.id", "t.projectId")
    .select(["t.id", "t.name", "t.scope", "t.projectId", "p.name as projectName", "t.createdAt", "t.expiresAt", "t.lastUsedAt", "t.revokedAt"])
    .where("t.userId", "=", userId);
}

type TokenRow = Awaited<ReturnType<ReturnType<typeof tokenQuery>["executeTakeFirstOrThrow"]>>;

function toDto(r: TokenRow, now = new Date()): ApiTokenDto {
  return {
    id: r.id,
    name: r.name,
    scope: r.scope,
    project: r.projectId ? { id: r.projectId, name: r.projectName ?? "" } : null,
    status: r.revokedAt ? "revoked" : r.expiresAt && r.expiresAt <= now ? "expired" : "active",
    createdAt: r.createdAt.toISOString(),
    expiresAt: r.expiresAt?.toISOString() ?? null,
    lastUsedAt: r.lastUsedAt?.toISOString() ?? null,
    revokedAt: r.revokedAt?.toISOString() ?? null,
  };
}

/** The account's tokens, live or not, newest first. */
export async function listApiTokens(db: Kysely<Database>, actor: Actor): Promise<ApiTokenDto[]> {
  const rows = await tokenQuery(db, actor.userId).orderBy("t.createdAt", "desc").orderBy("t.id").execute();
  return rows.map((r) => toDto(r));
}

export interface ApiTokenInput {
  name: string;
  scope: ApiTokenScope;
  projectId?: string | null;
  /** Days until the token stops working; null: until it is revoked. */
  expiresInDays: number | null;
}

/**
 * Makes a token for the caller's account; the token is answered once, here. A project restriction must name a
 * project the caller can read (else not found), and a read-and-write token one they can write in (else 403): a
 * token never promises more than its account may do there.
 */
export async function createApiToken(db: Kysely<Database>, actor: Actor, input: ApiTokenInput): Promise<{ token: string; apiToken: ApiTokenDto }> {
  const token = `${API_TOKEN_PREFIX}${randomBytes(32).toString("base64url")}`;
  const expiresAt = input.expiresInDays ? new Date(Date.now() + input.expiresInDays * 24 * 3600_000) : null;
  const id = await db.transaction().execute(async (trx) => {
    // One account's token creations queue on its row, so the cap on live tokens holds under concurrency.
    await trx.selectFrom("users").select("id").where("id", "=", actor.userId).forUpdate().executeTakeFirst();
    if (input.projectId) await requireProjectAction(trx, actor, input.projectId, input.scope === "read" ? "project:read" : "scenario:write");
    const live = await trx
      .selectFrom("apiTokens")
      .select((eb) => eb.fn.countAll<string>().as("n"))
      .where("userId", "=", actor.userId)
      .where("revokedAt", "is", null)
      .where((eb) => eb.or([eb("expiresAt", "is", null), eb("expiresAt", ">", new Date())]))
      .executeTakeFirstOrThrow();
    if (Number(live.n) >= MAX_LIVE_TOKENS) throw conflict(`an account may hold at most ${MAX_LIVE_TOKENS} live tokens; revoke one you no longer use first`);
    const row = await trx
      .insertInto("apiTokens")
      .values({ userId: actor.userId, name: input.name, tokenHash: hashToken(token), scope: input.scope, projectId: input.projectId ?? null, expiresAt })
      .returning("id")
      .executeTakeFirstOrThrow();
    return row.id;
  });
  return { token, apiToken: toDto(await tokenQuery(db, actor.userId).where("t.id", "=", id).executeTakeFirstOrThrow()) };
}

/** Revokes one of the caller's tokens: it stops working at once. Another account's token is not found. */
export async function revokeApiToken(db: Kysely<Database>, actor: Actor, tokenId: string): Promise<void> {
  if (!isUuid(tokenId)) throw notFound("API token");
  const revoked = await db
    .updateTable("apiTokens")
    .set({ revokedAt: new Date() })
    .where("id", "=", tokenId)
    .where("userId", "=", actor.userId)
    .where("revokedAt", "is", null)
    .returning("id")
    .executeTakeFirst();
  if (revoked) return;
  const exists = await tokenQuery(db, actor.userId).where("t.id", "=", tokenId).executeTakeFirst();
  if (!exists) throw notFound("API token");
  throw conflict("this API token is already revoked");
}

const limitKey = (address: string) => `api-token-address:${address}`;

/**
 * The actor a bearer token stands for, or a 401 (unknown, revoked or expired token) or 429 (too many unknown
 * tokens from this address: the sign-in back-off). Records the token's last use, to the minute.
 */
export async function actorFromApiToken(db: Kysely<Database>, token: string, address: string, now = new Date()): Promise<Actor> {
  const wait = await limitKeyWait(db, limitKey(address));
  if (wait !== null) {
    throw new AppError("rate_limited", `too many unknown API tokens from this address; try again in ${wait} s`, undefined, { retryAfterSeconds: wait });
  }
  const row = token.startsWith(API_TOKEN_PREFIX)
    ? await db
        .selectFrom("apiTokens as t")
        .innerJoin("users as u", "u.id", "t.userId")
        .select(["t.id", "t.userId", "t.scope", "t.projectId", "t.expiresAt", "t.revokedAt", "t.lastUsedAt", "u.siteRole"])
        .where("t.tokenHash", "=", hashToken(token))
        .executeTakeFirst()
    : undefined;
  if (!row) {
    await countLimitFailure(db, limitKey(address), ADDRESS_POLICY);
    throw new AppError("unauthenticated", "this API token is not valid");
  }
  if (row.revokedAt) throw new AppError("unauthenticated", "this API token has been revoked");
  if (row.expiresAt && row.expiresAt <= now) throw new AppError("unauthenticated", "this API token has expired; make a new one on your account page");
  if (!row.lastUsedAt || now.getTime() - row.lastUsedAt.getTime() >= LAST_USE_RESOLUTION_MS) {
    await db.updateTable("apiTokens").set({ lastUsedAt: now }).where("id", "=", row.id).execute();
  }
  return { userId: row.userId, siteRole: row.siteRole, token: { tokenId: row.id, scope: row.scope, projectId: row.projectId } };
}

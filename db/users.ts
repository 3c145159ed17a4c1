import "server-only";
import bcrypt from "bcryptjs";
import { randomBytes } from "node:crypto";
import { type Kysely, sql } from "kysely";
import { type Actor, assertSiteAccess } from "./access";
import { AppError, conflict, notFound } from "./errors";
import { isUuid } from "./ids";
import type { Database, SiteRole, User } from "./schema";
import type { UserDto } from "../contracts/dto";

const BCRYPT_ROUNDS = 10;

export function toUserDto(u: User): UserDto {
  return {
    id: u.id,
    email: u.email,
    name: u.name,
    siteRole: u.siteRole,
    emailVerifiedAt: u.emailVerifiedAt?.toISOString() ?? null,
    createdAt: u.createdAt.toISOString(),
  };
}

export const normaliseEmail = (email: string) => email.trim().toLowerCase();

export async function findUserByEmail(db: Kysely<Database>, email: string): Promise<User | undefined> {
  return db.selectFrom("users").selectAll().where("email", "=", normaliseEmail(email)).executeTakeFirst();
}

export async function findUserById(db: Kysely<Database>, id: string): Promise<User | undefined> {
  if (!isUuid(id)) return undefined;
  return db.selectFrom("users").selectAll().where("id", "=", id).executeTakeFirst();
}

export async function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_ROUNDS);
}

// A hash of a random password that nobody knows, made with the same cost as real ones: an address without an
// account, or an account without a password, is compared against it, so the answer takes as long as for a real one.
let dummyHash: Promise<string> | undefined;
const dummyPasswordHash = () => (dummyHash ??= bcrypt.hash(randomBytes(18).toString("base64"), BCRYPT_ROUNDS));

const comparisons = { count: 0 };

/** How many bcrypt comparisons this process has made: a real counter, read by the tests of the sign-in limits. */
export const passwordComparisonCount = () => comparisons.count;

/**
 * Checks a password against the account's stored hash. Every call makes exactly one bcrypt comparison: against
 * a dummy hash when there is no account or it has no password (magic-link only), which never matches.
 */
export async function checkPassword(user: User | undefined, password: string): Promise<boolean> {
  const hash = user?.passwordHash ?? (await dummyPasswordHash());
  comparisons.count += 1;
  const same = await bcrypt.compare(password, hash);
  return same && user?.passwordHash != null;
}

/** The version a new session of this account is issued under (see sessionIsCurrent in lib/session.ts). */
export async function sessionVersionOf(db: Kysely<Database>, userId: string): Promise<number | undefined> {
  if (!isUuid(userId)) return undefined;
  const row = await db.selectFrom("users").select("sessionVersion").where("id", "=", userId).executeTakeFirst();
  return row?.sessionVersion;
}

/** Ends every session of the account at once: tokens issued under an older version are refused from now on. */
export async function endAllSessions(db: Kysely<Database>, userId: string): Promise<void> {
  if (!isUuid(userId)) return;
  await db
    .updateTable("users")
    .set({ sessionVersion: sql<number>`session_version + 1`, updatedAt: new Date() })
    .where("id", "=", userId)
    .execute();
}

export async function createUser(
  db: Kysely<Database>,
  input: { email: string; name: string; password?: string; siteRole?: SiteRole; emailVerified?: boolean },
): Promise<UserDto> {
  const email = normaliseEmail(input.email);
  const row = await db
    .insertInto("users")
    .values({
      email,
      name: input.name,
      passwordHash: input.password ? await hashPassword(input.password) : null,
      siteRole: input.siteRole ?? "member",
      emailVerifiedAt: input.emailVerified ? new Date() : null,
    })
    .onConflict((oc) => oc.expression(sql`lower(email)`).doNothing())
    .returningAll()
    .executeTakeFirst();
  if (!row) throw conflict("an account with this e-mail address already exists", [{ path: "email", message: "already registered" }]);
  return toUserDto(row);
}

/**
 * Sign-up: the new account, or null when the address already has one. The password is hashed either way, before
 * the insert, so both answers take the same time.
 */
export async function createUserIfNew(db: Kysely<Database>, input: { email: string; name: string; password: string }): Promise<UserDto | null> {
  try {
    return await createUser(db, input);
  } catch (error) {
    if (error instanceof AppError && error.code === "conflict") return null;
    throw error;
  }
}

export async function setPassword(db: Kysely<Database>, userId: string, password: string): Promise<void> {
  await db.updateTable("users").set({ passwordHash: await hashPassword(password), updatedAt: new Date() }).where("id", "=", userId).execute();
}

export async function updateAccount(db: Kysely<Database>, actor: Actor, input: { name?: string }): Promise<UserDto> {
  const row = await db
    .updateTable("users")
    .set({ ...input, updatedAt: new Date() })
    .where("id", "=", actor.userId)
    .returningAll()
    .executeTakeFirstOrThrow();
  return toUserDto(row);
}

export async function listUsers(db: Kysely<Database>, actor: Actor | null): Promise<UserDto[]> {
  assertSiteAccess(actor, "users:list");
  const rows = await db.selectFrom("users").selectAll().orderBy("createdAt").execute();
  return rows.map(toUserDto);
}

/** Changes a site role; the last administrator cannot demote themselves (the site would have none). */
export async function setSiteRole(db: Kysely<Database>, actor: Actor | null, userId: string, siteRole: SiteRole): Promise<UserDto> {
  assertSiteAccess(actor, "users:set-role");
  return db.transaction().execute(async (trx) => {
    const target = await findUserById(trx, userId);
    if (!target) throw notFound("user");
    if (target.siteRole === "admin" && siteRole !== "admin") {
      const admins = await trx.selectFrom("users").select("id").where("siteRole", "=", "admin").forUpdate().execute();
      if (admins.length === 1) throw new AppError("conflict", "the last site administrator cannot be demoted");
    }
    const row = await trx.updateTable("users").set({ siteRole, updatedAt: new Date() }).where("id", "=", userId).returningAll().executeTakeFirstOrThrow();
    return toUserDto(row);
  });
}

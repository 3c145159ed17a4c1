import "server-only";
import type { Kysely } from "kysely";
import { type Actor, assertProjectAccess } from "./access";
import { AppError, conflict, notFound } from "./errors";
import { isUuid } from "./ids";
import type { Database, ProjectRole } from "./schema";

export interface MemberDto {
  userId: string;
  email: string;
  name: string;
  role: ProjectRole;
  joinedAt: string;
}

/** The caller's role in a project, or null when the project does not exist or the caller is not a member. */
export async function roleInProject(db: Kysely<Database>, projectId: string, userId: string): Promise<ProjectRole | null> {
  if (!isUuid(projectId)) return null;
  const row = await db
    .selectFrom("projectMembers")
    .select("role")
    .where("projectId", "=", projectId)
    .where("userId", "=", userId)
    .executeTakeFirst();
  return row?.role ?? null;
}

export async function listMembers(db: Kysely<Database>, actor: Actor, projectId: string): Promise<MemberDto[]> {
  assertProjectAccess(await roleInProject(db, projectId, actor.userId), "members:read");
  const rows = await db
    .selectFrom("projectMembers as m")
    .innerJoin("users as u", "u.id", "m.userId")
    .select(["u.id as userId", "u.email", "u.name", "m.role", "m.createdAt"])
    .where("m.projectId", "=", projectId)
    .orderBy("m.createdAt")
    .execute();
  return rows.map((r) => ({ userId: r.userId, email: r.email, name: r.name, role: r.role, joinedAt: r.createdAt.toISOString() }));
}

export async function addMemberByEmail(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  email: string,
  role: ProjectRole,
): Promise<MemberDto> {
  assertProjectAccess(await roleInProject(db, projectId, actor.userId), "members:manage");
  const user = await db.selectFrom("users").select(["id", "email", "name"]).where("email", "=", email.toLowerCase()).executeTakeFirst();
  if (!user) {
    throw new AppError("unprocessable", "no Branchline account has this e-mail address; ask them to sign up first", [
      { path: "email", message: "no account with this address" },
    ]);
  }
  const inserted = await db
    .insertInto("projectMembers")
    .values({ projectId, userId: user.id, role })
    .onConflict((oc) => oc.columns(["projectId", "userId"]).doNothing())
    .returning("createdAt")
    .executeTakeFirst();
  if (!inserted) throw conflict("this person is already a member of the project", [{ path: "email", message: "already a member" }]);
  return { userId: user.id, email: user.email, name: user.name, role, joinedAt: inserted.createdAt.toISOString() };
}

async function countOwners(db: Kysely<Database>, projectId: string): Promise<number> {
  const { n } = await db
    .selectFrom("projectMembers")
    .select((eb) => eb.fn.countAll<string>().as("n"))
    .where("projectId", "=", projectId)
    .where("role", "=", "owner")
    .executeTakeFirstOrThrow();
  return Number(n);
}

/**
 * Changes a member's role. The last owner cannot be demoted. Runs in a transaction that locks the project's
 * membership rows, so two concurrent demotions cannot leave a project without an owner.
 */
export async function changeMemberRole(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  userId: string,
  role: ProjectRole,
): Promise<MemberDto> {
  return db.transaction().execute(async (trx) => {
    assertProjectAccess(await roleInProject(trx, projectId, actor.userId), "members:manage");
    if (!isUuid(userId)) throw notFound("member");
    await trx.selectFrom("projectMembers").select("userId").where("projectId", "=", projectId).forUpdate().execute();
    const current = await roleInProject(trx, projectId, userId);
    if (!current) throw notFound("member");
    if (current === "owner" && role !== "owner" && (await countOwners(trx, projectId)) === 1) {
      throw conflict("the last owner cannot be demoted; make someone else an owner first", [{ path: "role", message: "last owner" }]);
    }
    await trx.updateTable("projectMembers").set({ role }).where("projectId", "=", projectId).where("userId", "=", userId).execute();
    const members = await listMembers(trx, actor, projectId);
    return members.find((m) => m.userId === userId)!;
  });
}

/** Removes a member (an owner removing anyone, or any member leaving). The last owner cannot leave. */
export async function removeMember(db: Kysely<Database>, actor: Actor, projectId: string, userId: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const callerRole = await roleInProject(trx, projectId, actor.userId);
    if (actor.userId !== userId) assertProjectAccess(callerRole, "members:manage");
    else assertProjectAccess(callerRole, "project:read");
    if (!isUuid(userId)) throw notFound("member");
    await trx.selectFrom("projectMembers").select("userId").where("projectId", "=", projectId).forUpdate().execute();
    const current = await roleInProject(trx, projectId, userId);
    if (!current) throw notFound("member");
    if (current === "owner" && (await countOwners(trx, projectId)) === 1) {
      throw conflict("the last owner cannot leave the project; make someone else an owner first, or delete the project");
    }
    await trx.deleteFrom("projectMembers").where("projectId", "=", projectId).where("userId", "=", userId).execute();
  });
}

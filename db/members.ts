import "server-only";
import type { Kysely } from "kysely";
import { type Actor, assertProjectAccess, requireProjectAction, roleInProject } from "./access";
import { recordAudit } from "./audit";
import { AppError, conflict, notFound } from "./errors";
import { isUuid } from "./ids";
import type { Database, ProjectRole } from "./schema";
import type { MemberDto } from "../contracts/dto";

export async function listMembers(db: Kysely<Database>, actor: Actor, projectId: string): Promise<MemberDto[]> {
  await requireProjectAction(db, actor, projectId, "members:read");
  const rows = await db
    .selectFrom("projectMembers as m")
    .innerJoin("users as u", "u.id", "m.userId")
    .select(["u.id as userId", "u.email", "u.name", "m.role", "m.createdAt"])
    .where("m.projectId", "=", projectId)
    .orderBy("m.createdAt")
    .execute();
  return rows.map((r) => ({ userId: r.userId, email: r.email, name: r.name, role: r.role, joinedAt: r.createdAt.toISOString() }));
}

/** Adds an account to a project with a role, inside the caller's transaction; null when it is already a member. */
export async function insertMember(db: Kysely<Database>, projectId: string, userId: string, role: ProjectRole): Promise<Date | null> {
  const inserted = await db
    .insertInto("projectMembers")
    .values({ projectId, userId, role })
    .onConflict((oc) => oc.columns(["projectId", "userId"]).doNothing())
    .returning("createdAt")
    .executeTakeFirst();
  return inserted?.createdAt ?? null;
}

export async function addMemberByEmail(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  email: string,
  role: ProjectRole,
): Promise<MemberDto> {
  return db.transaction().execute(async (trx) => {
    await requireProjectAction(trx, actor, projectId, "members:manage");
    const user = await trx.selectFrom("users").select(["id", "email", "name"]).where("email", "=", email.toLowerCase()).executeTakeFirst();
    if (!user) {
      throw new AppError("unprocessable", "no Branchline account has this e-mail address; ask them to sign up first", [
        { path: "email", message: "no account with this address" },
      ]);
    }
    const joinedAt = await insertMember(trx, projectId, user.id, role);
    if (!joinedAt) throw conflict("this person is already a member of the project", [{ path: "email", message: "already a member" }]);
    await recordAudit(trx, { projectId, actorId: actor.userId, action: "member_added", targetUserId: user.id, targetEmail: user.email, role });
    return { userId: user.id, email: user.email, name: user.name, role, joinedAt: joinedAt.toISOString() };
  });
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

/** Locks the project's membership rows for the rest of the transaction, so concurrent changes queue. */
async function lockMembers(trx: Kysely<Database>, projectId: string): Promise<void> {
  await trx.selectFrom("projectMembers").select("userId").where("projectId", "=", projectId).forUpdate().execute();
}

/** A member's role and address, read under the lock; 404 when the account is not a member. */
async function existingMember(trx: Kysely<Database>, projectId: string, userId: string): Promise<{ role: ProjectRole; email: string }> {
  if (!isUuid(userId)) throw notFound("member");
  const row = await trx
    .selectFrom("projectMembers as m")
    .innerJoin("users as u", "u.id", "m.userId")
    .select(["m.role", "u.email"])
    .where("m.projectId", "=", projectId)
    .where("m.userId", "=", userId)
    .executeTakeFirst();
  if (!row) throw notFound("member");
  return row;
}

async function setRole(trx: Kysely<Database>, projectId: string, userId: string, role: ProjectRole): Promise<void> {
  await trx.updateTable("projectMembers").set({ role }).where("projectId", "=", projectId).where("userId", "=", userId).execute();
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
    await requireProjectAction(trx, actor, projectId, "members:manage");
    await lockMembers(trx, projectId);
    const current = await existingMember(trx, projectId, userId);
    if (current.role === "owner" && role !== "owner" && (await countOwners(trx, projectId)) === 1) {
      throw conflict("the last owner cannot be demoted; make someone else an owner first", [{ path: "role", message: "last owner" }]);
    }
    if (current.role !== role) {
      await setRole(trx, projectId, userId, role);
      await recordAudit(trx, {
        projectId,
        actorId: actor.userId,
        action: "role_changed",
        targetUserId: userId,
        targetEmail: current.email,
        role,
        previousRole: current.role,
      });
    }
    const members = await listMembers(trx, actor, projectId);
    return members.find((m) => m.userId === userId)!;
  });
}

/**
 * Hands the caller's ownership to another member: they become an owner, the caller an editor, in one step
 * (so the project is never without an owner). Only an owner may do it.
 */
export async function transferOwnership(db: Kysely<Database>, actor: Actor, projectId: string, userId: string): Promise<MemberDto[]> {
  return db.transaction().execute(async (trx) => {
    await requireProjectAction(trx, actor, projectId, "members:manage");
    if (userId === actor.userId) {
      throw new AppError("unprocessable", "choose another member: ownership passes from you to someone else", [{ path: "userId", message: "that is you" }]);
    }
    await lockMembers(trx, projectId);
    const target = await existingMember(trx, projectId, userId);
    await setRole(trx, projectId, userId, "owner");
    await setRole(trx, projectId, actor.userId, "editor");
    await recordAudit(trx, {
      projectId,
      actorId: actor.userId,
      action: "ownership_transferred",
      targetUserId: userId,
      targetEmail: target.email,
      role: "owner",
      previousRole: target.role,
    });
    return listMembers(trx, actor, projectId);
  });
}

/** Removes a member (an owner removing anyone, or any member leaving). The last owner cannot leave. */
export async function removeMember(db: Kysely<Database>, actor: Actor, projectId: string, userId: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    const callerRole = await roleInProject(trx, projectId, actor.userId);
    const leaving = actor.userId === userId;
    assertProjectAccess(callerRole, leaving ? "project:read" : "members:manage");
    await lockMembers(trx, projectId);
    const current = await existingMember(trx, projectId, userId);
    if (current.role === "owner" && (await countOwners(trx, projectId)) === 1) {
      throw conflict("the last owner cannot leave the project; make someone else an owner first, or delete the project");
    }
    await trx.deleteFrom("projectMembers").where("projectId", "=", projectId).where("userId", "=", userId).execute();
    await recordAudit(trx, {
      projectId,
      actorId: actor.userId,
      action: leaving ? "member_left" : "member_removed",
      targetUserId: userId,
      targetEmail: current.email,
      previousRole: current.role,
    });
  });
}

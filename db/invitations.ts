import "server-only";
import type { InferResult, Kysely } from "kysely";
import { type Actor, assertInvitationAcceptable, invitationIsOpen, requireProjectAction } from "./access";
import { recordAudit } from "./audit";
import { conflict, notFound } from "./errors";
import { isUuid } from "./ids";
import { insertMember } from "./members";
import { hashToken, newToken } from "./tokens";
import type { Database, InvitedRole, ProjectInvitationUpdate } from "./schema";
import { person } from "./people";
import type { InvitationDto } from "../contracts/dto";

/** How long an invitation link works. */
export const INVITATION_DAYS = 7;

/** What the e-mail needs; the token exists only here and in the e-mail, never in the database. */
export interface InvitationLetter {
  to: string;
  token: string;
  role: InvitedRole;
  projectName: string;
  inviterName: string;
  expiresAt: Date;
}

/**
 * Sends the e-mail. Called inside the transaction that stores the invitation, so an e-mail that cannot be
 * sent leaves nothing behind and the owner can simply try again.
 */
export type DeliverInvitation = (letter: InvitationLetter) => Promise<void>;

/** What the invitation page shows to whoever follows the link. */
export interface InvitationPreview {
  projectName: string;
  email: string;
  role: InvitedRole;
  invitedBy: string | null;
  expiresAt: string;
}

const expiryFromNow = () => new Date(Date.now() + INVITATION_DAYS * 24 * 3600_000);

function invitationQuery(db: Kysely<Database>, projectId: string) {
  return db
    .selectFrom("projectInvitations as i")
    .leftJoin("users as u", "u.id", "i.invitedBy")
    .select(["i.id", "i.email", "i.role", "i.invitedBy", "u.name as invitedByName", "i.createdAt", "i.sentAt", "i.expiresAt"])
    .where("i.projectId", "=", projectId)
    .where("i.acceptedAt", "is", null)
    .where("i.revokedAt", "is", null);
}

type InvitationRow = InferResult<ReturnType<typeof invitationQuery>>[number];

function toDto(r: InvitationRow, now = new Date()): InvitationDto {
  return {
    id: r.id,
    email: r.email,
    role: r.role,
    status: r.expiresAt > now ? "pending" : "expired",
    invitedBy: person(r.invitedBy, r.invitedByName),
    createdAt: r.createdAt.toISOString(),
    sentAt: r.sentAt.toISOString(),
    expiresAt: r.expiresAt.toISOString(),
  };
}

async function letterContext(db: Kysely<Database>, projectId: string, actor: Actor) {
  return db
    .selectFrom("projects as p")
    .innerJoin("users as u", (j) => j.on("u.id", "=", actor.userId))
    .select(["p.name as projectName", "u.name as inviterName"])
    .where("p.id", "=", projectId)
    .executeTakeFirstOrThrow();
}

/** Open invitations (not accepted, not revoked), newest first; expired ones are listed as such. */
export async function listInvitations(db: Kysely<Database>, actor: Actor, projectId: string): Promise<InvitationDto[]> {
  await requireProjectAction(db, actor, projectId, "members:invite");
  const rows = await invitationQuery(db, projectId).orderBy("i.createdAt", "desc").execute();
  return rows.map((r) => toDto(r));
}

/** Invites an address with a role. An address that is already a member, or already has an open invitation, is a 409. */
export async function createInvitation(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  input: { email: string; role: InvitedRole },
  deliver: DeliverInvitation,
): Promise<InvitationDto> {
  const email = input.email.trim().toLowerCase();
  return db.transaction().execute(async (trx) => {
    await requireProjectAction(trx, actor, projectId, "members:invite");
    // Invitations of one project queue here, so two owners inviting the same address cannot both succeed.
    await trx.selectFrom("projects").select("id").where("id", "=", projectId).forUpdate().execute();
    const member = await trx
      .selectFrom("projectMembers as m")
      .innerJoin("users as u", "u.id", "m.userId")
      .select("m.userId")
      .where("m.projectId", "=", projectId)
      .where("u.email", "=", email)
      .executeTakeFirst();
    if (member) throw conflict("this person is already a member of the project", [{ path: "email", message: "already a member" }]);
    const open = await invitationQuery(trx, projectId).where("i.email", "=", email).executeTakeFirst();
    if (open) {
      throw conflict("this address already has an invitation; send it again or revoke it below", [{ path: "email", message: "already invited" }]);
    }
    const token = newToken();
    const expiresAt = expiryFromNow();
    const { id } = await trx
      .insertInto("projectInvitations")
      .values({ projectId, email, role: input.role, tokenHash: hashToken(token), invitedBy: actor.userId, expiresAt })
      .returning("id")
      .executeTakeFirstOrThrow();
    await recordAudit(trx, { projectId, actorId: actor.userId, action: "invited", targetEmail: email, role: input.role });
    const context = await letterContext(trx, projectId, actor);
    await deliver({ to: email, token, role: input.role, expiresAt, ...context });
    return toDto(await invitationQuery(trx, projectId).where("i.id", "=", id).executeTakeFirstOrThrow());
  });
}

/** Changes an open invitation of the project; 404 when there is none with this id (or it was used or revoked). */
async function updateOpenInvitation(trx: Kysely<Database>, projectId: string, invitationId: string, change: ProjectInvitationUpdate) {
  if (!isUuid(invitationId)) throw notFound("invitation");
  const updated = await trx
    .updateTable("projectInvitations")
    .set(change)
    .where("id", "=", invitationId)
    .where("projectId", "=", projectId)
    .where("acceptedAt", "is", null)
    .where("revokedAt", "is", null)
    .returning(["email", "role"])
    .executeTakeFirst();
  if (!updated) throw notFound("invitation");
  return updated;
}

/** Sends an open invitation again with a new token and a new expiry; the old link stops working. */
export async function resendInvitation(
  db: Kysely<Database>,
  actor: Actor,
  projectId: string,
  invitationId: string,
  deliver: DeliverInvitation,
): Promise<InvitationDto> {
  return db.transaction().execute(async (trx) => {
    await requireProjectAction(trx, actor, projectId, "members:invite");
    const token = newToken();
    const expiresAt = expiryFromNow();
    const updated = await updateOpenInvitation(trx, projectId, invitationId, { tokenHash: hashToken(token), sentAt: new Date(), expiresAt });
    await recordAudit(trx, { projectId, actorId: actor.userId, action: "invitation_resent", targetEmail: updated.email, role: updated.role });
    const context = await letterContext(trx, projectId, actor);
    await deliver({ to: updated.email, token, role: updated.role, expiresAt, ...context });
    return toDto(await invitationQuery(trx, projectId).where("i.id", "=", invitationId).executeTakeFirstOrThrow());
  });
}

/** Revokes an open invitation: its link stops working at once. */
export async function revokeInvitation(db: Kysely<Database>, actor: Actor, projectId: string, invitationId: string): Promise<void> {
  await db.transaction().execute(async (trx) => {
    await requireProjectAction(trx, actor, projectId, "members:invite");
    const revoked = await updateOpenInvitation(trx, projectId, invitationId, { revokedAt: new Date() });
    await recordAudit(trx, { projectId, actorId: actor.userId, action: "invitation_revoked", targetEmail: revoked.email, role: revoked.role });
  });
}

/** What an invitation link shows before it is accepted; null when the token is unknown, used, revoked or expired. */
export async function previewInvitation(db: Kysely<Database>, token: string): Promise<InvitationPreview | null> {
  const row = await db
    .selectFrom("projectInvitations as i")
    .innerJoin("projects as p", "p.id", "i.projectId")
    .leftJoin("users as u", "u.id", "i.invitedBy")
    .select(["p.name as projectName", "i.email", "i.role", "u.name as invitedBy", "i.expiresAt", "i.acceptedAt", "i.revokedAt"])
    .where("i.tokenHash", "=", hashToken(token))
    .executeTakeFirst();
  if (!row || !invitationIsOpen(row)) return null;
  return { projectName: row.projectName, email: row.email, role: row.role, invitedBy: row.invitedBy, expiresAt: row.expiresAt.toISOString() };
}

/**
 * Accepts an invitation as the signed-in caller: they join the project with the invited role, and the token is
 * used up. The account's address must be the invited one (any letter case).
 */
export async function acceptInvitation(db: Kysely<Database>, actor: Actor, token: string): Promise<{ projectId: string }> {
  return db.transaction().execute(async (trx) => {
    const account = await trx.selectFrom("users").select("email").where("id", "=", actor.userId).executeTakeFirstOrThrow();
    const invitation = await trx
      .selectFrom("projectInvitations")
      .select(["id", "projectId", "email", "role", "expiresAt", "acceptedAt", "revokedAt"])
      .where("tokenHash", "=", hashToken(token))
      .forUpdate()
      .executeTakeFirst();
    assertInvitationAcceptable(invitation, account.email);
    const joined = await insertMember(trx, invitation.projectId, actor.userId, invitation.role);
    if (!joined) throw conflict("you are already a member of this project");
    await trx.updateTable("projectInvitations").set({ acceptedAt: new Date(), acceptedBy: actor.userId }).where("id", "=", invitation.id).execute();
    await recordAudit(trx, {
      projectId: invitation.projectId,
      actorId: actor.userId,
      action: "invitation_accepted",
      targetUserId: actor.userId,
      targetEmail: account.email,
      role: invitation.role,
    });
    return { projectId: invitation.projectId };
  });
}

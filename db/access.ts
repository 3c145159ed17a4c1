/**
 * The access policy: the one place that decides what a caller may do. Route handlers and server actions call
 * it on the server for every request; the UI may ask it too (to hide controls) but is never the authority.
 *
 * A project the caller is not a member of is reported as not found (404), never as forbidden, so that its
 * existence does not leak. A member whose role lacks the permission gets 403.
 *
 * Two kinds of token stand in for a membership here: an invitation (it may be accepted once, before it expires,
 * by the account with the address it was sent to) and a share link (its holder, signed in or not, may read the
 * one scenario it names while it is live, and do nothing else). A dead token of either kind is not found.
 */
import type { Kysely } from "kysely";
import type { ProjectAction } from "../contracts/dto";
import type { Database, ProjectRole, SiteRole } from "./schema";

export type { ProjectAction };
import { AppError, forbidden, notFound } from "./errors";
import { isUuid } from "./ids";

export interface Actor {
  userId: string;
  siteRole: SiteRole;
}


export type SiteAction = "users:list" | "users:set-role";

const projectGrants: Record<ProjectRole, ReadonlySet<ProjectAction>> = {
  viewer: new Set(["project:read", "members:read", "scenario:read"]),
  editor: new Set(["project:read", "members:read", "scenario:read", "scenario:write", "share:manage"]),
  owner: new Set([
    "project:read",
    "project:rename",
    "project:delete",
    "members:read",
    "members:manage",
    "members:invite",
    "members:audit",
    "scenario:read",
    "scenario:write",
    "share:manage",
  ]),
};

/** All a share link's holder may do, whoever they are: read the scenario it names. */
const linkHolderGrants: ReadonlySet<ProjectAction> = new Set(["scenario:read"]);

const siteGrants: Record<SiteRole, ReadonlySet<SiteAction>> = {
  admin: new Set(["users:list", "users:set-role"]),
  member: new Set(),
};

export function roleAllows(role: ProjectRole, action: ProjectAction): boolean {
  return projectGrants[role].has(action);
}

export function allowedProjectActions(role: ProjectRole): ProjectAction[] {
  return [...projectGrants[role]];
}

/** Throws unless the caller (with `role` in the project, or null when not a member) may do `action`. */
export function assertProjectAccess(role: ProjectRole | null, action: ProjectAction): asserts role is ProjectRole {
  if (role === null) throw notFound("project");
  if (!roleAllows(role, action)) throw forbidden(`your role in this project (${role}) does not allow ${describe(action)}`);
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

/**
 * Throws unless the caller may do `action` in the project (404 when not a member, 403 when the role does not allow
 * it), and answers the caller's role. Reads through `db`: pass the caller's transaction, so the check and the
 * write it guards see the same state.
 */
export async function requireProjectAction(db: Kysely<Database>, actor: Actor, projectId: string, action: ProjectAction): Promise<ProjectRole> {
  const role = await roleInProject(db, projectId, actor.userId);
  assertProjectAccess(role, action);
  return role;
}

export function assertSiteAccess(actor: Actor | null, action: SiteAction): asserts actor is Actor {
  if (!actor) throw new AppError("unauthenticated", "sign in first");
  if (!siteGrants[actor.siteRole].has(action)) throw forbidden("only a site administrator may do this");
}

/** The parts of a stored token that decide whether it still works. */
interface TokenState {
  expiresAt: Date | null;
  revokedAt: Date | null;
}

const isLive = (token: TokenState, now: Date) => token.revokedAt === null && (token.expiresAt === null || token.expiresAt > now);

/**
 * Throws unless a share link (as found by its token's hash, or undefined) is live and lets its holder do
 * `action`. A revoked, expired or unknown link is not found; a live one never grants more than reading.
 */
export function assertShareLinkAccess<T extends TokenState>(link: T | undefined, action: ProjectAction, now = new Date()): asserts link is T {
  if (!shareLinkIsOpen(link, now)) throw new AppError("not_found", "this share link was not found, or it has expired or been revoked");
  if (!linkHolderGrants.has(action)) throw forbidden("a share link only lets you read the scenario it names");
}

/** Whether a share link (or undefined, for an unknown token) still works. */
export function shareLinkIsOpen(link: TokenState | undefined, now = new Date()): link is TokenState {
  return link !== undefined && isLive(link, now);
}

/**
 * Throws unless an invitation (as found by its token's hash, or undefined) may still be accepted by the account
 * with `accountEmail`: not used, revoked or expired (else not found), and sent to this address (else forbidden).
 */
export function assertInvitationAcceptable<T extends TokenState & { acceptedAt: Date | null; email: string }>(
  invitation: T | undefined,
  accountEmail: string,
  now = new Date(),
): asserts invitation is T {
  if (!invitation || !invitationIsOpen(invitation, now)) throw invitationNotFound();
  if (invitation.email.toLowerCase() !== accountEmail.toLowerCase()) {
    throw forbidden(
      `this invitation was sent to ${invitation.email}, but you are signed in as ${accountEmail}; sign in with the invited address to accept it`,
    );
  }
}

export const invitationNotFound = () => new AppError("not_found", "this invitation was not found, or it has expired, been used or been revoked");

/** Whether an invitation can still be accepted by someone (for showing it before sign-in). */
export function invitationIsOpen(invitation: TokenState & { acceptedAt: Date | null }, now = new Date()): boolean {
  return invitation.acceptedAt === null && isLive(invitation, now);
}

function describe(action: ProjectAction): string {
  const words: Record<ProjectAction, string> = {
    "project:read": "reading the project",
    "project:rename": "renaming the project",
    "project:delete": "deleting the project",
    "members:read": "listing members",
    "members:manage": "managing members",
    "members:invite": "inviting people",
    "members:audit": "reading the membership history",
    "share:manage": "managing share links",
    "scenario:read": "reading scenarios",
    "scenario:write": "changing scenarios",
  };
  return words[action];
}

/**
 * The access policy: the one place that decides what a caller may do. Route handlers and server actions call
 * it on the server for every request; the UI may ask it too (to hide controls) but is never the authority.
 *
 * A project the caller is not a member of is reported as not found (404), never as forbidden, so that its
 * existence does not leak. A member whose role lacks the permission gets 403.
 */
import type { ProjectRole, SiteRole } from "./schema";
import { AppError, forbidden, notFound } from "./errors";

export interface Actor {
  userId: string;
  siteRole: SiteRole;
}

export type ProjectAction =
  | "project:read"
  | "project:rename"
  | "project:delete"
  | "members:read"
  | "members:manage"
  | "scenario:read"
  | "scenario:write";

export type SiteAction = "users:list" | "users:set-role";

const projectGrants: Record<ProjectRole, ReadonlySet<ProjectAction>> = {
  viewer: new Set(["project:read", "members:read", "scenario:read"]),
  editor: new Set(["project:read", "members:read", "scenario:read", "scenario:write"]),
  owner: new Set(["project:read", "project:rename", "project:delete", "members:read", "members:manage", "scenario:read", "scenario:write"]),
};

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

export function assertSiteAccess(actor: Actor | null, action: SiteAction): asserts actor is Actor {
  if (!actor) throw new AppError("unauthenticated", "sign in first");
  if (!siteGrants[actor.siteRole].has(action)) throw forbidden("only a site administrator may do this");
}

function describe(action: ProjectAction): string {
  const words: Record<ProjectAction, string> = {
    "project:read": "reading the project",
    "project:rename": "renaming the project",
    "project:delete": "deleting the project",
    "members:read": "listing members",
    "members:manage": "managing members",
    "scenario:read": "reading scenarios",
    "scenario:write": "changing scenarios",
  };
  return words[action];
}

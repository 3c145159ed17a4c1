/**
 * What the JSON API answers with: the data transfer objects of every resource, as the browser, the CLI and the
 * tests read them. Pure types (no server code): db/ maps its rows onto these, components/ and notebooks read them.
 */
import type { ScenarioDocument } from "../physics/scenario/schema";
import type { DocumentDiff } from "./json-diff";

export type SiteRole = "admin" | "member";
export type ProjectRole = "owner" | "editor" | "viewer";
export type InvitedRole = Exclude<ProjectRole, "owner">;

/** What a role may do in a project (db/access.ts grants them per role). */
export type ProjectAction =
  | "project:read"
  | "project:rename"
  | "project:delete"
  | "members:read"
  | "members:manage"
  | "members:invite"
  | "members:audit"
  | "share:manage"
  | "scenario:read"
  | "scenario:write";

export type AuditAction =
  | "member_added"
  | "invited"
  | "invitation_resent"
  | "invitation_revoked"
  | "invitation_accepted"
  | "role_changed"
  | "member_removed"
  | "member_left"
  | "ownership_transferred"
  | "share_link_created"
  | "share_link_revoked"
  | "attachment_added"
  | "attachment_deleted"
  | "scenario_imported";

/** A person as lists show them: who saved, invited, made a link. */
export interface PersonDto {
  id: string;
  name: string;
}

export interface UserDto {
  id: string;
  email: string;
  name: string;
  siteRole: SiteRole;
  emailVerifiedAt: string | null;
  createdAt: string;
}

export interface ProjectDto {
  id: string;
  name: string;
  description: string;
  role: ProjectRole;
  /** What the caller's role allows, so the UI can hide what it cannot do (the server still decides). */
  can: ProjectAction[];
  scenarioCount: number;
  lastChangedAt: string;
  createdAt: string;
}

export interface MemberDto {
  userId: string;
  email: string;
  name: string;
  role: ProjectRole;
  joinedAt: string;
}

export interface InvitationDto {
  id: string;
  email: string;
  role: InvitedRole;
  /** "expired": still listed, so an owner can send it again or revoke it. */
  status: "pending" | "expired";
  invitedBy: PersonDto | null;
  createdAt: string;
  sentAt: string;
  expiresAt: string;
}

/** One change in the project: who did what to whom (a membership change) or to which scenario (a share link, a file), and when. */
export interface AuditEntryDto {
  id: string;
  at: string;
  action: AuditAction;
  /** Null when the account that did it has since been deleted. */
  actor: PersonDto | null;
  /** The person concerned; null for entries about a scenario. */
  target: { userId: string | null; name: string | null; email: string } | null;
  role: ProjectRole | null;
  previousRole: ProjectRole | null;
  /** The scenario concerned (title as it is now; null once deleted, or for membership changes). */
  scenario: { id: string; title: string } | null;
  /** What was concerned, named at the time: a share link's label, a file's name. */
  subject: string | null;
}

export interface ScenarioSummaryDto {
  id: string;
  projectId: string;
  title: string;
  backgroundKind: string;
  schemaVersion: number;
  version: number;
  createdAt: string;
  updatedAt: string;
  updatedBy: PersonDto | null;
}

export interface ScenarioDto extends ScenarioSummaryDto {
  /** The document upgraded to the current schema version; null when it could not be read (see documentIssues). */
  document: ScenarioDocument | null;
  /** Why a stored document could not be read, when it could not; the raw document is kept untouched. */
  documentIssues: { path: string; message: string }[] | null;
  createdBy: PersonDto | null;
}

export interface ScenarioPage {
  items: ScenarioSummaryDto[];
  total: number;
  page: number;
  pageSize: number;
}

export interface RevisionSummaryDto {
  version: number;
  title: string;
  schemaVersion: number;
  createdAt: string;
  createdBy: PersonDto | null;
}

export interface RevisionDto extends RevisionSummaryDto {
  document: ScenarioDocument | null;
  documentIssues: { path: string; message: string }[] | null;
}

export interface RevisionDiffDto extends DocumentDiff {
  /** The older side (?against=) and the newer side (the revision in the path). */
  from: RevisionSummaryDto;
  to: RevisionSummaryDto;
  /** The title, when it differs; titles live beside the document. */
  title: { before: string; after: string } | null;
}

export interface ShareLinkDto {
  id: string;
  label: string;
  status: "active" | "expired" | "revoked";
  createdAt: string;
  createdBy: PersonDto | null;
  expiresAt: string | null;
  revokedAt: string | null;
  viewCount: number;
  lastViewedAt: string | null;
}

/** What a share link's holder sees: the scenario and nothing else of its project (no names, no ids). */
export interface SharedScenarioDto {
  title: string;
  backgroundKind: string;
  version: number;
  updatedAt: string;
  document: ScenarioDocument | null;
  documentIssues: { path: string; message: string }[] | null;
  /** When the link stops working, if it does. */
  linkExpiresAt: string | null;
}

export interface AttachmentDto {
  id: string;
  scenarioId: string;
  fileName: string;
  mediaType: string;
  sizeBytes: number;
  uploadedBy: PersonDto | null;
  createdAt: string;
}

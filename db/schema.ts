/**
 * The one Database interface: tables in snake_case in PostgreSQL, camelCase here (Kysely's CamelCasePlugin maps
 * between them). Generated<> marks columns the database fills in.
 */
import type { ColumnType, Generated, Insertable, Selectable, Updateable } from "kysely";
import type { AuditAction, InvitedRole, ProjectRole, SiteRole } from "../contracts/dto";

export type { AuditAction, InvitedRole, ProjectRole, SiteRole };

type Timestamp = ColumnType<Date, Date | string | undefined, Date | string>;
type Json = ColumnType<unknown, string, string>;


export interface UsersTable {
  id: Generated<string>;
  email: string;
  name: string;
  passwordHash: string | null;
  siteRole: ColumnType<SiteRole, SiteRole | undefined, SiteRole>;
  emailVerifiedAt: Date | null;
  /** Raised to end every session of this account; each session token carries the version it was issued under. */
  sessionVersion: Generated<number>;
  createdAt: Generated<Date>;
  updatedAt: Timestamp;
}

export interface VerificationTokensTable {
  identifier: string;
  token: string;
  expiresAt: Date;
}

export interface PasswordResetTokensTable {
  tokenHash: string;
  userId: string;
  expiresAt: Date;
  usedAt: Date | null;
  createdAt: Generated<Date>;
}

export interface SignInAttemptsTable {
  id: Generated<string>;
  email: string;
  address: string;
  succeeded: boolean;
  attemptedAt: Generated<Date>;
}

/** One limiter key (an address, an account, or an account from one address); see db/sign-in-limits.ts. */
export interface SignInLimitsTable {
  key: string;
  /** The lower-cased account the key is about, so a password reset can clear its keys; null for address keys. */
  account: string | null;
  failures: number;
  nextAttemptAt: Date;
  updatedAt: Timestamp;
}

export interface ProjectsTable {
  id: Generated<string>;
  name: string;
  description: Generated<string>;
  createdBy: string | null;
  createdAt: Generated<Date>;
  updatedAt: Timestamp;
}

export interface ProjectMembersTable {
  projectId: string;
  userId: string;
  role: ProjectRole;
  createdAt: Generated<Date>;
}

export interface ScenariosTable {
  id: Generated<string>;
  projectId: string;
  title: string;
  document: Json;
  schemaVersion: number;
  backgroundKind: string;
  version: Generated<number>;
  createdBy: string | null;
  updatedBy: string | null;
  createdAt: Generated<Date>;
  updatedAt: Timestamp;
}

export interface ScenarioRevisionsTable {
  id: Generated<string>;
  scenarioId: string;
  version: number;
  title: string;
  document: Json;
  schemaVersion: number;
  createdBy: string | null;
  createdAt: Generated<Date>;
}


export interface ProjectInvitationsTable {
  id: Generated<string>;
  projectId: string;
  /** Lower-cased. */
  email: string;
  role: InvitedRole;
  /** SHA-256 (hex) of the token in the e-mailed link; the token itself is never stored. */
  tokenHash: string;
  invitedBy: string | null;
  createdAt: Generated<Date>;
  sentAt: Timestamp;
  expiresAt: Date;
  acceptedAt: Date | null;
  acceptedBy: string | null;
  revokedAt: Date | null;
}

export interface ShareLinksTable {
  id: Generated<string>;
  projectId: string;
  scenarioId: string;
  label: string;
  /** SHA-256 (hex) of the token in the link. */
  tokenHash: string;
  createdBy: string | null;
  createdAt: Generated<Date>;
  expiresAt: Date | null;
  revokedAt: Date | null;
  viewCount: Generated<number>;
  lastViewedAt: Date | null;
}


export interface ProjectAuditTable {
  id: Generated<string>;
  projectId: string;
  actorId: string | null;
  action: AuditAction;
  targetUserId: string | null;
  /** The target's address at the time; null for entries about a scenario rather than a person. */
  targetEmail: string | null;
  role: ProjectRole | null;
  previousRole: ProjectRole | null;
  /** For entries about a scenario: which one (null once deleted) and what, named at the time (link label, file name). */
  scenarioId: string | null;
  subject: string | null;
  createdAt: Generated<Date>;
}

/** A file kept with a scenario (figure, notes, data); its bytes are in object storage under objectKey. */
export interface AttachmentsTable {
  id: Generated<string>;
  projectId: string;
  scenarioId: string;
  fileName: string;
  /** Decided from the content, not the name (see lib/sniff.ts). */
  mediaType: string;
  sizeBytes: number;
  objectKey: string;
  uploadedBy: string | null;
  createdAt: Generated<Date>;
}

/** A saved scenario's computed outcome at one version (lib/scenario-compute.ts decides what it holds). */
export interface ScenarioResultsTable {
  scenarioId: string;
  version: number;
  engineKey: string;
  outcome: Json;
  computedAt: Generated<Date>;
}

/** Counters of rate-limiter-flexible's PostgreSQL store (RateLimiterPostgres with tableCreated). */
export interface ComputeRateLimitsTable {
  key: string;
  points: number;
  expire: string | null;
}

export interface Database {
  users: UsersTable;
  verificationTokens: VerificationTokensTable;
  passwordResetTokens: PasswordResetTokensTable;
  signInAttempts: SignInAttemptsTable;
  signInLimits: SignInLimitsTable;
  projects: ProjectsTable;
  projectMembers: ProjectMembersTable;
  scenarios: ScenariosTable;
  scenarioRevisions: ScenarioRevisionsTable;
  projectInvitations: ProjectInvitationsTable;
  shareLinks: ShareLinksTable;
  projectAudit: ProjectAuditTable;
  attachments: AttachmentsTable;
  scenarioResults: ScenarioResultsTable;
  computeRateLimits: ComputeRateLimitsTable;
}

export type User = Selectable<UsersTable>;
export type NewUser = Insertable<UsersTable>;
export type UserUpdate = Updateable<UsersTable>;
export type Project = Selectable<ProjectsTable>;
export type NewProject = Insertable<ProjectsTable>;
export type ProjectUpdate = Updateable<ProjectsTable>;
export type ProjectMember = Selectable<ProjectMembersTable>;
export type Scenario = Selectable<ScenariosTable>;
export type NewScenario = Insertable<ScenariosTable>;
export type ScenarioUpdate = Updateable<ScenariosTable>;
export type ScenarioRevision = Selectable<ScenarioRevisionsTable>;
export type ProjectInvitation = Selectable<ProjectInvitationsTable>;
export type NewProjectInvitation = Insertable<ProjectInvitationsTable>;
export type ProjectInvitationUpdate = Updateable<ProjectInvitationsTable>;
export type ShareLink = Selectable<ShareLinksTable>;
export type NewShareLink = Insertable<ShareLinksTable>;
export type ShareLinkUpdate = Updateable<ShareLinksTable>;
export type ProjectAuditEntry = Selectable<ProjectAuditTable>;
export type NewProjectAuditEntry = Insertable<ProjectAuditTable>;
export type Attachment = Selectable<AttachmentsTable>;
export type NewAttachment = Insertable<AttachmentsTable>;

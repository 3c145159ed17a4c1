/**
 * The shape of one row of the authorization table (see authorization.test.ts) and the expectation helpers the
 * rows are written with. Rows live in authorization-cases/*.ts by area, so that each area adds its own.
 */
import type { ProjectFixture, Role, TeamExtras } from "../fixtures";

export type Caller = Role | "linkHolder";

export interface Case {
  /** Route file under app/api, as on disk. */
  file: string;
  method: "GET" | "POST" | "PUT" | "PATCH" | "DELETE";
  /** The fixture gets an invitation and share links first (see teamExtras). */
  extras?: true;
  path: (f: ProjectFixture, x: TeamExtras, caller: Caller) => string;
  params?: (f: ProjectFixture, x: TeamExtras, caller: Caller) => Record<string, string>;
  query?: (f: ProjectFixture) => Record<string, string>;
  body?: (f: ProjectFixture) => unknown;
  expected: Record<Role, number> & { linkHolder?: number };
  /** The owner's API tokens, where the rule of authorization-cases/tokens.ts (tokenExpectation) does not say it. */
  tokens?: Partial<Record<TokenCaller, number>>;
}

/**
 * Callers holding one of the fixture owner's personal API tokens: read-write for every project (`ownerToken`),
 * read-only (`readToken`), read-write but restricted to another project of the owner (`elsewhereToken`), and a
 * revoked and an expired read-write token.
 */
export type TokenCaller = "ownerToken" | "readToken" | "elsewhereToken" | "revokedToken" | "expiredToken";
export const tokenCallers: TokenCaller[] = ["ownerToken", "readToken", "elsewhereToken", "revokedToken", "expiredToken"];
/** Routes for a signed-in browser only (the account itself, its tokens, invitations): every live token gets 403. */
export const browserOnly = { tokens: { ownerToken: 403, readToken: 403, elsewhereToken: 403 } } as const;

export const P = (f: ProjectFixture) => ({ projectId: f.projectId });
export const S = (f: ProjectFixture) => ({ projectId: f.projectId, scenarioId: f.scenarioId });
export const everyone = (status: number): Record<Role, number> => ({ anonymous: status, stranger: status, viewer: status, editor: status, owner: status });
export const signedIn = (status: number): Record<Role, number> => ({ ...everyone(status), anonymous: 401 });
export const readers = (status: number): Record<Role, number> => ({ anonymous: 401, stranger: 404, viewer: status, editor: status, owner: status });
export const writers = (status: number): Record<Role, number> => ({ anonymous: 401, stranger: 404, viewer: 403, editor: status, owner: status });
export const owners = (status: number): Record<Role, number> => ({ anonymous: 401, stranger: 404, viewer: 403, editor: 403, owner: status });
/** A share link's holder is signed out: outside the share route, the token does not make them anyone. */
export const holderToo = (expected: Record<Role, number>) => ({ ...expected, linkHolder: 401 });
export const I = (f: ProjectFixture, x: TeamExtras) => ({ projectId: f.projectId, invitationId: x.invitationId });
export const R1 = (f: ProjectFixture) => ({ ...S(f), version: "1" });
let unique = 0;
/** A fresh number for addresses and names that must not collide between cases. */
export const nextUnique = () => `${++unique}-${Date.now()}`;


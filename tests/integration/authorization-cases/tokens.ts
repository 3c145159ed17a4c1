/**
 * Authorization rows for the account's API token routes, and the rule that says what each of the owner's tokens
 * (see TokenCaller in shared.ts) gets on every row of the table: the same access policy as a session, narrowed.
 */
import { getDb } from "@/db";
import { createApiToken, revokeApiToken } from "@/db/api-tokens";
import { createProject } from "@/db/projects";
import type { ProjectFixture } from "../fixtures";
import { browserOnly, type Case, nextUnique, signedIn, type TokenCaller } from "./shared";

const T = (_f: ProjectFixture, x: { ownerTokenId?: string }) => ({ tokenId: x.ownerTokenId! });

export const tokenCases: Case[] = [
  { file: "account/tokens/route.ts", method: "GET", path: () => "/api/account/tokens", expected: signedIn(200), ...browserOnly },
  { file: "account/tokens/route.ts", method: "POST", path: () => "/api/account/tokens", body: () => ({ name: `notebook ${nextUnique()}`, scope: "read", expiresInDays: 30 }), expected: signedIn(201), ...browserOnly },
  // The token is the owner's: to every other account it is not found.
  { file: "account/tokens/[tokenId]/route.ts", method: "DELETE", extras: true, path: (f, x) => `/api/account/tokens/${x.ownerTokenId}`, params: T, expected: { anonymous: 401, stranger: 404, viewer: 404, editor: 404, owner: 204 }, ...browserOnly },
];

/**
 * What a token caller gets on a row, unless the row says otherwise (`tokens`):
 * - the read-write token is the owner's session exactly;
 * - the read-only token reads as the owner, and is refused (403) every change the owner could make; routes open
 *   to anyone answer it as they answer the owner;
 * - the token restricted to another project is a stranger to the fixture's project, and the owner elsewhere;
 * - a revoked or expired token is 401 wherever the route asks who the caller is (routes open to anyone that never
 *   ask answer as to anyone).
 */
export function tokenExpectation(c: Case, caller: TokenCaller): number {
  const override = c.tokens?.[caller];
  if (override !== undefined) return override;
  const { owner, anonymous, stranger } = c.expected;
  const openToAnyone = anonymous !== 401;
  switch (caller) {
    case "ownerToken":
      return owner;
    case "readToken":
      return c.method === "GET" || openToAnyone || owner >= 400 ? owner : 403;
    case "elsewhereToken":
      return c.file.startsWith("projects/[projectId]/") ? stranger : owner;
    case "revokedToken":
    case "expiredToken":
      return openToAnyone ? anonymous : 401;
  }
}

/** Makes the fixture owner's token of that kind and answers it (the secret, as a script would hold it). */
export async function tokenFor(f: ProjectFixture, caller: TokenCaller): Promise<string> {
  const db = getDb();
  const owner = { userId: f.users.owner.id, siteRole: "member" as const };
  const make = (input: Parameters<typeof createApiToken>[2]) => createApiToken(db, owner, input);
  switch (caller) {
    case "ownerToken":
      return (await make({ name: "everything", scope: "read-write", expiresInDays: 30 })).token;
    case "readToken":
      return (await make({ name: "reading", scope: "read", expiresInDays: 30 })).token;
    case "elsewhereToken": {
      const elsewhere = await createProject(db, owner, { name: "The owner's other project" });
      return (await make({ name: "other project", scope: "read-write", projectId: elsewhere.id, expiresInDays: 30 })).token;
    }
    case "revokedToken": {
      const made = await make({ name: "revoked", scope: "read-write", expiresInDays: 30 });
      await revokeApiToken(db, owner, made.apiToken.id);
      return made.token;
    }
    case "expiredToken": {
      const made = await make({ name: "expired", scope: "read-write", expiresInDays: 1 });
      await db.updateTable("apiTokens").set({ expiresAt: new Date(Date.now() - 1000) }).where("id", "=", made.apiToken.id).execute();
      return made.token;
    }
  }
}

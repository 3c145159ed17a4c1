/**
 * The authorization table: every route handler under app/api × every kind of caller, with the exact status.
 * A project the caller cannot see answers 404 (its existence must not leak); a member whose role lacks the
 * permission gets 403; a signed-out caller 401. Each case runs on a fresh fixture, so destructive cases do
 * not disturb the others. The last test fails when a route exists that the table does not cover.
 *
 * Where a scenario is involved there is a sixth caller, the link holder: signed out, holding a live share link
 * of the fixture's scenario. On the share route the token is the path (the other callers hold only a revoked
 * one); everywhere else it rides along as a header and a query parameter, and must grant nothing.
 */
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { call, makeUser } from "./harness";
import { type ProjectFixture, projectFixture, type Role, type TeamExtras, teamExtras, userFor } from "./fixtures";

type Caller = Role | "linkHolder";

interface Case {
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
}

const P = (f: ProjectFixture) => ({ projectId: f.projectId });
const S = (f: ProjectFixture) => ({ projectId: f.projectId, scenarioId: f.scenarioId });
const everyone = (status: number): Record<Role, number> => ({ anonymous: status, stranger: status, viewer: status, editor: status, owner: status });
const signedIn = (status: number): Record<Role, number> => ({ ...everyone(status), anonymous: 401 });
const readers = (status: number): Record<Role, number> => ({ anonymous: 401, stranger: 404, viewer: status, editor: status, owner: status });
const writers = (status: number): Record<Role, number> => ({ anonymous: 401, stranger: 404, viewer: 403, editor: status, owner: status });
const owners = (status: number): Record<Role, number> => ({ anonymous: 401, stranger: 404, viewer: 403, editor: 403, owner: status });
/** A share link's holder is signed out: outside the share route, the token does not make them anyone. */
const holderToo = (expected: Record<Role, number>) => ({ ...expected, linkHolder: 401 });
const I = (f: ProjectFixture, x: TeamExtras) => ({ projectId: f.projectId, invitationId: x.invitationId });
const R1 = (f: ProjectFixture) => ({ ...S(f), version: "1" });
let unique = 0;

const cases: Case[] = [
  { file: "compute/route.ts", method: "POST", path: () => "/api/compute", body: () => defaultScenarioDocument(), expected: everyone(200) },
  { file: "users/route.ts", method: "POST", path: () => "/api/users", body: () => ({ email: `new-${++unique}-${Date.now()}@example.test`, name: "New Person", password: "a long enough password" }), expected: everyone(201) },
  { file: "password-reset/route.ts", method: "POST", path: () => "/api/password-reset", body: () => ({ email: "nobody@example.test" }), expected: everyone(202) },
  { file: "password-reset/confirm/route.ts", method: "POST", path: () => "/api/password-reset/confirm", body: () => ({ token: "not-a-real-token-at-all", password: "a long enough password" }), expected: everyone(422) },
  { file: "account/route.ts", method: "GET", path: () => "/api/account", expected: signedIn(200) },
  { file: "account/route.ts", method: "PATCH", path: () => "/api/account", body: () => ({ name: "Renamed Person" }), expected: signedIn(200) },
  { file: "admin/users/route.ts", method: "GET", path: () => "/api/admin/users", expected: { ...signedIn(403) } },
  { file: "admin/users/[userId]/route.ts", method: "PATCH", path: (f) => `/api/admin/users/${f.users.viewer.id}`, params: (f) => ({ userId: f.users.viewer.id }), body: () => ({ siteRole: "admin" }), expected: signedIn(403) },
  { file: "projects/route.ts", method: "GET", path: () => "/api/projects", expected: signedIn(200) },
  { file: "projects/route.ts", method: "POST", path: () => "/api/projects", body: () => ({ name: "Another project" }), expected: signedIn(201) },
  { file: "projects/[projectId]/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}`, params: P, expected: readers(200) },
  { file: "projects/[projectId]/route.ts", method: "PATCH", path: (f) => `/api/projects/${f.projectId}`, params: P, body: () => ({ name: "Renamed project" }), expected: owners(200) },
  { file: "projects/[projectId]/route.ts", method: "DELETE", path: (f) => `/api/projects/${f.projectId}`, params: P, expected: owners(204) },
  { file: "projects/[projectId]/members/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}/members`, params: P, expected: readers(200) },
  { file: "projects/[projectId]/members/route.ts", method: "POST", path: (f) => `/api/projects/${f.projectId}/members`, params: P, body: (f) => ({ email: f.outsider.email, role: "viewer" }), expected: owners(201) },
  { file: "projects/[projectId]/members/[userId]/route.ts", method: "PATCH", path: (f) => `/api/projects/${f.projectId}/members/${f.extraMember.id}`, params: (f) => ({ projectId: f.projectId, userId: f.extraMember.id }), body: () => ({ role: "viewer" }), expected: owners(200) },
  { file: "projects/[projectId]/members/[userId]/route.ts", method: "DELETE", path: (f) => `/api/projects/${f.projectId}/members/${f.extraMember.id}`, params: (f) => ({ projectId: f.projectId, userId: f.extraMember.id }), expected: owners(204) },
  { file: "projects/[projectId]/scenarios/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}/scenarios`, params: P, expected: readers(200) },
  { file: "projects/[projectId]/scenarios/route.ts", method: "POST", path: (f) => `/api/projects/${f.projectId}/scenarios`, params: P, body: () => ({ title: "New scenario", document: defaultScenarioDocument() }), expected: writers(201) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}`, params: S, expected: holderToo(readers(200)) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/route.ts", method: "PUT", path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}`, params: S, body: () => ({ version: 1, title: "Saved again" }), expected: holderToo(writers(200)) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/route.ts", method: "DELETE", path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}`, params: S, expected: holderToo(writers(204)) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/duplicate/route.ts", method: "POST", path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/duplicate`, params: S, body: () => ({}), expected: holderToo(writers(201)) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/revisions/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/revisions`, params: S, expected: holderToo(readers(200)) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/revisions/[version]/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/revisions/1`, params: R1, expected: holderToo(readers(200)) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/revisions/[version]/restore/route.ts", method: "POST", path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/revisions/1/restore`, params: R1, expected: holderToo(writers(201)) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/revisions/[version]/diff/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/revisions/1/diff`, params: R1, query: () => ({ against: "1" }), expected: holderToo(readers(200)) },
  { file: "projects/[projectId]/invitations/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}/invitations`, params: P, expected: owners(200) },
  { file: "projects/[projectId]/invitations/route.ts", method: "POST", path: (f) => `/api/projects/${f.projectId}/invitations`, params: P, body: () => ({ email: `invitee-${++unique}-${Date.now()}@example.test`, role: "viewer" }), expected: owners(201) },
  { file: "projects/[projectId]/invitations/[invitationId]/route.ts", method: "DELETE", extras: true, path: (f, x) => `/api/projects/${f.projectId}/invitations/${x.invitationId}`, params: I, expected: owners(204) },
  { file: "projects/[projectId]/invitations/[invitationId]/resend/route.ts", method: "POST", extras: true, path: (f, x) => `/api/projects/${f.projectId}/invitations/${x.invitationId}/resend`, params: I, expected: owners(200) },
  // The invitation is addressed to the fixture's stranger: only that account may accept it.
  { file: "invitations/[token]/accept/route.ts", method: "POST", extras: true, path: (_f, x) => `/api/invitations/${x.invitationToken}/accept`, params: (_f, x) => ({ token: x.invitationToken }), expected: { anonymous: 401, stranger: 200, viewer: 403, editor: 403, owner: 403 } },
  { file: "projects/[projectId]/ownership/route.ts", method: "POST", path: (f) => `/api/projects/${f.projectId}/ownership`, params: P, body: (f) => ({ userId: f.extraMember.id }), expected: owners(200) },
  { file: "projects/[projectId]/audit/route.ts", method: "GET", path: (f) => `/api/projects/${f.projectId}/audit`, params: P, expected: owners(200) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/share-links/route.ts", method: "GET", extras: true, path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/share-links`, params: S, expected: holderToo(writers(200)) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/share-links/route.ts", method: "POST", extras: true, path: (f) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/share-links`, params: S, body: () => ({ label: "for the referee", expiresInDays: 7 }), expected: holderToo(writers(201)) },
  { file: "projects/[projectId]/scenarios/[scenarioId]/share-links/[linkId]/route.ts", method: "DELETE", extras: true, path: (f, x) => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/share-links/${x.linkId}`, params: (f, x) => ({ ...S(f), linkId: x.linkId }), expected: holderToo(writers(204)) },
  { file: "share/[token]/route.ts", method: "GET", extras: true, path: (_f, x, caller) => `/api/share/${caller === "linkHolder" ? x.linkToken : x.revokedLinkToken}`, params: (_f, x, caller) => ({ token: caller === "linkHolder" ? x.linkToken : x.revokedLinkToken }), expected: { ...everyone(404), linkHolder: 200 } },
];

/** Routes tested elsewhere, with the reason. */
const exempt: Record<string, string> = {
  "auth/[...nextauth]/route.ts": "next-auth's own handler needs a live request scope; covered by the e2e sign-in tests",
};

const apiRoot = path.resolve(__dirname, "../../app/api");

function routeFiles(dir = apiRoot): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return routeFiles(full);
    return name === "route.ts" ? [path.relative(apiRoot, full)] : [];
  });
}

const roles: Role[] = ["anonymous", "stranger", "viewer", "editor", "owner"];
const noExtras: TeamExtras = { invitationId: "", invitationToken: "", linkId: "", linkToken: "", revokedLinkToken: "" };

describe("authorization table", () => {
  for (const c of cases) {
    const callers: Caller[] = c.expected.linkHolder === undefined ? roles : [...roles, "linkHolder"];
    for (const caller of callers) {
      const expected = caller === "linkHolder" ? c.expected.linkHolder! : c.expected[caller];
      it(`${c.method} ${c.file} as ${caller} answers ${expected}`, async () => {
        const mod = await import(/* @vite-ignore */ `../../app/api/${c.file}`);
        const f = await projectFixture();
        const x = c.extras || caller === "linkHolder" ? await teamExtras(f) : noExtras;
        const holding = caller === "linkHolder" ? { headers: { "x-share-token": x.linkToken }, query: { ...c.query?.(f), share: x.linkToken } } : { query: c.query?.(f) };
        const res = await call(mod[c.method], c.method, c.path(f, x, caller), {
          as: caller === "linkHolder" ? null : userFor(f, caller),
          params: c.params?.(f, x, caller),
          body: c.body?.(f),
          ...holding,
        });
        expect(res.status, JSON.stringify(res.body)).toBe(expected);
        if (res.status >= 400) expect(res.body.error).toMatchObject({ code: expect.any(String), message: expect.any(String) });
      });
    }
  }

  it("lets a site administrator list users and change site roles", async () => {
    const admin = await makeUser("admin", { siteRole: "admin" });
    const member = await makeUser("member");
    const list = await call((await import("../../app/api/admin/users/route")).GET, "GET", "/api/admin/users", { as: admin });
    expect(list.status).toBe(200);
    expect(list.body.users.map((u: { id: string }) => u.id)).toContain(member.id);
    const patch = await call((await import("../../app/api/admin/users/[userId]/route")).PATCH, "PATCH", `/api/admin/users/${member.id}`, {
      as: admin,
      params: { userId: member.id },
      body: { siteRole: "admin" },
    });
    expect(patch.status).toBe(200);
    expect(patch.body.user.siteRole).toBe("admin");
  });

  it("covers every route handler that exists", () => {
    const covered = new Set([...cases.map((c) => c.file), ...Object.keys(exempt)]);
    const missing = routeFiles().filter((file) => !covered.has(file));
    expect(missing).toEqual([]);
  });

  it("covers every method each route exports", async () => {
    const uncovered: string[] = [];
    for (const file of routeFiles().filter((f) => !(f in exempt))) {
      const mod = await import(/* @vite-ignore */ `../../app/api/${file}`);
      for (const method of ["GET", "POST", "PUT", "PATCH", "DELETE"]) {
        if (typeof mod[method] === "function" && !cases.some((c) => c.file === file && c.method === method)) uncovered.push(`${method} ${file}`);
      }
    }
    expect(uncovered).toEqual([]);
  });
});

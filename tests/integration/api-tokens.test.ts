/**
 * Personal API tokens end to end on the real database: made on the account routes with a browser session (shown
 * once, stored as its SHA-256), then used as `Authorization: Bearer …` on the ordinary API routes under the same
 * access policy as a session, narrowed by scope and project; revoked or expired → 401; unknown tokens from one
 * address back off like sign-in (429 with Retry-After).
 */
import { createHash } from "node:crypto";
import { describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { ADDRESS_POLICY } from "@/db/sign-in-limits";
import { withSocketAddress } from "@/lib/client-address";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import * as tokensRoute from "@/app/api/account/tokens/route";
import * as tokenRoute from "@/app/api/account/tokens/[tokenId]/route";
import * as accountRoute from "@/app/api/account/route";
import * as computeRoute from "@/app/api/compute/route";
import * as projectsRoute from "@/app/api/projects/route";
import * as scenariosRoute from "@/app/api/projects/[projectId]/scenarios/route";
import * as scenarioRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import { call, type TestUser } from "./harness";
import { projectFixture } from "./fixtures";

async function makeToken(as: TestUser, body: Record<string, unknown>) {
  const res = await call(tokensRoute.POST, "POST", "/api/account/tokens", { as, body: { expiresInDays: 30, ...body } });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { token: string; apiToken: { id: string; scope: string; project: { id: string } | null; status: string } };
}

const bearer = (token: string) => ({ headers: { authorization: `Bearer ${token}` } });

describe("personal API tokens", () => {
  it("shows a new token once and keeps only its SHA-256", async () => {
    const f = await projectFixture();
    const made = await makeToken(f.users.owner, { name: "analysis notebook", scope: "read" });
    expect(made.token).toMatch(/^bltok_[A-Za-z0-9_-]{43}$/);
    const row = await getDb().selectFrom("apiTokens").selectAll().where("id", "=", made.apiToken.id).executeTakeFirstOrThrow();
    expect(row.tokenHash).toBe(createHash("sha256").update(made.token).digest("hex"));
    expect(JSON.stringify(row)).not.toContain(made.token);
    const list = await call(tokensRoute.GET, "GET", "/api/account/tokens", { as: f.users.owner });
    expect(list.status).toBe(200);
    expect(list.body.tokens).toHaveLength(1);
    expect(list.body.tokens[0]).toMatchObject({ name: "analysis notebook", scope: "read", status: "active", lastUsedAt: null });
    expect(JSON.stringify(list.body)).not.toContain(made.token);
  });

  it("acts as its account: a read-write token reads and saves a scenario, and records its last use", async () => {
    const f = await projectFixture();
    const { token, apiToken } = await makeToken(f.users.editor, { name: "sync script", scope: "read-write" });
    const params = { projectId: f.projectId, scenarioId: f.scenarioId };
    const got = await call(scenarioRoute.GET, "GET", `/api/projects/${f.projectId}/scenarios/${f.scenarioId}`, { params, ...bearer(token) });
    expect(got.status).toBe(200);
    const put = await call(scenarioRoute.PUT, "PUT", `/api/projects/${f.projectId}/scenarios/${f.scenarioId}`, { params, body: { version: got.body.scenario.version, title: "Saved by a script" }, ...bearer(token) });
    expect(put.status, JSON.stringify(put.body)).toBe(200);
    const row = await getDb().selectFrom("apiTokens").select("lastUsedAt").where("id", "=", apiToken.id).executeTakeFirstOrThrow();
    expect(row.lastUsedAt).not.toBeNull();
    // The viewer's read-write token is still only a viewer's.
    const viewers = await makeToken(f.users.viewer, { name: "viewer script", scope: "read-write" });
    const denied = await call(scenarioRoute.PUT, "PUT", `/api/projects/${f.projectId}/scenarios/${f.scenarioId}`, { params, body: { version: put.body.scenario.version, title: "x" }, ...bearer(viewers.token) });
    expect(denied.status).toBe(403);
  });

  it("refuses writes with a read-only token but lets it read", async () => {
    const f = await projectFixture();
    const { token } = await makeToken(f.users.owner, { name: "read only", scope: "read" });
    const list = await call(scenariosRoute.GET, "GET", `/api/projects/${f.projectId}/scenarios`, { params: { projectId: f.projectId }, ...bearer(token) });
    expect(list.status).toBe(200);
    const create = await call(scenariosRoute.POST, "POST", `/api/projects/${f.projectId}/scenarios`, { params: { projectId: f.projectId }, body: { title: "x", document: defaultScenarioDocument() }, ...bearer(token) });
    expect(create.status).toBe(403);
    expect(create.body.error.message).toMatch(/read-only/);
    const project = await call(projectsRoute.POST, "POST", "/api/projects", { body: { name: "New" }, ...bearer(token) });
    expect(project.status).toBe(403);
    const projects = await call(projectsRoute.GET, "GET", "/api/projects", bearer(token));
    const mine = projects.body.projects.find((p: { id: string }) => p.id === f.projectId);
    expect(mine.can).toEqual(expect.arrayContaining(["project:read", "scenario:read"]));
    expect(mine.can).not.toContain("scenario:write");
  });

  it("makes a token restricted to project A a stranger to project B", async () => {
    const a = await projectFixture();
    const b = await projectFixture();
    // The same account owns both projects: b's owner joins a as owner too.
    const owner = a.users.owner;
    const { addMemberByEmail } = await import("@/db/members");
    await addMemberByEmail(getDb(), { userId: b.users.owner.id, siteRole: "member" }, b.projectId, owner.email, "owner");
    const { token, apiToken } = await makeToken(owner, { name: "project A only", scope: "read-write", projectId: a.projectId });
    expect(apiToken.project?.id).toBe(a.projectId);
    const inA = await call(scenariosRoute.GET, "GET", `/api/projects/${a.projectId}/scenarios`, { params: { projectId: a.projectId }, ...bearer(token) });
    expect(inA.status).toBe(200);
    const inB = await call(scenariosRoute.GET, "GET", `/api/projects/${b.projectId}/scenarios`, { params: { projectId: b.projectId }, ...bearer(token) });
    expect(inB.status).toBe(404);
    const listed = await call(projectsRoute.GET, "GET", "/api/projects", bearer(token));
    expect(listed.body.projects.map((p: { id: string }) => p.id)).toEqual([a.projectId]);
    const created = await call(projectsRoute.POST, "POST", "/api/projects", { body: { name: "Elsewhere" }, ...bearer(token) });
    expect(created.status).toBe(403);
    // The session itself still sees both.
    const session = await call(projectsRoute.GET, "GET", "/api/projects", { as: owner });
    expect(session.body.projects.map((p: { id: string }) => p.id)).toEqual(expect.arrayContaining([a.projectId, b.projectId]));
  });

  it("cannot be restricted to a project its account cannot see, nor promise writes its role does not allow", async () => {
    const f = await projectFixture();
    const stranger = await call(tokensRoute.POST, "POST", "/api/account/tokens", { as: f.users.stranger, body: { name: "x", scope: "read", projectId: f.projectId, expiresInDays: 1 } });
    expect(stranger.status).toBe(404);
    const viewer = await call(tokensRoute.POST, "POST", "/api/account/tokens", { as: f.users.viewer, body: { name: "x", scope: "read-write", projectId: f.projectId, expiresInDays: 1 } });
    expect(viewer.status).toBe(403);
  });

  it("answers 401 once revoked, and only its owner may revoke it", async () => {
    const f = await projectFixture();
    const { token, apiToken } = await makeToken(f.users.owner, { name: "to revoke", scope: "read" });
    expect((await call(accountRoute.GET, "GET", "/api/account", bearer(token))).status).toBe(200);
    const other = await call(tokenRoute.DELETE, "DELETE", `/api/account/tokens/${apiToken.id}`, { as: f.users.editor, params: { tokenId: apiToken.id } });
    expect(other.status).toBe(404);
    const revoked = await call(tokenRoute.DELETE, "DELETE", `/api/account/tokens/${apiToken.id}`, { as: f.users.owner, params: { tokenId: apiToken.id } });
    expect(revoked.status).toBe(204);
    const again = await call(tokenRoute.DELETE, "DELETE", `/api/account/tokens/${apiToken.id}`, { as: f.users.owner, params: { tokenId: apiToken.id } });
    expect(again.status).toBe(409);
    const after = await call(accountRoute.GET, "GET", "/api/account", bearer(token));
    expect(after.status).toBe(401);
    expect(after.body.error.message).toMatch(/revoked/);
    // A presented token that fails is not quietly anonymous, even where anonymous callers are welcome.
    const compute = await call(computeRoute.POST, "POST", "/api/compute", { body: defaultScenarioDocument(), ...bearer(token) });
    expect(compute.status).toBe(401);
    // Nor does a session cookie beside it rescue the request.
    const both = await call(accountRoute.GET, "GET", "/api/account", { as: f.users.owner, ...bearer(token) });
    expect(both.status).toBe(401);
  });

  it("answers 401 once expired", async () => {
    const f = await projectFixture();
    const { token, apiToken } = await makeToken(f.users.owner, { name: "short lived", scope: "read", expiresInDays: 1 });
    await getDb().updateTable("apiTokens").set({ expiresAt: new Date(Date.now() - 1000) }).where("id", "=", apiToken.id).execute();
    const res = await call(accountRoute.GET, "GET", "/api/account", bearer(token));
    expect(res.status).toBe(401);
    expect(res.body.error.message).toMatch(/expired/);
    const list = await call(tokensRoute.GET, "GET", "/api/account/tokens", { as: f.users.owner });
    expect(list.body.tokens[0].status).toBe("expired");
  });

  it("does not let a token manage the account, its tokens or invitations", async () => {
    const f = await projectFixture();
    const { token } = await makeToken(f.users.owner, { name: "full", scope: "read-write" });
    expect((await call(tokensRoute.GET, "GET", "/api/account/tokens", bearer(token))).status).toBe(403);
    expect((await call(tokensRoute.POST, "POST", "/api/account/tokens", { body: { name: "more", scope: "read-write", expiresInDays: 1 }, ...bearer(token) })).status).toBe(403);
    expect((await call(accountRoute.PATCH, "PATCH", "/api/account", { body: { name: "Renamed by a script" }, ...bearer(token) })).status).toBe(403);
  });

  it("refuses a malformed request with the field and the reason", async () => {
    const f = await projectFixture();
    const res = await call(tokensRoute.POST, "POST", "/api/account/tokens", { as: f.users.owner, body: { name: "", scope: "admin", expiresInDays: 1000 } });
    expect(res.status).toBe(400);
    const paths = res.body.error.fields.map((x: { path: string }) => x.path);
    expect(paths).toEqual(expect.arrayContaining(["name", "scope", "expiresInDays"]));
    const empty = await call(accountRoute.GET, "GET", "/api/account", { headers: { authorization: "Bearer " } });
    expect(empty.status).toBe(401);
  });

  it("backs off unknown tokens from one address like sign-in, and not other addresses", async () => {
    const address = `198.51.100.${Math.floor(Math.random() * 200) + 20}`;
    const guess = () => withSocketAddress(address, () => call(accountRoute.GET, "GET", "/api/account", bearer(`bltok_${Math.random().toString(36).slice(2)}`)));
    // The last free failure closes the key for the base delay (the sign-in curve: 30 s, then doubling).
    for (let i = 0; i < ADDRESS_POLICY.freeFailures; i++) expect((await guess()).status).toBe(401);
    const limited = await guess();
    expect(limited.status).toBe(429);
    expect(Number(limited.headers.get("retry-after"))).toBeGreaterThan(0);
    expect(Number(limited.headers.get("retry-after"))).toBeLessThanOrEqual(ADDRESS_POLICY.baseDelaySeconds);
    // Even a good token waits from that address (the check comes before the lookup) …
    const f = await projectFixture();
    const { token } = await makeToken(f.users.owner, { name: "good", scope: "read" });
    expect((await withSocketAddress(address, () => call(accountRoute.GET, "GET", "/api/account", bearer(token)))).status).toBe(429);
    // … and works from anywhere else.
    expect((await withSocketAddress("203.0.113.9", () => call(accountRoute.GET, "GET", "/api/account", bearer(token)))).status).toBe(200);
  });
});

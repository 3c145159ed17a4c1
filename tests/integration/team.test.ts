/**
 * Team work through the real route handlers and PostgreSQL: invitations by e-mail (through the fake SMTP
 * server), ownership transfer and the membership history, read-only share links, and restoring revisions.
 */
import { sql } from "kysely";
import { beforeAll, describe, expect, it } from "vitest";
import * as acceptRoute from "@/app/api/invitations/[token]/accept/route";
import * as auditRoute from "@/app/api/projects/[projectId]/audit/route";
import * as invitationsRoute from "@/app/api/projects/[projectId]/invitations/route";
import * as invitationRoute from "@/app/api/projects/[projectId]/invitations/[invitationId]/route";
import * as resendRoute from "@/app/api/projects/[projectId]/invitations/[invitationId]/resend/route";
import * as memberRoute from "@/app/api/projects/[projectId]/members/[userId]/route";
import * as membersRoute from "@/app/api/projects/[projectId]/members/route";
import * as ownershipRoute from "@/app/api/projects/[projectId]/ownership/route";
import * as projectRoute from "@/app/api/projects/[projectId]/route";
import * as scenarioRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import * as diffRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/revisions/[version]/diff/route";
import * as restoreRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/revisions/[version]/restore/route";
import * as revisionRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/revisions/[version]/route";
import * as revisionsRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/revisions/route";
import * as shareLinkRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/share-links/[linkId]/route";
import * as shareLinksRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/share-links/route";
import * as shareRoute from "@/app/api/share/[token]/route";
import { NextRequest } from "next/server";
import { getDb } from "@/db";
import { previewInvitation } from "@/db/invitations";
import { hashToken } from "@/db/tokens";
import { createUser } from "@/db/users";
import { proxy } from "@/proxy";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { projectFixture, type ProjectFixture } from "./fixtures";
import { call, makeUser, sessionCookie, type TestUser } from "./harness";
import { mailboxMessagesTo } from "./mailbox";

const missingId = "00000000-0000-4000-8000-000000000000";
let unique = 0;
const newAddress = (label: string) => `${label}-${++unique}-${Date.now()}@example.test`;

/** The token in the newest invitation e-mail to this address. */
async function invitationTokenFor(address: string): Promise<string> {
  const [mail] = await mailboxMessagesTo(address);
  expect(mail, `no e-mail to ${address}`).toBeDefined();
  const match = mail.text.match(/\/invitations\/([A-Za-z0-9_-]+)/);
  expect(match, mail.text).not.toBeNull();
  return match![1];
}

/** An account with exactly this address, signed in. */
async function accountWith(email: string, name = "Invited Person"): Promise<TestUser> {
  const user = await createUser(getDb(), { email, name });
  return { id: user.id, email: user.email, name: user.name, cookie: await sessionCookie(user.id) };
}

async function invite(f: ProjectFixture, email: string, role: "editor" | "viewer" = "viewer") {
  return call(invitationsRoute.POST, "POST", "/x", { as: f.users.owner, params: { projectId: f.projectId }, body: { email, role } });
}

async function auditActions(f: ProjectFixture): Promise<string[]> {
  const res = await call(auditRoute.GET, "GET", "/x", { as: f.users.owner, params: { projectId: f.projectId } });
  expect(res.status).toBe(200);
  return res.body.entries.map((e: { action: string }) => e.action).reverse();
}

describe("invitations by e-mail", () => {
  let f: ProjectFixture;
  beforeAll(async () => {
    f = await projectFixture();
  });

  it("mails a one-time link that joins the project with the invited role, storing only the token's hash", async () => {
    const email = newAddress("invitee");
    const created = await invite(f, email, "viewer");
    expect(created.status).toBe(201);
    expect(created.body.invitation).toMatchObject({ email, role: "viewer", status: "pending", invitedBy: { id: f.users.owner.id } });
    const days = (Date.parse(created.body.invitation.expiresAt) - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);

    const [mail] = await mailboxMessagesTo(email);
    expect(mail.subject).toMatch(/invited you to “Fixture project”/);
    expect(mail.text).toContain(`${process.env.NEXTAUTH_URL}/invitations/`);
    const token = await invitationTokenFor(email);
    expect(Buffer.from(token, "base64url").length).toBeGreaterThanOrEqual(16);
    const stored = await getDb().selectFrom("projectInvitations").selectAll().where("id", "=", created.body.invitation.id).executeTakeFirstOrThrow();
    expect(stored.tokenHash).toBe(hashToken(token));
    expect(JSON.stringify(stored)).not.toContain(token);

    // The address matches whatever its letter case.
    const invitee = await accountWith(email.toUpperCase());
    const accepted = await call(acceptRoute.POST, "POST", "/x", { as: invitee, params: { token } });
    expect(accepted.status).toBe(200);
    expect(accepted.body).toEqual({ projectId: f.projectId });
    const project = await call(projectRoute.GET, "GET", "/x", { as: invitee, params: { projectId: f.projectId } });
    expect(project.body.project.role).toBe("viewer");

    const again = await call(acceptRoute.POST, "POST", "/x", { as: invitee, params: { token } });
    expect(again.status).toBe(404);
    expect(again.body.error.message).toMatch(/not found, or it has expired, been used or been revoked/);
    expect(await previewInvitation(getDb(), token)).toBeNull();
    const open = await call(invitationsRoute.GET, "GET", "/x", { as: f.users.owner, params: { projectId: f.projectId } });
    expect(open.body.invitations.map((i: { email: string }) => i.email)).not.toContain(email);
  });

  it("refuses an account with another address with 403 and a clear message, and keeps the invitation open", async () => {
    const email = newAddress("addressee");
    expect((await invite(f, email)).status).toBe(201);
    const token = await invitationTokenFor(email);
    const wrong = await call(acceptRoute.POST, "POST", "/x", { as: f.users.stranger, params: { token } });
    expect(wrong.status).toBe(403);
    expect(wrong.body.error.message).toContain(`sent to ${email}, but you are signed in as ${f.users.stranger.email}`);
    expect(await previewInvitation(getDb(), token)).toMatchObject({ email, role: "viewer", projectName: "Fixture project" });
    const right = await call(acceptRoute.POST, "POST", "/x", { as: await accountWith(email), params: { token } });
    expect(right.status).toBe(200);
  });

  it("answers 404 for an expired invitation and lists it as expired", async () => {
    const email = newAddress("late");
    const created = await invite(f, email);
    const token = await invitationTokenFor(email);
    await getDb().updateTable("projectInvitations").set({ expiresAt: new Date(Date.now() - 60_000) }).where("id", "=", created.body.invitation.id).execute();
    const res = await call(acceptRoute.POST, "POST", "/x", { as: await accountWith(email), params: { token } });
    expect(res.status).toBe(404);
    const list = await call(invitationsRoute.GET, "GET", "/x", { as: f.users.owner, params: { projectId: f.projectId } });
    expect(list.body.invitations.find((i: { id: string }) => i.id === created.body.invitation.id)).toMatchObject({ status: "expired" });
  });

  it("resends with a new link and a new expiry, and the old link stops working", async () => {
    const email = newAddress("resent");
    const created = await invite(f, email, "editor");
    const oldToken = await invitationTokenFor(email);
    await getDb().updateTable("projectInvitations").set({ expiresAt: new Date(Date.now() - 60_000) }).where("id", "=", created.body.invitation.id).execute();
    const params = { projectId: f.projectId, invitationId: created.body.invitation.id };
    const resent = await call(resendRoute.POST, "POST", "/x", { as: f.users.owner, params });
    expect(resent.status).toBe(200);
    expect(resent.body.invitation.status).toBe("pending");
    const newToken = await invitationTokenFor(email);
    expect(newToken).not.toBe(oldToken);
    const invitee = await accountWith(email);
    expect((await call(acceptRoute.POST, "POST", "/x", { as: invitee, params: { token: oldToken } })).status).toBe(404);
    expect((await call(acceptRoute.POST, "POST", "/x", { as: invitee, params: { token: newToken } })).status).toBe(200);
    const project = await call(projectRoute.GET, "GET", "/x", { as: invitee, params: { projectId: f.projectId } });
    expect(project.body.project.role).toBe("editor");
    // An accepted invitation cannot be sent again.
    expect((await call(resendRoute.POST, "POST", "/x", { as: f.users.owner, params })).status).toBe(404);
  });

  it("revokes an invitation: its link answers 404, and revoking again is 404", async () => {
    const email = newAddress("revoked");
    const created = await invite(f, email);
    const token = await invitationTokenFor(email);
    const params = { projectId: f.projectId, invitationId: created.body.invitation.id };
    expect((await call(invitationRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params })).status).toBe(204);
    expect((await call(acceptRoute.POST, "POST", "/x", { as: await accountWith(email), params: { token } })).status).toBe(404);
    expect((await call(invitationRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params })).status).toBe(404);
    expect((await call(invitationRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params: { ...params, invitationId: "nope" } })).status).toBe(404);
  });

  it("answers 404 for a token that was never issued, however it looks", async () => {
    for (const token of ["x", "A".repeat(43), "%00", "a".repeat(5000)]) {
      const res = await call(acceptRoute.POST, "POST", "/x", { as: f.users.stranger, params: { token } });
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe("not_found");
    }
  });

  it("validates the invitation: address, role, members and open invitations", async () => {
    const params = { projectId: f.projectId };
    const badEmail = await call(invitationsRoute.POST, "POST", "/x", { as: f.users.owner, params, body: { email: "not-an-address", role: "viewer" } });
    expect(badEmail.status).toBe(400);
    expect(badEmail.body.error.fields).toEqual([{ path: "email", message: "enter a valid e-mail address" }]);
    const owner = await call(invitationsRoute.POST, "POST", "/x", { as: f.users.owner, params, body: { email: newAddress("o"), role: "owner" } });
    expect(owner.status).toBe(400);
    expect(owner.body.error.fields[0].path).toBe("role");
    const extra = await call(invitationsRoute.POST, "POST", "/x", { as: f.users.owner, params, body: { email: newAddress("o"), role: "viewer", note: "hi" } });
    expect(extra.status).toBe(400);
    const member = await invite(f, f.users.viewer.email.toUpperCase());
    expect(member.status).toBe(409);
    expect(member.body.error.fields).toEqual([{ path: "email", message: "already a member" }]);
    const email = newAddress("twice");
    expect((await invite(f, email)).status).toBe(201);
    const twice = await invite(f, email);
    expect(twice.status).toBe(409);
    expect(twice.body.error.fields).toEqual([{ path: "email", message: "already invited" }]);
  });

  it("answers 409 when a member accepts an invitation to a project they are already in", async () => {
    const g = await projectFixture();
    const email = newAddress("already");
    expect((await invite(g, email)).status).toBe(201);
    const token = await invitationTokenFor(email);
    const person = await accountWith(email);
    await call(membersRoute.POST, "POST", "/x", { as: g.users.owner, params: { projectId: g.projectId }, body: { email, role: "editor" } });
    const res = await call(acceptRoute.POST, "POST", "/x", { as: person, params: { token } });
    expect(res.status).toBe(409);
  });
});

describe("membership changes and their history", () => {
  it("records who invited, accepted, changed, removed, left and transferred, in order", async () => {
    const f = await projectFixture();
    const email = newAddress("history");
    const created = await invite(f, email);
    const invitee = await accountWith(email);
    await call(acceptRoute.POST, "POST", "/x", { as: invitee, params: { token: await invitationTokenFor(email) } });
    const second = newAddress("dropped");
    const dropped = await invite(f, second);
    await call(resendRoute.POST, "POST", "/x", { as: f.users.owner, params: { projectId: f.projectId, invitationId: dropped.body.invitation.id } });
    await call(invitationRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params: { projectId: f.projectId, invitationId: dropped.body.invitation.id } });
    const P = (userId: string) => ({ projectId: f.projectId, userId });
    await call(memberRoute.PATCH, "PATCH", "/x", { as: f.users.owner, params: P(invitee.id), body: { role: "editor" } });
    await call(memberRoute.PATCH, "PATCH", "/x", { as: f.users.owner, params: P(invitee.id), body: { role: "editor" } });
    await call(memberRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params: P(f.extraMember.id) });
    await call(memberRoute.DELETE, "DELETE", "/x", { as: f.users.viewer, params: P(f.users.viewer.id) });
    await call(ownershipRoute.POST, "POST", "/x", { as: f.users.owner, params: { projectId: f.projectId }, body: { userId: f.users.editor.id } });

    expect(await auditActions({ ...f, users: { ...f.users, owner: f.users.editor } })).toEqual([
      "member_added", // the fixture's own members
      "member_added",
      "member_added",
      "invited",
      "invitation_accepted",
      "invited",
      "invitation_resent",
      "invitation_revoked",
      "role_changed", // once: the second change to the same role changed nothing
      "member_removed",
      "member_left",
      "ownership_transferred",
    ]);
    const entries = (await call(auditRoute.GET, "GET", "/x", { as: f.users.editor, params: { projectId: f.projectId } })).body.entries;
    expect(entries.find((e: { action: string }) => e.action === "invitation_accepted")).toMatchObject({
      actor: { id: invitee.id },
      target: { userId: invitee.id, email: email.toLowerCase() },
      role: "viewer",
    });
    expect(entries.find((e: { action: string }) => e.action === "role_changed")).toMatchObject({ role: "editor", previousRole: "viewer", actor: { id: f.users.owner.id } });
    expect(entries.find((e: { action: string }) => e.action === "invited")).toMatchObject({ target: { userId: null, email: second } });
    expect(entries.find((e: { action: string }) => e.action === "member_left")).toMatchObject({ target: { userId: f.users.viewer.id }, previousRole: "viewer" });
    expect(created.status).toBe(201);
  });

  it("transfers ownership: the member becomes owner and the former owner an editor", async () => {
    const f = await projectFixture();
    const params = { projectId: f.projectId };
    const res = await call(ownershipRoute.POST, "POST", "/x", { as: f.users.owner, params, body: { userId: f.users.viewer.id } });
    expect(res.status).toBe(200);
    const roles = Object.fromEntries(res.body.members.map((m: { userId: string; role: string }) => [m.userId, m.role]));
    expect(roles[f.users.viewer.id]).toBe("owner");
    expect(roles[f.users.owner.id]).toBe("editor");
    const entry = (await call(auditRoute.GET, "GET", "/x", { as: f.users.viewer, params })).body.entries[0];
    expect(entry).toMatchObject({ action: "ownership_transferred", actor: { id: f.users.owner.id }, target: { userId: f.users.viewer.id }, role: "owner", previousRole: "viewer" });
    // The former owner is an editor now, and may no longer do it.
    expect((await call(ownershipRoute.POST, "POST", "/x", { as: f.users.owner, params, body: { userId: f.users.editor.id } })).status).toBe(403);
  });

  it("refuses a transfer to oneself (422), to a non-member (404) and a malformed body (400)", async () => {
    const f = await projectFixture();
    const params = { projectId: f.projectId };
    const self = await call(ownershipRoute.POST, "POST", "/x", { as: f.users.owner, params, body: { userId: f.users.owner.id } });
    expect(self.status).toBe(422);
    expect(self.body.error.fields).toEqual([{ path: "userId", message: "that is you" }]);
    for (const userId of [f.outsider.id, missingId, "not-a-uuid"]) {
      expect((await call(ownershipRoute.POST, "POST", "/x", { as: f.users.owner, params, body: { userId } })).status).toBe(404);
    }
    const bad = await call(ownershipRoute.POST, "POST", "/x", { as: f.users.owner, params, body: { user: f.users.viewer.id } });
    expect(bad.status).toBe(400);
    const notJson = await call(ownershipRoute.POST, "POST", "/x", { as: f.users.owner, params, rawBody: "{", headers: { "content-type": "application/json" } });
    expect(notJson.status).toBe(400);
  });
});

describe("read-only share links", () => {
  let f: ProjectFixture;
  const S = () => ({ projectId: f.projectId, scenarioId: f.scenarioId });
  beforeAll(async () => {
    f = await projectFixture();
  });

  async function createLink(body: unknown = { label: "for the referee" }) {
    const res = await call(shareLinksRoute.POST, "POST", "/x", { as: f.users.editor, params: S(), body });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const token = new URL(res.body.url).pathname.split("/").pop()!;
    return { link: res.body.link, url: res.body.url as string, token };
  }

  const open = (token: string) => call(shareRoute.GET, "GET", `/api/share/${token}`, { params: { token } });

  it("shows the scenario and its computed Budget to a signed-out holder, counting each view", async () => {
    const { link, url, token } = await createLink();
    expect(url).toBe(`${process.env.NEXTAUTH_URL}/share/${token}`);
    expect(Buffer.from(token, "base64url").length).toBeGreaterThanOrEqual(16);
    expect(link).toMatchObject({ label: "for the referee", status: "active", viewCount: 0, expiresAt: null, createdBy: { id: f.users.editor.id } });
    const stored = await getDb().selectFrom("shareLinks").select("tokenHash").where("id", "=", link.id).executeTakeFirstOrThrow();
    expect(stored.tokenHash).toBe(hashToken(token));

    const first = await open(token);
    expect(first.status).toBe(200);
    expect(Object.keys(first.body.scenario).sort()).toEqual(["backgroundKind", "document", "documentIssues", "linkExpiresAt", "title", "updatedAt", "version"]);
    expect(first.body.scenario).toMatchObject({ title: "Fixture scenario", backgroundKind: "minkowski", document: defaultScenarioDocument() });
    expect(first.body.result.combined.totalQuanta).toMatchObject({ unit: "1" });
    expect(first.body.result.flags.length).toBeGreaterThan(0);
    expect(first.body.resultIssues).toBeNull();
    expect(JSON.stringify(first.body)).not.toContain(f.projectId);

    await open(token);
    const list = await call(shareLinksRoute.GET, "GET", "/x", { as: f.users.owner, params: S() });
    const listed = list.body.links.find((l: { id: string }) => l.id === link.id);
    expect(listed.viewCount).toBe(2);
    expect(listed.lastViewedAt).not.toBeNull();
  });

  it("answers 404 once revoked, and 409 when revoking again", async () => {
    const { link, token } = await createLink({ label: "short-lived" });
    const params = { ...S(), linkId: link.id };
    expect((await call(shareLinkRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params })).status).toBe(204);
    const gone = await open(token);
    expect(gone.status).toBe(404);
    expect(gone.body.error.message).toMatch(/expired or been revoked/);
    expect((await call(shareLinkRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params })).status).toBe(409);
    const list = await call(shareLinksRoute.GET, "GET", "/x", { as: f.users.owner, params: S() });
    expect(list.body.links.find((l: { id: string }) => l.id === link.id)).toMatchObject({ status: "revoked" });
    const views = await getDb().selectFrom("shareLinks").select("viewCount").where("id", "=", link.id).executeTakeFirstOrThrow();
    expect(views.viewCount).toBe(0);
  });

  it("records who made and who revoked each link in the project's history, with its label and scenario", async () => {
    const { link } = await createLink({ label: "for the seminar" });
    await call(shareLinkRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params: { ...S(), linkId: link.id } });
    const entries = (await call(auditRoute.GET, "GET", "/x", { as: f.users.owner, params: { projectId: f.projectId } })).body.entries;
    const about = entries.filter((e: { subject: string | null }) => e.subject === "for the seminar");
    expect(about).toEqual([
      expect.objectContaining({ action: "share_link_revoked", actor: expect.objectContaining({ id: f.users.owner.id }), target: null, scenario: { id: f.scenarioId, title: "Fixture scenario" } }),
      expect.objectContaining({ action: "share_link_created", actor: expect.objectContaining({ id: f.users.editor.id }), target: null, scenario: { id: f.scenarioId, title: "Fixture scenario" } }),
    ]);
  });

  it("answers 404 after its expiry", async () => {
    const { link, token } = await createLink({ label: "for a week", expiresInDays: 7 });
    const days = (Date.parse(link.expiresAt) - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect((await open(token)).body.scenario.linkExpiresAt).toBe(link.expiresAt);
    await getDb().updateTable("shareLinks").set({ expiresAt: new Date(Date.now() - 1000) }).where("id", "=", link.id).execute();
    expect((await open(token)).status).toBe(404);
    const list = await call(shareLinksRoute.GET, "GET", "/x", { as: f.users.owner, params: S() });
    expect(list.body.links.find((l: { id: string }) => l.id === link.id)).toMatchObject({ status: "expired" });
  });

  it("answers 404 for tokens never issued and for an unknown scenario or link", async () => {
    for (const token of ["", "x", "A".repeat(43)]) expect((await open(token)).status).toBe(404);
    const unknownScenario = await call(shareLinksRoute.POST, "POST", "/x", { as: f.users.owner, params: { ...S(), scenarioId: missingId }, body: { label: "x" } });
    expect(unknownScenario.status).toBe(404);
    for (const linkId of [missingId, "not-a-uuid"]) {
      expect((await call(shareLinkRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params: { ...S(), linkId } })).status).toBe(404);
    }
  });

  it("validates the label and the expiry", async () => {
    const post = (body: unknown) => call(shareLinksRoute.POST, "POST", "/x", { as: f.users.owner, params: S(), body });
    const cases: [unknown, string][] = [
      [{ label: "  " }, "label"],
      [{ label: "x".repeat(201) }, "label"],
      [{ label: "ok", expiresInDays: 0 }, "expiresInDays"],
      [{ label: "ok", expiresInDays: 366 }, "expiresInDays"],
      [{ label: "ok", expiresInDays: 1.5 }, "expiresInDays"],
      [{ label: "ok", expiresInDays: "7" }, "expiresInDays"],
      [{ label: "ok", scenarioId: missingId }, ""],
    ];
    for (const [body, path] of cases) {
      const res = await post(body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.fields.map((x: { path: string }) => x.path)).toContain(path);
    }
    expect((await post({ label: "until revoked", expiresInDays: null })).body.link.expiresAt).toBeNull();
  });

  it("lets its holder read and nothing more: the scenario API still wants a member", async () => {
    const { token } = await createLink();
    const headers = { "x-share-token": token, authorization: `Bearer ${token}` };
    const put = await call(scenarioRoute.PUT, "PUT", "/x", { params: S(), headers, query: { share: token }, body: { version: 1, title: "Changed by a link holder" } });
    expect(put.status).toBe(401);
    const still = await call(scenarioRoute.GET, "GET", "/x", { as: f.users.viewer, params: S() });
    expect(still.body.scenario.title).toBe("Fixture scenario");
  });
});

describe("history: what changed, and restore", () => {
  let f: ProjectFixture;
  const S = () => ({ projectId: f.projectId, scenarioId: f.scenarioId });
  beforeAll(async () => {
    f = await projectFixture();
    const second = { ...defaultScenarioDocument(), protocol: { ...defaultScenarioDocument().protocol, hold: { durationSeconds: 0.5 } } };
    const third = { ...second, background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e18 }, lab: { placement: "uniformly-accelerated" } };
    const v2 = await call(scenarioRoute.PUT, "PUT", "/x", { as: f.users.editor, params: S(), body: { version: 1, title: "Longer hold", document: second } });
    expect(v2.status).toBe(200);
    const v3 = await call(scenarioRoute.PUT, "PUT", "/x", { as: f.users.editor, params: S(), body: { version: 2, document: third } });
    expect(v3.status).toBe(200);
  });

  const diff = (version: string, query: Record<string, string>, as: TestUser = f.users.viewer) =>
    call(diffRoute.GET, "GET", "/x", { as, params: { ...S(), version }, query });

  it("lists the changed document paths with their old and new values", async () => {
    const res = await diff("3", { against: "1" });
    expect(res.status).toBe(200);
    expect(res.body.diff).toMatchObject({ from: { version: 1 }, to: { version: 3 }, title: { before: "Fixture scenario", after: "Longer hold" }, truncated: false });
    expect(res.body.diff.changes).toEqual([
      { path: "background.accelerationMetresPerSecondSquared", kind: "added", after: 1e18 },
      { path: "background.kind", kind: "changed", before: "minkowski", after: "rindler" },
      { path: "lab.placement", kind: "changed", before: "inertial", after: "uniformly-accelerated" },
      { path: "protocol.hold.durationSeconds", kind: "changed", before: 0.1, after: 0.5 },
    ]);
    const same = await diff("2", { against: "2" });
    expect(same.body.diff).toMatchObject({ changes: [], title: null });
  });

  it("answers 400 for a missing or malformed ?against and 404 for revisions that do not exist", async () => {
    const malformed: Record<string, string>[] = [{}, { against: "two" }, { against: "0" }, { against: "1.5" }, { against: "99999999999" }];
    for (const query of malformed) {
      const res = await diff("2", query);
      expect(res.status, JSON.stringify(query)).toBe(400);
      expect(res.body.error.fields[0].path).toBe("against");
    }
    expect((await diff("2", { against: "99" })).status).toBe(404);
    for (const version of ["99", "abc", "0", "99999999999"]) expect((await diff(version, { against: "1" })).status).toBe(404);
  });

  it("restores an old revision as version n+1 with its title and document, deleting nothing", async () => {
    const res = await call(restoreRoute.POST, "POST", "/x", { as: f.users.editor, params: { ...S(), version: "1" } });
    expect(res.status).toBe(201);
    expect(res.body.scenario).toMatchObject({ version: 4, title: "Fixture scenario", document: defaultScenarioDocument(), updatedBy: { id: f.users.editor.id } });
    const list = await call(revisionsRoute.GET, "GET", "/x", { as: f.users.viewer, params: S() });
    expect(list.body.revisions.map((r: { version: number }) => r.version)).toEqual([4, 3, 2, 1]);
    const four = await call(revisionRoute.GET, "GET", "/x", { as: f.users.viewer, params: { ...S(), version: "4" } });
    const one = await call(revisionRoute.GET, "GET", "/x", { as: f.users.viewer, params: { ...S(), version: "1" } });
    expect(four.body.revision.document).toEqual(one.body.revision.document);
    expect((await diff("4", { against: "1" })).body.diff.changes).toEqual([]);
    // A save that still holds version 3 is now stale.
    const stale = await call(scenarioRoute.PUT, "PUT", "/x", { as: f.users.owner, params: S(), body: { version: 3, title: "Late" } });
    expect(stale.status).toBe(409);
  });

  it("refuses viewers (403), unknown revisions (404) and a revision this Branchline cannot read (422)", async () => {
    expect((await call(restoreRoute.POST, "POST", "/x", { as: f.users.viewer, params: { ...S(), version: "1" } })).status).toBe(403);
    expect((await call(restoreRoute.POST, "POST", "/x", { as: f.users.owner, params: { ...S(), version: "99" } })).status).toBe(404);
    const latest = (await call(revisionsRoute.GET, "GET", "/x", { as: f.users.viewer, params: S() })).body.revisions[0].version;
    await sql`insert into scenario_revisions (scenario_id, version, title, document, schema_version)
      values (${f.scenarioId}, 1000, 'From the future', ${JSON.stringify({ schemaVersion: 999 })}::jsonb, 999)`.execute(getDb());
    const future = await call(restoreRoute.POST, "POST", "/x", { as: f.users.owner, params: { ...S(), version: "1000" } });
    expect(future.status).toBe(422);
    expect(future.body.error.fields[0]).toMatchObject({ path: "document.schemaVersion" });
    const after = (await call(scenarioRoute.GET, "GET", "/x", { as: f.users.viewer, params: S() })).body.scenario.version;
    expect(after).toBe(latest);
  });
});

describe("the proxy in front of the share and invitation pages", () => {
  const status = async (path: string) => (await proxy(new NextRequest(new URL(path, "http://localhost:3999")))).status;

  it("lets a live token through and answers 404 for a dead one before the page streams", async () => {
    const f = await projectFixture();
    const created = await call(shareLinksRoute.POST, "POST", "/x", { as: f.users.owner, params: { projectId: f.projectId, scenarioId: f.scenarioId }, body: { label: "x" } });
    const token = new URL(created.body.url).pathname.split("/").pop()!;
    expect(await status(`/share/${token}`)).toBe(200);
    await call(shareLinkRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params: { projectId: f.projectId, scenarioId: f.scenarioId, linkId: created.body.link.id } });
    expect(await status(`/share/${token}`)).toBe(404);
    const views = await getDb().selectFrom("shareLinks").select("viewCount").where("id", "=", created.body.link.id).executeTakeFirstOrThrow();
    expect(views.viewCount).toBe(0);

    const email = newAddress("proxied");
    await invite(f, email);
    const invitation = await invitationTokenFor(email);
    expect(await status(`/invitations/${invitation}`)).toBe(200);
    await call(acceptRoute.POST, "POST", "/x", { as: await accountWith(email), params: { token: invitation } });
    expect(await status(`/invitations/${invitation}`)).toBe(404);
    expect(await status("/invitations/never-issued")).toBe(404);
  });
});

describe("a stranger", () => {
  it("is not found for every team route, so the project's existence does not leak", async () => {
    const f = await projectFixture();
    const outsider = await makeUser("nosy");
    const params = { projectId: f.projectId };
    expect((await call(invitationsRoute.GET, "GET", "/x", { as: outsider, params })).status).toBe(404);
    expect((await call(auditRoute.GET, "GET", "/x", { as: outsider, params })).status).toBe(404);
    expect((await call(shareLinksRoute.GET, "GET", "/x", { as: outsider, params: { ...params, scenarioId: f.scenarioId } })).status).toBe(404);
  });
});

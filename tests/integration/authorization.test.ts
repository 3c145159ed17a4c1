/**
 * The authorization table: every route handler under app/api × every kind of caller, with the exact status.
 * A project the caller cannot see answers 404 (its existence must not leak); a member whose role lacks the
 * permission gets 403; a signed-out caller 401. Each case runs on a fresh fixture, so destructive cases do
 * not disturb the others. The last test fails when a route exists that the table does not cover.
 *
 * Where a scenario is involved there is a sixth caller, the link holder: signed out, holding a live share link
 * of the fixture's scenario. On the share route the token is the path (the other callers hold only a revoked
 * one); everywhere else it rides along as a header and a query parameter, and must grant nothing.
 *
 * Then every row again with the owner's personal API tokens as `Authorization: Bearer …` (no cookie): read-write,
 * read-only, restricted to another project, revoked, expired (authorization-cases/tokens.ts says what each gets).
 */
import { readdirSync, statSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { coreCases } from "./authorization-cases/core";
import { mapCases } from "./authorization-cases/maps";
import { outputCases } from "./authorization-cases/outputs";
import { type Caller, type Case, tokenCallers } from "./authorization-cases/shared";
import { tokenCases, tokenExpectation, tokenFor } from "./authorization-cases/tokens";
import { uploadCases } from "./authorization-cases/uploads";
import { call, makeUser } from "./harness";
import { projectFixture, type Role, type TeamExtras, teamExtras, userFor } from "./fixtures";

const cases: Case[] = [...coreCases, ...outputCases, ...uploadCases, ...tokenCases, ...mapCases];

/** Routes tested elsewhere, with the reason. */
const exempt: Record<string, string> = {
  "auth/[...nextauth]/route.ts": "next-auth's own handler needs a live request scope; its core is driven in sessions.test.ts, and the route by the e2e sign-in tests",
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

  for (const c of cases) {
    for (const caller of tokenCallers) {
      const expected = tokenExpectation(c, caller);
      it(`${c.method} ${c.file} with the owner's ${caller} answers ${expected}`, async () => {
        const mod = await import(/* @vite-ignore */ `../../app/api/${c.file}`);
        const f = await projectFixture();
        const x = c.extras ? await teamExtras(f) : noExtras;
        const token = await tokenFor(f, caller);
        const res = await call(mod[c.method], c.method, c.path(f, x, "owner"), {
          params: c.params?.(f, x, "owner"),
          body: c.body?.(f),
          query: c.query?.(f),
          headers: { authorization: `Bearer ${token}` },
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

/** The JSON API's behaviour on good and bad input, through the real route handlers and PostgreSQL. */
import { beforeAll, describe, expect, it } from "vitest";
import * as projectsRoute from "@/app/api/projects/route";
import * as projectRoute from "@/app/api/projects/[projectId]/route";
import * as membersRoute from "@/app/api/projects/[projectId]/members/route";
import * as memberRoute from "@/app/api/projects/[projectId]/members/[userId]/route";
import * as scenariosRoute from "@/app/api/projects/[projectId]/scenarios/route";
import * as scenarioRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import * as duplicateRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/duplicate/route";
import * as revisionsRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/revisions/route";
import * as revisionRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/revisions/[version]/route";
import * as usersRoute from "@/app/api/users/route";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { call, makeUser, type TestUser } from "./harness";
import { projectFixture, type ProjectFixture } from "./fixtures";

const missingId = "00000000-0000-4000-8000-000000000000";

describe("projects", () => {
  let owner: TestUser;
  beforeAll(async () => {
    owner = await makeUser("owner");
  });

  it("creates a project, lists it with the caller's role, and renames it", async () => {
    const created = await call(projectsRoute.POST, "POST", "/api/projects", { as: owner, body: { name: "Trapped-particle study" } });
    expect(created.status).toBe(201);
    expect(created.body.project).toMatchObject({ name: "Trapped-particle study", role: "owner", scenarioCount: 0 });
    const id = created.body.project.id;
    const list = await call(projectsRoute.GET, "GET", "/api/projects", { as: owner });
    expect(list.body.projects.find((p: { id: string }) => p.id === id)).toMatchObject({ role: "owner" });
    const renamed = await call(projectRoute.PATCH, "PATCH", `/api/projects/${id}`, { as: owner, params: { projectId: id }, body: { name: "Renamed study" } });
    expect(renamed.body.project.name).toBe("Renamed study");
  });

  it("answers 400 with the field and the reason for a malformed body", async () => {
    const res = await call(projectsRoute.POST, "POST", "/api/projects", { as: owner, body: { name: "" } });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("validation_failed");
    expect(res.body.error.fields).toEqual([{ path: "name", message: "enter a project name" }]);
  });

  it("answers 400 for a body that is not JSON, without a stack trace", async () => {
    const res = await call(projectsRoute.POST, "POST", "/api/projects", { as: owner, rawBody: "{not json", headers: { "content-type": "application/json" } });
    expect(res.status).toBe(400);
    expect(res.body.error).toEqual({ code: "bad_request", message: "the request body is not valid JSON" });
  });

  it("answers 404 for an unknown id and for an id that is not a UUID", async () => {
    for (const projectId of [missingId, "not-a-uuid"]) {
      const res = await call(projectRoute.GET, "GET", `/api/projects/${projectId}`, { as: owner, params: { projectId } });
      expect(res.status).toBe(404);
      expect(res.body.error.code).toBe("not_found");
    }
  });
});

describe("sign-up", () => {
  it("refuses a duplicate e-mail address in any letter case with 409", async () => {
    const body = { email: `Dup.${Date.now()}@Example.test`, name: "First", password: "a long enough password" };
    expect((await call(usersRoute.POST, "POST", "/api/users", { body })).status).toBe(201);
    const again = await call(usersRoute.POST, "POST", "/api/users", { body: { ...body, email: body.email.toUpperCase() } });
    expect(again.status).toBe(409);
    expect(again.body.error.fields).toEqual([{ path: "email", message: "already registered" }]);
  });

  it("asks for a password of at least 10 characters", async () => {
    const res = await call(usersRoute.POST, "POST", "/api/users", { body: { email: "short@example.test", name: "Short", password: "short" } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields).toEqual([{ path: "password", message: "use at least 10 characters" }]);
  });
});

describe("members", () => {
  let f: ProjectFixture;
  beforeAll(async () => {
    f = await projectFixture();
  });

  it("will not let the last owner leave or be demoted", async () => {
    const params = { projectId: f.projectId, userId: f.users.owner.id };
    const leave = await call(memberRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params });
    expect(leave.status).toBe(409);
    expect(leave.body.error.message).toMatch(/last owner/);
    const demote = await call(memberRoute.PATCH, "PATCH", "/x", { as: f.users.owner, params, body: { role: "editor" } });
    expect(demote.status).toBe(409);
  });

  it("lets a viewer leave on their own", async () => {
    const g = await projectFixture();
    const res = await call(memberRoute.DELETE, "DELETE", "/x", { as: g.users.viewer, params: { projectId: g.projectId, userId: g.users.viewer.id } });
    expect(res.status).toBe(204);
    const after = await call(projectRoute.GET, "GET", "/x", { as: g.users.viewer, params: { projectId: g.projectId } });
    expect(after.status).toBe(404);
  });

  it("answers 422 for an address without an account and 409 for an existing member", async () => {
    const params = { projectId: f.projectId };
    const unknown = await call(membersRoute.POST, "POST", "/x", { as: f.users.owner, params, body: { email: "nobody-here@example.test", role: "viewer" } });
    expect(unknown.status).toBe(422);
    const again = await call(membersRoute.POST, "POST", "/x", { as: f.users.owner, params, body: { email: f.users.viewer.email, role: "viewer" } });
    expect(again.status).toBe(409);
  });
});

describe("scenarios", () => {
  let f: ProjectFixture;
  const S = () => ({ projectId: f.projectId, scenarioId: f.scenarioId });
  beforeAll(async () => {
    f = await projectFixture();
  });

  it("rejects a stale version with 409 and the version now stored, overwriting nothing", async () => {
    const first = await call(scenarioRoute.PUT, "PUT", "/x", { as: f.users.editor, params: S(), body: { version: 1, title: "Editor's title" } });
    expect(first.status).toBe(200);
    expect(first.body.scenario.version).toBe(2);
    const stale = await call(scenarioRoute.PUT, "PUT", "/x", { as: f.users.owner, params: S(), body: { version: 1, title: "Owner's title" } });
    expect(stale.status).toBe(409);
    expect(stale.body.error).toMatchObject({ code: "version_conflict", currentVersion: 2 });
    const now = await call(scenarioRoute.GET, "GET", "/x", { as: f.users.owner, params: S() });
    expect(now.body.scenario.title).toBe("Editor's title");
  });

  it("keeps every save as a revision", async () => {
    const list = await call(revisionsRoute.GET, "GET", "/x", { as: f.users.viewer, params: S() });
    expect(list.body.revisions.map((r: { version: number }) => r.version)).toEqual([2, 1]);
    const one = await call(revisionRoute.GET, "GET", "/x", { as: f.users.viewer, params: { ...S(), version: "1" } });
    expect(one.body.revision).toMatchObject({ version: 1, title: "Fixture scenario" });
    const missing = await call(revisionRoute.GET, "GET", "/x", { as: f.users.viewer, params: { ...S(), version: "99" } });
    expect(missing.status).toBe(404);
  });

  it("validates the document against the scenario schema, naming each bad field", async () => {
    const bad = { ...defaultScenarioDocument(), separation: { axis: "sideways", split: "symmetric", distanceMetres: -1 } };
    const res = await call(scenariosRoute.POST, "POST", "/x", { as: f.users.editor, params: { projectId: f.projectId }, body: { title: "Bad", document: bad } });
    expect(res.status).toBe(400);
    const paths = res.body.error.fields.map((x: { path: string }) => x.path);
    expect(paths).toContain("document.separation.axis");
    expect(paths).toContain("document.separation.distanceMetres");
  });

  it("refuses a document from a newer schema version with a clear message", async () => {
    const res = await call(scenariosRoute.POST, "POST", "/x", {
      as: f.users.editor,
      params: { projectId: f.projectId },
      body: { title: "Future", document: { ...defaultScenarioDocument(), schemaVersion: 999 } },
    });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0].message).toMatch(/newer than this Branchline/);
  });

  it("duplicates a scenario under a new title", async () => {
    const res = await call(duplicateRoute.POST, "POST", "/x", { as: f.users.editor, params: S() });
    expect(res.status).toBe(201);
    expect(res.body.scenario.title).toBe("Editor's title (copy)");
    expect(res.body.scenario.version).toBe(1);
  });

  it("pages, sorts and filters the scenario list", async () => {
    const g = await projectFixture();
    const params = { projectId: g.projectId };
    for (const title of ["Alpha ramp", "Beta hold", "Gamma ramp"]) {
      await call(scenariosRoute.POST, "POST", "/x", { as: g.users.editor, params, body: { title } });
    }
    const byTitle = await call(scenariosRoute.GET, "GET", "/x", { as: g.users.viewer, params, query: { sort: "title", order: "asc", pageSize: "2" } });
    expect(byTitle.body.total).toBe(4);
    expect(byTitle.body.items.map((s: { title: string }) => s.title)).toEqual(["Alpha ramp", "Beta hold"]);
    const page2 = await call(scenariosRoute.GET, "GET", "/x", { as: g.users.viewer, params, query: { sort: "title", order: "asc", pageSize: "2", page: "2" } });
    expect(page2.body.items.map((s: { title: string }) => s.title)).toEqual(["Fixture scenario", "Gamma ramp"]);
    const filtered = await call(scenariosRoute.GET, "GET", "/x", { as: g.users.viewer, params, query: { q: "RAMP" } });
    expect(filtered.body.items.map((s: { title: string }) => s.title).sort()).toEqual(["Alpha ramp", "Gamma ramp"]);
    const badQuery = await call(scenariosRoute.GET, "GET", "/x", { as: g.users.viewer, params, query: { pageSize: "1000" } });
    expect(badQuery.status).toBe(400);
    expect(badQuery.body.error.fields[0].path).toBe("pageSize");
  });

  it("answers 404 for a scenario of another project, even to its own project's owner", async () => {
    const other = await projectFixture();
    const res = await call(scenarioRoute.GET, "GET", "/x", { as: f.users.owner, params: { projectId: f.projectId, scenarioId: other.scenarioId } });
    expect(res.status).toBe(404);
  });

  it("deletes a project with its scenarios and memberships", async () => {
    const g = await projectFixture();
    const del = await call(projectRoute.DELETE, "DELETE", "/x", { as: g.users.owner, params: { projectId: g.projectId } });
    expect(del.status).toBe(204);
    const gone = await call(scenarioRoute.GET, "GET", "/x", { as: g.users.owner, params: { projectId: g.projectId, scenarioId: g.scenarioId } });
    expect(gone.status).toBe(404);
  });
});

describe("a change of the figures' look only", () => {
  let f: ProjectFixture;
  const S = () => ({ projectId: f.projectId, scenarioId: f.scenarioId });
  const put = (as: typeof f.users.owner, version: number, document: unknown) => call(scenarioRoute.PUT, "PUT", "/x", { as, params: S(), body: { version, document } });
  beforeAll(async () => {
    f = await projectFixture();
  });

  it("amends the saver's own latest version instead of starting a new one, however often it is toggled", async () => {
    const physics = { ...defaultScenarioDocument(), separation: { ...defaultScenarioDocument().separation, distanceMetres: 2e-6 } };
    expect((await put(f.users.owner, 1, physics)).body.scenario.version).toBe(2);
    for (const theme of ["dark", "light", "dark"] as const) {
      const toggled = await put(f.users.owner, 2, { ...physics, display: { theme, showGrid: false } });
      expect(toggled.status).toBe(200);
      expect(toggled.body.scenario.version).toBe(2);
    }
    const list = await call(revisionsRoute.GET, "GET", "/x", { as: f.users.viewer, params: S() });
    expect(list.body.revisions.map((r: { version: number }) => r.version)).toEqual([2, 1]);
    const stored = await call(revisionRoute.GET, "GET", "/x", { as: f.users.viewer, params: { ...S(), version: "2" } });
    expect(stored.body.revision.document.display).toEqual({ theme: "dark", showGrid: false });
  });

  it("starts a new version when someone else toggles it, or when anything else changes with it", async () => {
    const current = (await call(scenarioRoute.GET, "GET", "/x", { as: f.users.owner, params: S() })).body.scenario;
    const byEditor = await put(f.users.editor, current.version, { ...current.document, display: { theme: "light", showGrid: true } });
    expect(byEditor.body.scenario.version).toBe(current.version + 1);
    const both = { ...current.document, display: { theme: "dark", showGrid: true }, separation: { ...current.document.separation, distanceMetres: 3e-6 } };
    expect((await put(f.users.editor, current.version + 1, both)).body.scenario.version).toBe(current.version + 2);
  });
});

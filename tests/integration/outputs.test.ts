/**
 * What leaves Branchline, through the real route handlers and PostgreSQL: the scenario file and the Budget as
 * CSV from a project (for its members) and from a share link (for its holder), and the proxy's 404 for a dead
 * embed.
 */
import { NextRequest } from "next/server";
import { describe, expect, it } from "vitest";
import * as exportRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/export/route";
import * as scenarioRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import * as shareLinkRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/share-links/[linkId]/route";
import * as shareLinksRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/share-links/route";
import * as sharedExportRoute from "@/app/api/share/[token]/export/route";
import { computeScenario } from "@/physics/compute";
import { parseScenarioFileText } from "@/physics/scenario/exchange";
import { CURRENT_SCHEMA_VERSION, defaultScenarioDocument } from "@/physics/scenario/schema";
import { proxy } from "@/proxy";
import { projectFixture, type ProjectFixture } from "./fixtures";
import { call } from "./harness";

const S = (f: ProjectFixture) => ({ projectId: f.projectId, scenarioId: f.scenarioId });

async function liveLink(f: ProjectFixture): Promise<{ id: string; token: string }> {
  const created = await call(shareLinksRoute.POST, "POST", "/x", { as: f.users.owner, params: S(f), body: { label: "for the colloquium" } });
  expect(created.status).toBe(201);
  return { id: created.body.link.id, token: new URL(created.body.url).pathname.split("/").pop()! };
}

describe("exporting a scenario from its project", () => {
  it("answers a viewer the scenario file, which reads back as the same scenario", async () => {
    const f = await projectFixture();
    const res = await call(exportRoute.GET, "GET", "/x", { as: f.users.viewer, params: S(f), query: { what: "scenario" } });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("application/json; charset=utf-8");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="fixture-scenario.json"');
    const parsed = parseScenarioFileText(JSON.stringify(res.body));
    expect(parsed).toEqual({ ok: true, title: "Fixture scenario", description: undefined, document: defaultScenarioDocument() });
  });

  it("answers the Budget as CSV with the numbers the physics computes for the stored document", async () => {
    const f = await projectFixture();
    const res = await call<string>(exportRoute.GET, "GET", "/x", { as: f.users.editor, params: S(f), query: { what: "budget" } });
    expect(res.status).toBe(200);
    expect(res.headers.get("content-type")).toBe("text/csv; charset=utf-8");
    expect(res.headers.get("content-disposition")).toBe('attachment; filename="fixture-scenario-budget.csv"');
    const lines = res.body.split("\r\n");
    // The inputs first, as "# key: value unit" lines, then the numbers.
    expect(lines[0]).toBe(`# schemaVersion: ${CURRENT_SCHEMA_VERSION}`);
    expect(lines).toContain(`# separation.distanceMetres: ${defaultScenarioDocument().separation.distanceMetres} m`);
    expect(lines).toContain("quantity,value,unit,source");
    expect(lines).toContain("flag,status,message");
    const total = lines.find((l) => l.startsWith("Total quanta <N> (electromagnetic),"))!;
    expect(Number(total.split(",")[1])).toBe(computeScenario(defaultScenarioDocument()).electromagnetic.totalQuanta.value);
  });

  it("follows the scenario's latest saved version", async () => {
    const f = await projectFixture();
    const saved = await call(scenarioRoute.PUT, "PUT", "/x", { as: f.users.editor, params: S(f), body: { version: 1, title: "Longer hold" } });
    expect(saved.status).toBe(200);
    const res = await call(exportRoute.GET, "GET", "/x", { as: f.users.owner, params: S(f), query: { what: "scenario" } });
    expect(res.body.title).toBe("Longer hold");
  });

  it("refuses an unknown kind of file with the one error shape", async () => {
    const f = await projectFixture();
    const res = await call(exportRoute.GET, "GET", "/x", { as: f.users.viewer, params: S(f), query: { what: "spreadsheet" } });
    expect(res.status).toBe(400);
    expect(res.body.error).toMatchObject({ code: "validation_failed", fields: [{ path: "what", message: expect.stringContaining("scenario") }] });
  });

  it("does not tell a stranger the scenario exists", async () => {
    const f = await projectFixture();
    const res = await call(exportRoute.GET, "GET", "/x", { as: f.users.stranger, params: S(f), query: { what: "scenario" } });
    expect(res.status).toBe(404);
  });
});

describe("exporting through a share link", () => {
  it("gives the holder the scenario file and the Budget, and nothing after the link is revoked", async () => {
    const f = await projectFixture();
    const link = await liveLink(f);
    const file = await call(sharedExportRoute.GET, "GET", "/x", { params: { token: link.token }, query: { what: "scenario" } });
    expect(file.status).toBe(200);
    expect(file.body).toMatchObject({ format: "branchline-scenario", title: "Fixture scenario" });
    // Nothing of the project rides along in the file.
    expect(JSON.stringify(file.body)).not.toContain(f.projectId);
    const csv = await call<string>(sharedExportRoute.GET, "GET", "/x", { params: { token: link.token }, query: { what: "budget" } });
    expect(csv.status).toBe(200);
    expect(csv.body.startsWith(`# schemaVersion: ${CURRENT_SCHEMA_VERSION}\r\n`)).toBe(true);
    expect(csv.body).toContain("\r\nquantity,value,unit,source\r\n");

    expect((await call(shareLinkRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params: { ...S(f), linkId: link.id } })).status).toBe(204);
    const dead = await call(sharedExportRoute.GET, "GET", "/x", { params: { token: link.token }, query: { what: "scenario" } });
    expect(dead.status).toBe(404);
    expect(dead.body.error.code).toBe("not_found");
  });
});

describe("the proxy in front of the embeds", () => {
  const status = async (path: string) => (await proxy(new NextRequest(new URL(path, "http://localhost:3999")))).status;

  it("lets a live share link's embed through and answers 404 once the link is revoked", async () => {
    const f = await projectFixture();
    const link = await liveLink(f);
    expect(await status(`/embed/${link.token}`)).toBe(200);
    expect(await status("/embed/not-a-token-of-ours")).toBe(404);
    await call(shareLinkRoute.DELETE, "DELETE", "/x", { as: f.users.owner, params: { ...S(f), linkId: link.id } });
    expect(await status(`/embed/${link.token}`)).toBe(404);
  });

  it("answers 400 for a path segment that does not decode (%ff), on every dynamic page", async () => {
    for (const path of ["/share/%ff", "/embed/%ff", "/invitations/%ff", "/projects/%ff", "/projects/%ff/scenarios/%ff", "/projects/p/scenarios/%E0%A4%A/files"]) {
      expect(await status(path), path).toBe(400);
    }
  });

  it("gives every page a Content-Security-Policy with a fresh script nonce, also handed to Next.js on the request", async () => {
    const policyOf = async (path: string) => {
      const res = await proxy(new NextRequest(new URL(path, "http://localhost:3999")));
      return { policy: res.headers.get("content-security-policy") ?? "", forwarded: res.headers.get("x-middleware-request-content-security-policy") ?? "" };
    };
    const a = await policyOf("/projects");
    const b = await policyOf("/projects");
    const nonce = /'nonce-([^']+)'/.exec(a.policy)?.[1];
    expect(nonce).toBeTruthy();
    expect(b.policy).not.toContain(nonce);
    expect(a.forwarded).toBe(a.policy);
    expect(a.policy).toMatch(/script-src 'self' 'nonce-[^']+' 'strict-dynamic'/);
    expect(a.policy).toContain("object-src 'none'");
    expect(a.policy).toContain("base-uri 'self'");
    expect(a.policy).toContain("frame-ancestors 'none'");
    expect((await policyOf("/embed/not-a-token-of-ours")).policy).toContain("frame-ancestors *");
  });
});

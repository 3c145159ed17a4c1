/**
 * Issue 13's input defects, each as it was found, through the real route handlers and the real PostgreSQL:
 * a chunked oversized body, NUL characters and lone surrogates in stored text, parameters outside the range where
 * the computation is defined, and a stored document that predates those ranges behind a share link.
 */
import { NextRequest } from "next/server";
import { sql } from "kysely";
import { beforeAll, describe, expect, it } from "vitest";
import * as computeRoute from "@/app/api/compute/route";
import * as accountRoute from "@/app/api/account/route";
import * as projectRoute from "@/app/api/projects/[projectId]/route";
import * as projectsRoute from "@/app/api/projects/route";
import * as scenarioRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import * as scenarioExportRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/export/route";
import * as shareLinksRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/share-links/route";
import * as scenariosRoute from "@/app/api/projects/[projectId]/scenarios/route";
import * as importRoute from "@/app/api/projects/[projectId]/scenarios/import/route";
import * as shareExportRoute from "@/app/api/share/[token]/export/route";
import * as shareRoute from "@/app/api/share/[token]/route";
import { getDb } from "@/db";
import { createShareLink } from "@/db/share-links";
import { MAX_JSON_BYTES } from "@/lib/http";
import { scenarioFileText, toScenarioFile } from "@/physics/scenario/exchange";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { projectFixture, type ProjectFixture } from "./fixtures";
import { call } from "./harness";

let f: ProjectFixture;
beforeAll(async () => {
  f = await projectFixture();
});

const S = () => ({ projectId: f.projectId, scenarioId: f.scenarioId });
const scenarioPath = () => `/api/projects/${f.projectId}/scenarios/${f.scenarioId}`;

/** A body of `total` bytes sent in 1 MiB chunks without a Content-Length, made as it is read (never held whole). */
function chunkedBody(total: number): { stream: ReadableStream<Uint8Array>; sent: () => number } {
  const chunk = new Uint8Array(1024 * 1024).fill(0x20);
  let sent = 0;
  const stream = new ReadableStream<Uint8Array>({
    pull(controller) {
      if (sent >= total) return controller.close();
      sent += chunk.byteLength;
      controller.enqueue(chunk);
    },
  });
  return { stream, sent: () => sent };
}

describe("a chunked body over the limit", () => {
  it("answers 413 after reading little more than the limit, with memory growth under 50 MiB", async () => {
    const total = 200 * 1024 * 1024;
    const body = chunkedBody(total);
    global.gc?.();
    const before = process.memoryUsage().rss;
    const req = new NextRequest("http://localhost:3999/api/compute", {
      method: "POST",
      headers: { "content-type": "application/json" },
      body: body.stream,
      duplex: "half",
    } as unknown as ConstructorParameters<typeof NextRequest>[1]);
    expect(req.headers.get("content-length")).toBeNull();
    const res = await computeRoute.POST(req, { params: Promise.resolve({}) });
    const grewMiB = (process.memoryUsage().rss - before) / 1024 / 1024;
    expect(res.status).toBe(413);
    expect((await res.json()).error).toMatchObject({ code: "payload_too_large", message: expect.stringContaining("8.0 MB") });
    // The reader stopped at the limit: the rest of the 200 MiB was never pulled from the client.
    expect(body.sent()).toBeLessThan(MAX_JSON_BYTES + 4 * 1024 * 1024);
    expect(body.sent()).toBeLessThan(total / 10);
    console.log(`[hardening] chunked 200 MiB body: read ${(body.sent() / 1024 / 1024).toFixed(0)} MiB, rss grew ${grewMiB.toFixed(1)} MiB`);
    expect(grewMiB).toBeLessThan(50);
  });
});

describe("text that PostgreSQL cannot store", () => {
  const NUL = "before\u0000after";
  const LONE = "before\ud800after";

  it.each([
    ["project name", () => call(projectsRoute.POST, "POST", "/api/projects", { as: f.users.owner, body: { name: NUL } }), "name"],
    ["project description", () => call(projectRoute.PATCH, "PATCH", `/api/projects/${f.projectId}`, { as: f.users.owner, params: { projectId: f.projectId }, body: { description: NUL } }), "description"],
    ["account name", () => call(accountRoute.PATCH, "PATCH", "/api/account", { as: f.users.owner, body: { name: NUL } }), "name"],
    ["scenario title", () => call(scenarioRoute.PUT, "PUT", scenarioPath(), { as: f.users.owner, params: S(), body: { version: 1, title: NUL } }), "title"],
    ["share-link label", () => call(shareLinksRoute.POST, "POST", `${scenarioPath()}/share-links`, { as: f.users.owner, params: S(), body: { label: NUL } }), "label"],
    ["formula (lone surrogate)", () => call(scenarioRoute.PUT, "PUT", scenarioPath(), { as: f.users.owner, params: S(), body: { version: 1, document: { ...defaultScenarioDocument(), protocol: { kind: "formula", expression: `sin(t)${LONE}`, durationSeconds: 1 } } } }), "document.protocol.expression"],
    ["search query ?q=%00", () => call(scenariosRoute.GET, "GET", `/api/projects/${f.projectId}/scenarios`, { as: f.users.owner, params: { projectId: f.projectId }, query: { q: "\u0000" } }), "q"],
  ])("refuses a NUL or lone surrogate in the %s with 400 naming the field", async (_what, send, field) => {
    const res = await send();
    expect(res.status, JSON.stringify(res.body)).toBe(400);
    expect(res.body.error.fields.map((i: { path: string }) => i.path)).toContain(field);
    expect(JSON.stringify(res.body.error)).toMatch(/NUL|surrogate/);
  });

  it("refuses a NUL in an imported scenario file's title with 4xx naming it", async () => {
    const file = scenarioFileText(toScenarioFile({ title: NUL, document: defaultScenarioDocument() }));
    const res = await call(importRoute.POST, "POST", `/api/projects/${f.projectId}/scenarios/import`, { as: f.users.owner, params: { projectId: f.projectId }, headers: { "content-type": "application/json" }, rawBody: file });
    expect(res.status).toBeGreaterThanOrEqual(400);
    expect(res.status).toBeLessThan(500);
    expect(res.body.error.fields.map((i: { path: string }) => i.path)).toContain("title");
  });
});

describe("parameters outside the range where the computation is defined", () => {
  it.each([
    ["Hubble rate", { kind: "de-sitter", hubbleRatePerSecond: 1e-300 }, { placement: "areal-radius", arealRadiusMetres: 0 }, "document.background.hubbleRatePerSecond", /Hubble rate must be from 1e-40 to 1e40 s\^-1/],
    ["acceleration", { kind: "rindler", accelerationMetresPerSecondSquared: 1e-300 }, { placement: "uniformly-accelerated" }, "document.background.accelerationMetresPerSecondSquared", /from 1e-30 to 1e50 m s\^-2/],
    ["black-hole mass", { kind: "schwarzschild", massKg: 1e-300 }, { placement: "proper-distance-from-horizon", properDistanceMetres: 1 }, "document.background.massKg", /from 1e-8 to 1e60 kg/],
    ["proper distance", { kind: "schwarzschild", massKg: 2e31 }, { placement: "proper-distance-from-horizon", properDistanceMetres: 1e-300 }, "document.lab.properDistanceMetres", /from 1e-30 to 1e30 m/],
    ["Hubble rate of 1e300", { kind: "de-sitter", hubbleRatePerSecond: 1e300 }, { placement: "areal-radius", arealRadiusMetres: 0 }, "document.background.hubbleRatePerSecond", /1e40 s\^-1/],
  ])("refuses a %s out of range on save with 400, the range and the unit", async (_what, background, lab, field, range) => {
    const document = { ...defaultScenarioDocument(), background, lab };
    const res = await call(scenarioRoute.PUT, "PUT", scenarioPath(), { as: f.users.owner, params: S(), body: { version: 1, document } });
    expect(res.status, JSON.stringify(res.body)).toBe(400);
    const issue = res.body.error.fields.find((i: { path: string }) => i.path === field);
    expect(issue?.message).toMatch(range);
    const computed = await call(computeRoute.POST, "POST", "/api/compute", { body: document });
    expect(computed.status).toBe(400);
    expect(computed.body.error.fields[0].message).toMatch(range);
  });

  it("refuses a kink time resolution finer than 1e-12 of the protocol (the 1 KB request that stalled the server)", async () => {
    const document = { ...defaultScenarioDocument(), protocol: { kind: "formula", expression: "sin(pi*t)^2 + 0.1*sin(40*t)", durationSeconds: 1 }, numerics: { kinkTimeResolutionSeconds: 1e-300 } };
    const started = performance.now();
    const res = await call(computeRoute.POST, "POST", "/api/compute", { body: document });
    expect(res.status).toBe(400);
    expect(res.body.error.fields[0]).toMatchObject({ path: "numerics.kinkTimeResolutionSeconds", message: expect.stringContaining("1e-12") });
    console.log(`[hardening] refused in ${(performance.now() - started).toFixed(0)} ms`);
  });
});

describe("a stored document that predates the ranges", () => {
  let token: string;
  beforeAll(async () => {
    const db = getDb();
    const stored = { ...defaultScenarioDocument(), background: { kind: "de-sitter", hubbleRatePerSecond: 1e-300 }, lab: { placement: "areal-radius", arealRadiusMetres: 0 } };
    // Written as an older Branchline would have stored it: straight into the table, past today's checks.
    await sql`update scenarios set document = ${JSON.stringify(stored)}::jsonb, background_kind = 'de-sitter' where id = ${f.scenarioId}`.execute(db);
    const link = await createShareLink(db, { userId: f.users.owner.id, siteRole: "member" }, f.projectId, f.scenarioId, { label: "for the referee" });
    token = link.token;
  });

  it("still opens, and its share link answers with the reason in words instead of a 500", async () => {
    const res = await call(shareRoute.GET, "GET", `/api/share/${token}`, { params: { token } });
    expect(res.status).toBeLessThan(500);
    expect(res.body.scenario.document.background.hubbleRatePerSecond).toBe(1e-300);
    expect(res.body.result).toBeNull();
    expect(res.body.resultIssues[0]).toMatchObject({ path: "background.hubbleRatePerSecond", message: expect.stringMatching(/Hubble rate must be from 1e-40 to 1e40 s\^-1/) });
  });

  it("answers 422 with the reason for the Budget export, shared and signed in, and still exports the scenario file", async () => {
    const shared = await call(shareExportRoute.GET, "GET", `/api/share/${token}/export`, { params: { token }, query: { what: "budget" } });
    expect(shared.status).toBe(422);
    expect(shared.body.error.message).toMatch(/cannot be computed: the Hubble rate must be from 1e-40/);
    const member = await call(scenarioExportRoute.GET, "GET", `${scenarioPath()}/export`, { as: f.users.viewer, params: S(), query: { what: "budget" } });
    expect(member.status).toBe(422);
    const file = await call(shareExportRoute.GET, "GET", `/api/share/${token}/export`, { params: { token }, query: { what: "scenario" } });
    expect(file.status).toBe(200);
  });

  it("can still be renamed (its document is kept as it is)", async () => {
    const current = await call(scenarioRoute.GET, "GET", scenarioPath(), { as: f.users.owner, params: S() });
    const res = await call(scenarioRoute.PUT, "PUT", scenarioPath(), { as: f.users.owner, params: S(), body: { version: current.body.scenario.version, title: "Renamed old scenario" } });
    expect(res.status, JSON.stringify(res.body)).toBe(200);
  });
});

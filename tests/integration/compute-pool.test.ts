/**
 * No request can stall the server: computations run in the compute pool's worker threads under a time budget and
 * a cost ceiling, saved scenarios are computed once per version, and anonymous computation is rate-limited per
 * address. Through the real route handlers, PostgreSQL and worker threads (lib/compute-pool.ts).
 */
import { afterEach, beforeAll, describe, expect, it } from "vitest";
import * as accountRoute from "@/app/api/account/route";
import * as computeRoute from "@/app/api/compute/route";
import * as exportRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/export/route";
import * as scenarioRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import * as shareLinksRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/share-links/route";
import * as sharedExportRoute from "@/app/api/share/[token]/export/route";
import * as shareRoute from "@/app/api/share/[token]/route";
import { withSocketAddress } from "@/lib/client-address";
import { computePool } from "@/lib/compute-pool";
import { computeScenario } from "@/physics";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { projectFixture, type ProjectFixture } from "./fixtures";
import { call, makeUser } from "./harness";

/**
 * The probe of the stall: thirty oscillating terms with velocity jumps resolved as finely as the ranges allow
 * (1e-12 of the protocol; 1e-300 s, the original probe, is now refused as input): over the ceiling.
 */
const tooCostly = {
  ...defaultScenarioDocument(),
  protocol: { kind: "formula", expression: Array.from({ length: 30 }, (_, k) => `abs(sin(${k + 1}*pi*t))/30`).join(" + "), durationSeconds: 1 },
  numerics: { kinkTimeResolutionSeconds: 1e-12 },
};

/** Just within the ceiling, but over half a second of work: a kinked profile sampled 2^18 times. */
const slow = {
  ...defaultScenarioDocument(),
  protocol: { kind: "formula", expression: "abs(sin(pi*t)) + 0.001*abs(sin(7*pi*t))", durationSeconds: 1 },
  numerics: { kinkTimeResolutionSeconds: 1e-12 },
};

const S = (f: ProjectFixture) => ({ projectId: f.projectId, scenarioId: f.scenarioId });
const savedEnv = { ...process.env };

beforeAll(async () => {
  // The threads load the physics once per process; what follows times the computations, not that.
  await computePool().whenReady();
}, 120_000);

afterEach(() => {
  process.env.BRANCHLINE_COMPUTE_BUDGET_MS = savedEnv.BRANCHLINE_COMPUTE_BUDGET_MS;
  process.env.BRANCHLINE_COMPUTE_RATE_PER_MINUTE = savedEnv.BRANCHLINE_COMPUTE_RATE_PER_MINUTE;
  for (const key of ["BRANCHLINE_COMPUTE_BUDGET_MS", "BRANCHLINE_COMPUTE_RATE_PER_MINUTE"]) if (savedEnv[key] === undefined) delete process.env[key];
});

describe("a computation past its time budget", () => {
  it("answers 422 within the budget while a light request meanwhile is answered at once, and the pool recovers", async () => {
    const budgetMs = 250;
    process.env.BRANCHLINE_COMPUTE_BUDGET_MS = String(budgetMs);
    const user = await makeUser("light");
    const cancelledBefore = computePool().cancelled;

    const started = performance.now();
    let slowSettled = false;
    const slowRequest = call(computeRoute.POST, "POST", "/api/compute", { as: user, body: slow }).then((res) => {
      slowSettled = true;
      return { res, ms: performance.now() - started };
    });
    // Let the slow document reach a thread, then ask for something light on this, the server's, thread.
    await new Promise((resolve) => setTimeout(resolve, 100));
    const lightStarted = performance.now();
    const light = await call(accountRoute.GET, "GET", "/api/account", { as: user });
    const lightMs = performance.now() - lightStarted;
    const lightBeforeSlow = !slowSettled;

    const { res, ms } = await slowRequest;
    expect(light.status).toBe(200);
    expect(lightBeforeSlow).toBe(true);
    expect(lightMs).toBeLessThan(200);
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("compute_over_budget");
    expect(res.body.error.message).toMatch(/0\.25 s budget/);
    expect(res.body.error.fields.map((f: { path: string }) => f.path)).toEqual(["numerics.kinkTimeResolutionSeconds", "protocol.expression"]);
    // The budget starts when a thread takes the document; the answer comes soon after it runs out.
    expect(ms).toBeGreaterThanOrEqual(budgetMs);
    expect(ms).toBeLessThan(budgetMs + 1500);
    expect(computePool().cancelled).toBe(cancelledBefore + 1);

    // The cancelled thread is replaced: the next computation is answered as usual.
    const after = await call(computeRoute.POST, "POST", "/api/compute", { as: user, body: defaultScenarioDocument() });
    expect(after.status).toBe(200);
    expect(after.body.result).toEqual(JSON.parse(JSON.stringify(computeScenario(defaultScenarioDocument()))));
  });
});

describe("the cost ceiling", () => {
  it("refuses a document over it with 422, naming the numerics fields to change", async () => {
    const res = await withSocketAddress("198.51.100.1", () => call(computeRoute.POST, "POST", "/api/compute", { body: tooCostly }));
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("compute_too_costly");
    expect(res.body.error.message).toMatch(/relax the numerics/);
    const fields = res.body.error.fields as { path: string; message: string }[];
    expect(fields.map((f) => f.path)).toEqual(["numerics.kinkTimeResolutionSeconds", "protocol.expression"]);
    expect(fields[0].message).toMatch(/at least [0-9.e+-]+ s/);
  });
});

describe("the result cache of saved scenarios", () => {
  async function sharedScenario() {
    const f = await projectFixture();
    const created = await call(shareLinksRoute.POST, "POST", "/x", { as: f.users.owner, params: S(f), body: { label: "cache" } });
    expect(created.status).toBe(201);
    return { f, token: new URL(created.body.url).pathname.split("/").pop()! };
  }

  it("computes a version once for every share view, export and member export, and again after a save", async () => {
    const { f, token } = await sharedScenario();
    const pool = computePool();
    const runs = () => pool.started;

    const before = runs();
    const first = await call(shareRoute.GET, "GET", "/x", { params: { token } });
    expect(first.status).toBe(200);
    expect(first.body.result).toEqual(JSON.parse(JSON.stringify(computeScenario(defaultScenarioDocument()))));
    expect(runs()).toBe(before + 1);

    const second = await call(shareRoute.GET, "GET", "/x", { params: { token } });
    const csv = await call<string>(sharedExportRoute.GET, "GET", "/x", { params: { token }, query: { what: "budget" } });
    const memberCsv = await call<string>(exportRoute.GET, "GET", "/x", { as: f.users.viewer, params: S(f), query: { what: "budget" } });
    expect([second.status, csv.status, memberCsv.status]).toEqual([200, 200, 200]);
    expect(second.body.result).toEqual(first.body.result);
    expect(runs()).toBe(before + 1);

    const document = { ...defaultScenarioDocument(), separation: { ...defaultScenarioDocument().separation, distanceMetres: 2e-6 } };
    const saved = await call(scenarioRoute.PUT, "PUT", "/x", { as: f.users.owner, params: S(f), body: { version: first.body.scenario.version, document } });
    expect(saved.status).toBe(200);
    const third = await call(shareRoute.GET, "GET", "/x", { params: { token } });
    expect(third.body.scenario.version).toBe(first.body.scenario.version + 1);
    expect(third.body.result).toEqual(JSON.parse(JSON.stringify(computeScenario(document))));
    expect(runs()).toBe(before + 2);
  });

  it("keeps a document that cannot be computed as its reasons: shown to the share view, 422 for the export, not computed again", async () => {
    const { f, token } = await sharedScenario();
    const saved = await call(scenarioRoute.PUT, "PUT", "/x", { as: f.users.owner, params: S(f), body: { version: 1, document: tooCostly } });
    expect(saved.status).toBe(200);
    const before = computePool().started;
    const view = await call(shareRoute.GET, "GET", "/x", { params: { token } });
    expect(view.status).toBe(200);
    expect(view.body.result).toBeNull();
    expect(view.body.resultIssues.map((i: { path: string }) => i.path)).toEqual(["numerics.kinkTimeResolutionSeconds", "protocol.expression"]);
    const csv = await call(sharedExportRoute.GET, "GET", "/x", { params: { token }, query: { what: "budget" } });
    expect(csv.status).toBe(422);
    expect(csv.body.error.code).toBe("compute_too_costly");
    expect(computePool().started).toBe(before + 1);
  });
});

describe("the rate limit on anonymous computation", () => {
  it("answers 429 with Retry-After past the limit for one address, and leaves other addresses and members alone", async () => {
    process.env.BRANCHLINE_COMPUTE_RATE_PER_MINUTE = "3";
    // A fresh address per run: the counts live in PostgreSQL for a minute.
    const address = `203.0.113.${Math.floor(Math.random() * 250) + 1}-${Date.now()}`;
    const anonymous = (from: string) => withSocketAddress(from, () => call(computeRoute.POST, "POST", "/api/compute", { body: defaultScenarioDocument() }));
    for (let i = 0; i < 3; i++) expect((await anonymous(address)).status).toBe(200);
    const limited = await anonymous(address);
    expect(limited.status).toBe(429);
    expect(limited.body.error.code).toBe("rate_limited");
    expect(limited.body.error.message).toMatch(/3 a minute per address/);
    const retryAfter = Number(limited.headers.get("retry-after"));
    expect(retryAfter).toBeGreaterThanOrEqual(1);
    expect(retryAfter).toBeLessThanOrEqual(60);

    // A client-supplied X-Forwarded-For does not make another client while no proxy is trusted.
    const spoofed = await withSocketAddress(address, () => call(computeRoute.POST, "POST", "/api/compute", { body: defaultScenarioDocument(), headers: { "x-forwarded-for": "192.0.2.99" } }));
    expect(spoofed.status).toBe(429);

    expect((await anonymous(`${address}-other`)).status).toBe(200);
    const member = await makeUser("computing");
    for (let i = 0; i < 4; i++) expect((await withSocketAddress(address, () => call(computeRoute.POST, "POST", "/api/compute", { as: member, body: defaultScenarioDocument() }))).status).toBe(200);
  });
});

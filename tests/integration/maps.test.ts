/**
 * Parameter maps through the real queue: pg-boss on the test database, and real worker processes (`npm run
 * worker`'s script, spawned here). A map completes although one of its two workers is killed mid-row (its row
 * expires and another worker takes it); a cancelled map stops; a row kept twice counts once; the grid's points are
 * the very numbers a direct computation of the same document gives; the CSV carries the inputs. Bad requests answer
 * 400 with the field, and 429 past the maps one account may run at once (the cost refusal: tests/unit/physics/maps.test.ts).
 */
import { sql } from "kysely";
import { afterAll, afterEach, beforeAll, describe, expect, it } from "vitest";
import * as mapRoute from "@/app/api/maps/[mapId]/route";
import * as mapsRoute from "@/app/api/maps/route";
import * as scenarioMapsRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/maps/route";
import { getDb } from "@/db";
import { MAX_ACTIVE_MAPS, recordMapRow } from "@/db/parameter-maps";
import { stopMapSender } from "@/lib/map-queue";
import { computeScenario } from "@/physics/compute";
import { documentAt, type MapRequest } from "@/physics/maps";
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import { projectFixture, smallMapRequest, type ProjectFixture } from "./fixtures";
import { ready, startWorker, stopWorkers, until } from "./map-workers";
import { call, makeUser, type TestUser } from "./harness";

const getMap = (user: TestUser, id: string, query?: Record<string, string>) => call(mapRoute.GET, "GET", `/api/maps/${id}`, { as: user, params: { mapId: id }, query });

/** Retries pg-boss recorded for the map's rows (its own job table, read only here). */
async function retriesOf(mapId: string): Promise<number> {
  const { rows } = await sql<{ n: string }>`select coalesce(sum(retry_count), 0) as n from pgboss.job where name = 'parameter-map-rows' and data->>'mapId' = ${mapId}`.execute(getDb());
  return Number(rows[0].n);
}

let f: ProjectFixture;
const savedExpiry = process.env.BRANCHLINE_MAP_CHUNK_EXPIRE_SECONDS;
beforeAll(async () => {
  // Read when the rows are queued: a dead worker's row is taken again after 3 s (plus at most one 1 s maintenance
  // round), not 10 minutes.
  process.env.BRANCHLINE_MAP_CHUNK_EXPIRE_SECONDS = "3";
  f = await projectFixture();
}, 60_000);
afterEach(stopWorkers, 60_000);
afterAll(async () => {
  if (savedExpiry === undefined) delete process.env.BRANCHLINE_MAP_CHUNK_EXPIRE_SECONDS;
  else process.env.BRANCHLINE_MAP_CHUNK_EXPIRE_SECONDS = savedExpiry;
  await stopWorkers();
  await stopMapSender();
}, 60_000);

describe("a parameter map through the queue", () => {
  it("completes with two workers although one is killed mid-row, and its points are those of a direct computation", async () => {
    const owner = f.users.owner;
    // A second or more a row here: long enough to kill a worker inside one.
    const request: MapRequest = {
      x: { parameter: "recombination-time", from: 1e-3, to: 1e-1, points: 24, scale: "log" },
      y: { parameter: "hold-time", from: 1e-2, to: 1, points: 12, scale: "log" },
      quantity: "total-quanta",
    };
    const [a, b] = [startWorker(), startWorker()];
    await Promise.all([ready(a), ready(b)]);
    const started = await call(mapsRoute.POST, "POST", "/api/maps", { as: owner, body: { scenario: { projectId: f.projectId, scenarioId: f.scenarioId }, ...request } });
    expect(started.status, JSON.stringify(started.body)).toBe(202);
    expect(started.headers.get("location")).toBe(`/api/maps/${started.body.map.id}`);
    const id: string = started.body.map.id;
    expect(started.body.map.progress).toEqual({ rowsDone: 0, rowsTotal: 12, fraction: 0 });

    // Kill worker a inside a row: as soon as it says it started one (a row here takes a second or more of computing).
    await until("worker a to start a row", async () => a.lines.some((l) => l.includes(id) && l.includes("started")));
    a.child.kill("SIGKILL");
    await a.exited;
    const atKill = (await getMap(owner, id)).body.map;
    expect(atKill.progress.rowsDone).toBeLessThan(12);

    const done = await until("the map to finish", async () => {
      const res = await getMap(owner, id);
      return res.body.map.status === "done" ? res.body.map : null;
    });
    expect(done.progress).toEqual({ rowsDone: 12, rowsTotal: 12, fraction: 1 });
    expect(await retriesOf(id)).toBeGreaterThanOrEqual(1);
    expect(b.lines.some((l) => l.includes(id) && /started \(try [2-9]\)/.test(l))).toBe(true);

    const grid = done.result;
    expect(grid.log10).toHaveLength(12);
    for (const row of grid.log10) expect(row).toHaveLength(24);
    // Log spacing: x_i = from·(to/from)^(i/(n−1)) — the definition of points evenly spaced in the logarithm.
    grid.x.values.forEach((x: number, i: number) => expect(x).toBeCloseTo(1e-3 * 100 ** (i / 23), 12));
    // The queue carries numbers, it does not make them: a few points against computeScenario run here, directly.
    const document = done.document as ScenarioDocument;
    for (const [column, row] of [[0, 0], [23, 11], [3, 5], [16, 2]]) {
      const direct = computeScenario(documentAt(document, request, grid.x.values[column], grid.y.values[row])).combined.totalQuanta.log10;
      expect(grid.log10[row][column]).toBeCloseTo(direct!, 10);
    }

    const listed = await call(scenarioMapsRoute.GET, "GET", "", { as: f.users.viewer, params: { projectId: f.projectId, scenarioId: f.scenarioId } });
    expect(listed.body.maps.map((m: { id: string }) => m.id)).toContain(id);

    const csv = await getMap(owner, id, { format: "csv" });
    expect(csv.status).toBe(200);
    expect(csv.headers.get("content-type")).toMatch(/^text\/csv/);
    const text = csv.body as string;
    expect(text).toContain("# x: recombination-time from 0.001 to 0.1 (SI), 24 points, log spacing");
    expect(text).toContain("# document.protocol.hold.durationSeconds:");
    const lines = text.split("\r\n").filter((l) => l && !l.startsWith("#"));
    expect(lines[0]).toBe("recombination_time_s,hold_time_s,total_quanta_count,log10_total_quanta,not_computed_because");
    expect(lines).toHaveLength(1 + 24 * 12);
  }, 300_000);

  it("stops a cancelled map: its remaining rows are not computed", async () => {
    const owner = await makeUser("canceller");
    const request = {
      x: { parameter: "recombination-time", from: 1e-3, to: 1e-1, points: 8, scale: "log" },
      y: { parameter: "hold-time", from: 1e-2, to: 1, points: 40, scale: "log" },
      quantity: "decoherence",
    };
    const started = await call(mapsRoute.POST, "POST", "/api/maps", { as: owner, body: { document: defaultScenarioDocument(), ...request } });
    expect(started.status).toBe(202);
    const id: string = started.body.map.id;
    const w = startWorker();
    await until("a row", async () => (await getMap(owner, id)).body.map.progress.rowsDone >= 1);
    const cancelled = await call(mapRoute.DELETE, "DELETE", `/api/maps/${id}`, { as: owner, params: { mapId: id } });
    expect(cancelled.status).toBe(200);
    expect(cancelled.body.map.status).toBe("cancelled");
    const doneAtCancel = cancelled.body.map.progress.rowsDone;
    // Every remaining row is taken and dropped at once: the worker says so for all of them.
    await until("the worker to drop the remaining rows", async () => w.lines.filter((l) => l.includes(id) && l.includes("not wanted")).length >= 40 - doneAtCancel - 1);
    const after = (await getMap(owner, id)).body.map;
    expect(after.status).toBe("cancelled");
    expect(after.progress.rowsDone).toBeLessThanOrEqual(doneAtCancel + 1);
    expect(after.result).toBeNull();
    // A finished map is deleted by a second DELETE.
    expect((await call(mapRoute.DELETE, "DELETE", `/api/maps/${id}`, { as: owner, params: { mapId: id } })).status).toBe(204);
    expect((await getMap(owner, id)).status).toBe(404);
  }, 200_000);
});

describe("keeping rows", () => {
  it("counts a row kept twice (a retried chunk) once, and assembles the grid with the last row", async () => {
    const owner = await makeUser("recorder");
    const started = await call(mapsRoute.POST, "POST", "/api/maps", { as: owner, body: { document: defaultScenarioDocument(), ...smallMapRequest() } });
    const id: string = started.body.map.id;
    const row0 = { row: 0, log10: [-20, -21], gaps: [] };
    expect(await recordMapRow(getDb(), id, row0)).toBe(true);
    expect(await recordMapRow(getDb(), id, row0)).toBe(true);
    expect((await getMap(owner, id)).body.map.progress.rowsDone).toBe(1);
    expect((await getMap(owner, id, { format: "csv" })).status).toBe(409);
    expect(await recordMapRow(getDb(), id, { row: 1, log10: [-19, null], gaps: [] })).toBe(true);
    const done = (await getMap(owner, id)).body.map;
    expect(done.status).toBe("done");
    expect(done.result.log10).toEqual([[-20, -21], [-19, null]]);
    // Linear spacing: from + (to − from)·j/(n − 1).
    expect(done.result.y.values).toEqual([1e-2, 1e-1]);
    // A late copy of a row of a finished map changes nothing.
    expect(await recordMapRow(getDb(), id, row0)).toBe(false);
  });
});

describe("refusals", () => {
  const post = (user: TestUser | null, body: unknown) => call(mapsRoute.POST, "POST", "/api/maps", { as: user, body });

  it("names the field of a map that cannot be made", async () => {
    const owner = await makeUser("refused");
    const same = await post(owner, { document: defaultScenarioDocument(), ...smallMapRequest(), y: { ...smallMapRequest().x } });
    expect(same.status).toBe(400);
    expect(same.body.error.fields).toEqual([{ path: "y.parameter", message: expect.stringMatching(/different/) }]);
    const flat = await post(owner, { document: defaultScenarioDocument(), ...smallMapRequest(), y: { parameter: "lab-distance", from: 1, to: 10, points: 2 } });
    expect(flat.status).toBe(400);
    expect(flat.body.error.fields[0].path).toBe("document.background.kind");
    const tooMany = await post(owner, { document: defaultScenarioDocument(), ...smallMapRequest(), x: { ...smallMapRequest().x, points: 201 } });
    expect(tooMany.status).toBe(400);
    expect(tooMany.body.error.fields[0].path).toBe("x.points");
    const negativeLog = await post(owner, { document: defaultScenarioDocument(), ...smallMapRequest(), x: { ...smallMapRequest().x, from: -1 } });
    expect(negativeLog.status).toBe(400);
    expect(negativeLog.body.error.fields[0].path).toBe("x.from");
    const both = await post(owner, { document: defaultScenarioDocument(), scenario: { projectId: f.projectId, scenarioId: f.scenarioId }, ...smallMapRequest() });
    expect(both.status).toBe(400);
  });

  it(`lets one account run ${MAX_ACTIVE_MAPS} maps at once, then answers 429`, async () => {
    const owner = await makeUser("busy");
    for (let i = 0; i < MAX_ACTIVE_MAPS; i++) expect((await post(owner, { document: defaultScenarioDocument(), ...smallMapRequest() })).status).toBe(202);
    const over = await post(owner, { document: defaultScenarioDocument(), ...smallMapRequest() });
    expect(over.status).toBe(429);
    expect(over.headers.get("retry-after")).toBe("30");
  });
});

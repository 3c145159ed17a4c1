/**
 * `branchline pull` / `push`, `sweep --remote` and `map --remote` (with a real map worker) over real HTTP with a personal API token, against the route
 * handlers on the real PostgreSQL: a small HTTP server in the test hands each request to its route module (the
 * same handlers `next start` serves), and the command line runs in-process with BRANCHLINE_URL pointing at it.
 */
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from "node:fs";
import { createServer, type Server } from "node:http";
import type { AddressInfo } from "node:net";
import os from "node:os";
import path from "node:path";
import { NextRequest } from "next/server";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { getDb } from "@/db";
import { createApiToken } from "@/db/api-tokens";
import { updateScenario } from "@/db/scenarios";
import * as scenarioRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/route";
import * as scenariosRoute from "@/app/api/projects/[projectId]/scenarios/route";
import * as sweepsRoute from "@/app/api/sweeps/route";
import * as mapRoute from "@/app/api/maps/[mapId]/route";
import * as mapsRoute from "@/app/api/maps/route";
import * as scenarioMapsRoute from "@/app/api/projects/[projectId]/scenarios/[scenarioId]/maps/route";
import { stopMapSender } from "@/lib/map-queue";
import { EXIT } from "@/scripts/cli/failure";
import { main } from "@/scripts/cli/main";
import { projectFixture, type ProjectFixture } from "./fixtures";
import { call } from "./harness";
import { ready, startWorker, stopWorkers } from "./map-workers";

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string>> }) => Promise<Response>;

/** The routes the command line uses, as next's router would find them. */
const routes: { pattern: RegExp; names: string[]; module: Record<string, unknown> }[] = [
  { pattern: /^\/api\/projects\/([^/]+)\/scenarios\/([^/]+)$/, names: ["projectId", "scenarioId"], module: scenarioRoute },
  { pattern: /^\/api\/projects\/([^/]+)\/scenarios$/, names: ["projectId"], module: scenariosRoute },
  { pattern: /^\/api\/sweeps$/, names: [], module: sweepsRoute },
  { pattern: /^\/api\/maps$/, names: [], module: mapsRoute },
  { pattern: /^\/api\/maps\/([^/]+)$/, names: ["mapId"], module: mapRoute },
];

let server: Server;
let url: string;

beforeAll(async () => {
  server = createServer(async (req, res) => {
    const address = new URL(req.url ?? "/", "http://127.0.0.1");
    const route = routes.find((r) => r.pattern.test(address.pathname));
    const handler = route?.module[req.method ?? "GET"] as Handler | undefined;
    if (!route || !handler) {
      res.writeHead(404).end(JSON.stringify({ error: { code: "not_found", message: "no such route in the test server" } }));
      return;
    }
    const match = route.pattern.exec(address.pathname)!;
    const params = Object.fromEntries(route.names.map((name, i) => [name, decodeURIComponent(match[i + 1])]));
    const chunks: Buffer[] = [];
    for await (const chunk of req) chunks.push(chunk as Buffer);
    const body = chunks.length > 0 ? Buffer.concat(chunks) : undefined;
    const request = new NextRequest(new URL(req.url ?? "/", "http://localhost:3999"), { method: req.method, headers: req.headers as Record<string, string>, body });
    const answer = await handler(request, { params: Promise.resolve(params) });
    res.writeHead(answer.status, Object.fromEntries(answer.headers));
    res.end(Buffer.from(await answer.arrayBuffer()));
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  url = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
});

afterAll(async () => {
  await stopWorkers();
  await stopMapSender();
  await new Promise<void>((resolve) => server.close(() => resolve()));
}, 60_000);

async function cli(argv: string[], token: string) {
  let stdout = "";
  let stderr = "";
  const saved = { url: process.env.BRANCHLINE_URL, token: process.env.BRANCHLINE_TOKEN };
  process.env.BRANCHLINE_URL = url;
  process.env.BRANCHLINE_TOKEN = token;
  try {
    const code = await main(argv, { stdout: { write: (c: string | Uint8Array) => (stdout += String(c)) }, stderr: { write: (c: string) => (stderr += c) } });
    return { code, stdout, stderr };
  } finally {
    process.env.BRANCHLINE_URL = saved.url;
    process.env.BRANCHLINE_TOKEN = saved.token;
  }
}

async function editorToken(f: ProjectFixture, scope: "read" | "read-write") {
  return (await createApiToken(getDb(), { userId: f.users.editor.id, siteRole: "member" }, { name: "cli", scope, expiresInDays: 1 })).token;
}

describe("branchline pull and push over HTTP", () => {
  it("pulls a project's scenarios, pushes a change as a new version, and refuses a stale push without overwriting", async () => {
    const f = await projectFixture();
    const token = await editorToken(f, "read-write");
    const dir = mkdtempSync(path.join(os.tmpdir(), "branchline-pull-"));
    try {
      const pulled = await cli(["pull", f.projectId, "--dir", dir, "--format", "json"], token);
      expect(pulled.code, pulled.stderr).toBe(EXIT.ok);
      const [line] = JSON.parse(pulled.stdout).scenarios;
      expect(line).toMatchObject({ scenario: "Fixture scenario", version: 1, outcome: "pulled" });
      const file = path.join(dir, line.file);
      const scenarioFile = JSON.parse(readFileSync(file, "utf8"));
      expect(scenarioFile.format).toBe("branchline-scenario");

      // Nothing changed: nothing to push.
      expect((await cli(["push", "--dir", dir], token)).stdout).toContain("nothing changed");

      // A change here becomes version 2 on the server.
      scenarioFile.document.separation.distanceMetres *= 2;
      writeFileSync(file, JSON.stringify(scenarioFile, null, 2));
      const pushed = await cli(["push", "--dir", dir, "--format", "json"], token);
      expect(pushed.code, pushed.stderr).toBe(EXIT.ok);
      expect(JSON.parse(pushed.stdout).scenarios[0]).toMatchObject({ version: 2, outcome: "pushed as version 2" });
      const stored = await getDb().selectFrom("scenarios").select(["version", "document"]).where("id", "=", f.scenarioId).executeTakeFirstOrThrow();
      expect(stored.version).toBe(2);
      expect((stored.document as { separation: { distanceMetres: number } }).separation.distanceMetres).toBe(scenarioFile.document.separation.distanceMetres);

      // Someone saves in the browser (version 3); a further change here is stale and is refused, naming the versions.
      await updateScenario(getDb(), { userId: f.users.owner.id, siteRole: "member" }, f.projectId, f.scenarioId, { version: 2, title: "Renamed in the browser" });
      scenarioFile.document.separation.distanceMetres *= 3;
      writeFileSync(file, JSON.stringify(scenarioFile, null, 2));
      const stale = await cli(["push", "--dir", dir], token);
      expect(stale.code).toBe(EXIT.stale);
      expect(stale.stdout).toContain("refused as stale: the server has version 3, saved after version 2 was pulled");
      expect(stale.stderr).toContain("refused as stale");
      const after = await getDb().selectFrom("scenarios").select(["version", "title"]).where("id", "=", f.scenarioId).executeTakeFirstOrThrow();
      expect(after).toEqual({ version: 3, title: "Renamed in the browser" });

      // Pull keeps the local change rather than overwrite it.
      const again = await cli(["pull", f.projectId, "--dir", dir], token);
      expect(again.stdout).toContain("kept: changed here since version 2 was pulled");
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it("creates a scenario from a new file, and exits 4 when the token may not write", async () => {
    const f = await projectFixture();
    const dir = mkdtempSync(path.join(os.tmpdir(), "branchline-push-"));
    try {
      const writer = await editorToken(f, "read-write");
      expect((await cli(["pull", f.projectId, "--dir", dir], writer)).code).toBe(EXIT.ok);
      const pulledName = JSON.parse(readFileSync(path.join(dir, ".branchline.json"), "utf8")).scenarios[0].file;
      const copy = JSON.parse(readFileSync(path.join(dir, pulledName), "utf8"));
      writeFileSync(path.join(dir, "second-pair.json"), JSON.stringify({ ...copy, title: "Second pair" }));
      const reader = await editorToken(f, "read");
      const refused = await cli(["push", "--dir", dir], reader);
      expect(refused.code).toBe(EXIT.refused);
      expect(refused.stderr).toContain("403");
      const created = await cli(["push", "--dir", dir, "--format", "json"], writer);
      expect(created.code, created.stderr).toBe(EXIT.ok);
      expect(JSON.parse(created.stdout).scenarios[0]).toMatchObject({ file: "second-pair.json", scenario: "Second pair", version: 1, outcome: "created" });
      const titles = await getDb().selectFrom("scenarios").select("title").where("projectId", "=", f.projectId).execute();
      expect(titles.map((t) => t.title).sort()).toEqual(["Fixture scenario", "Second pair"]);
      expect((await cli(["pull", f.projectId, "--dir", dir], "bltok_not-a-real-token")).code).toBe(EXIT.refused);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it("sweeps on the server with --remote and answers what the local sweep answers", async () => {
    const f = await projectFixture();
    const token = await editorToken(f, "read");
    const example = path.resolve(__dirname, "../../examples/minkowski.json");
    const args = ["sweep", example, "--vary", "hold-time", "--from", "1 ms", "--to", "10 ms", "--points", "3"];
    const remote = await cli([...args, "--remote"], token);
    expect(remote.code, remote.stderr).toBe(EXIT.ok);
    const local = await cli(args, token);
    expect(JSON.parse(remote.stdout)).toEqual(JSON.parse(local.stdout));
  });

  it("maps on the server with --remote through the queue and a real worker, as the local map does; --scenario keeps the map with the saved scenario", async () => {
    const f = await projectFixture();
    const worker = startWorker();
    await ready(worker);
    const token = await editorToken(f, "read-write");
    const example = path.resolve(__dirname, "../../examples/minkowski.json");
    const axes = ["--x", "recombination-time", "--x-from", "1 ms", "--x-to", "10 ms", "--x-points", "3", "--y", "hold-time", "--y-from", "10 ms", "--y-to", "100 ms", "--y-points", "2"];
    const remote = await cli(["map", example, ...axes, "--remote"], token);
    expect(remote.code, remote.stderr).toBe(EXIT.ok);
    expect(remote.stderr).toMatch(/map \S+ queued at http:\/\/127\.0\.0\.1:\d+\/api\/maps\//);
    const local = await cli(["map", example, ...axes], token);
    expect(JSON.parse(remote.stdout)).toEqual(JSON.parse(local.stdout));

    const kept = await cli(["map", "--remote", "--scenario", `${f.projectId}/${f.scenarioId}`, ...axes, "--format", "csv"], token);
    expect(kept.code, kept.stderr).toBe(EXIT.ok);
    const id = /^# map: (\S+)/m.exec(kept.stdout)?.[1];
    expect(id).toBeTruthy();
    const listed = await call(scenarioMapsRoute.GET, "GET", `/api/projects/${f.projectId}/scenarios/${f.scenarioId}/maps`, { as: f.users.editor, params: { projectId: f.projectId, scenarioId: f.scenarioId } });
    expect(listed.body.maps.map((m: { id: string }) => m.id)).toContain(id);
    expect(kept.stdout.split("\r\n").filter((line) => line && !line.startsWith("#"))).toHaveLength(1 + 6);

    // A read-only token may not start a map of a saved scenario (an editor's right): refused, exit 4.
    const readOnly = await cli(["map", "--remote", "--scenario", `${f.projectId}/${f.scenarioId}`, ...axes], await editorToken(f, "read"));
    expect(readOnly.code).toBe(EXIT.refused);
  }, 120_000);
});

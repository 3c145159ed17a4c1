/**
 * Load bench (`npm run bench:load`): prints figures, asserts nothing. On loopback only.
 *
 * Seeds a project with 10,000 scenarios (one INSERT … SELECT over generate_series) and a member to read it, then
 * drives the server with autocannon, BENCH_SECONDS (20) per run, 50 connections in all:
 *   1. the project's scenario list (GET /api/projects/{id}/scenarios, the first page as the project page asks);
 *   2. POST /api/compute with the default scenario document;
 *   3. both at once, 25 connections each.
 * It prints requests per second, p50, p99 and the slowest request per route and run, against the targets
 * (compute p99 < 100 ms and list p99 < 100 ms while the other runs; no request slower than 1 s), and deletes what
 * it seeded (the project with its scenarios, the member) however it ends.
 *
 * The server: BRANCH_URL when set (a running production server on loopback, with the same DATABASE_URL and
 * NEXTAUTH_SECRET as this process: the bench signs its member in with a session cookie it makes itself), else one
 * it starts from the production build (`next build` first when there is none) on BENCH_PORT (PORT + 1, or 3001)
 * and stops afterwards. Computations are sent signed in: anonymous ones are rate-limited per address, and one
 * address would meet the limit in a second.
 */
import { spawn, type ChildProcess } from "node:child_process";
import { existsSync, readFileSync } from "node:fs";
import path from "node:path";
import autocannon from "autocannon";
import { sql } from "kysely";
import { databaseUrl } from "../../db/config";
import { createDb } from "../../db/connect";
import { createProject } from "../../db/projects";
import { createUser } from "../../db/users";
import { defaultScenarioDocument } from "../../physics/scenario/schema";
import { sessionCookie } from "../integration/harness";

const ROOT = path.resolve(__dirname, "../..");
const SCENARIOS = 10_000;
const CONNECTIONS = 50;
const SECONDS = Number(process.env.BENCH_SECONDS ?? 20);
const TARGET_P99_MS = 100;
const TARGET_MAX_MS = 1000;

function secret(): string {
  if (process.env.NEXTAUTH_SECRET) return process.env.NEXTAUTH_SECRET;
  const file = path.join(ROOT, ".data", "nextauth-secret");
  if (existsSync(file)) return readFileSync(file, "utf8").trim();
  return "branchline-load-bench-secret";
}

function assertLoopback(url: string): void {
  const host = new URL(url).hostname;
  if (!["localhost", "127.0.0.1", "[::1]", "::1"].includes(host)) throw new Error(`the load bench runs on loopback only; ${url} is not`);
}

async function waitFor(url: string, init: RequestInit, ok: (res: Response) => boolean, seconds: number): Promise<void> {
  const deadline = Date.now() + seconds * 1000;
  for (;;) {
    try {
      const res = await fetch(url, init);
      if (ok(res)) return;
    } catch {
      /* not listening yet */
    }
    if (Date.now() > deadline) throw new Error(`${url} did not answer within ${seconds} s`);
    await new Promise((resolve) => setTimeout(resolve, 500));
  }
}

function run(command: string, args: string[], env: NodeJS.ProcessEnv): Promise<void> {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { cwd: ROOT, env, stdio: ["ignore", "inherit", "inherit"] });
    child.on("exit", (code) => (code === 0 ? resolve() : reject(new Error(`${command} ${args.join(" ")} exited with ${code}`))));
  });
}

/** A production server of this checkout, started for the bench. */
async function startServer(env: NodeJS.ProcessEnv): Promise<{ url: string; child: ChildProcess }> {
  if (!existsSync(path.join(ROOT, ".next", "BUILD_ID"))) {
    console.log("no production build: running next build (minutes on a busy machine)");
    await run(path.join(ROOT, "node_modules/.bin/next"), ["build"], env);
  }
  const port = process.env.BENCH_PORT ?? String(Number(process.env.PORT ?? 3000) + 1);
  const url = `http://127.0.0.1:${port}`;
  const child = spawn(path.join(ROOT, "node_modules/.bin/next"), ["start", "-H", "127.0.0.1", "-p", port], {
    cwd: ROOT,
    env: { ...env, NEXTAUTH_URL: url, NODE_ENV: "production" },
    stdio: ["ignore", "ignore", "inherit"],
  });
  return { url, child };
}

interface Figures {
  label: string;
  requestsPerSecond: number;
  p50: number;
  p99: number;
  max: number;
  non2xx: number;
  errors: number;
}

function cannon(label: string, url: string, options: Partial<autocannon.Options>): Promise<Figures> {
  return new Promise((resolve, reject) => {
    autocannon({ url, connections: CONNECTIONS, duration: SECONDS, timeout: 10, ...options }, (error, result) => {
      if (error) return reject(error);
      resolve({
        label,
        requestsPerSecond: result.requests.average,
        p50: result.latency.p50,
        p99: result.latency.p99,
        max: result.latency.max,
        non2xx: result.non2xx,
        errors: result.errors + result.timeouts,
      });
    });
  });
}

function report(figures: Figures, targetP99: boolean): string {
  const p99 = targetP99 ? `${figures.p99 < TARGET_P99_MS ? "meets" : "misses"} p99 < ${TARGET_P99_MS} ms` : "";
  const max = `${figures.max < TARGET_MAX_MS ? "meets" : "misses"} max < ${TARGET_MAX_MS} ms`;
  return (
    `${figures.label.padEnd(34)} ${figures.requestsPerSecond.toFixed(0).padStart(6)} req/s   p50 ${String(figures.p50).padStart(5)} ms   ` +
    `p99 ${String(figures.p99).padStart(5)} ms   max ${String(figures.max).padStart(5)} ms   non-2xx ${figures.non2xx}   errors ${figures.errors}   ${[p99, max].filter(Boolean).join(", ")}`
  );
}

async function main(): Promise<void> {
  const env = { ...process.env, DATABASE_URL: databaseUrl(), NEXTAUTH_SECRET: secret() };
  const db = createDb(env.DATABASE_URL, 4);
  let server: ChildProcess | null = null;
  let seeded: { userId: string; projectId: string } | null = null;
  const stop = () => {
    if (server && server.exitCode === null) server.kill("SIGTERM");
  };
  process.on("SIGINT", () => {
    stop();
    process.exitCode = 130;
  });
  try {
    const started = Date.now();
    const user = await createUser(db, { email: `load-bench-${Date.now()}@example.test`, name: "Load bench" });
    const project = await createProject(db, { userId: user.id, siteRole: "member" }, { name: "Load bench (deleted when it ends)" });
    seeded = { userId: user.id, projectId: project.id };
    const document = JSON.stringify(defaultScenarioDocument());
    await sql`
      insert into scenarios (project_id, title, document, schema_version, background_kind, created_by, updated_by, updated_at)
      select ${project.id}::uuid, 'Bench scenario ' || n, ${document}::jsonb, 1, 'minkowski', ${user.id}::uuid, ${user.id}::uuid,
             now() - make_interval(secs => n)
      from generate_series(1, ${SCENARIOS}) as n`.execute(db);
    console.log(`seeded ${SCENARIOS.toLocaleString("en")} scenarios in one project in ${((Date.now() - started) / 1000).toFixed(1)} s`);

    let base = process.env.BRANCH_URL?.replace(/\/$/, "");
    if (!base) {
      const started = await startServer(env);
      server = started.child;
      base = started.url;
    }
    assertLoopback(base);
    const cookie = await sessionCookie(user.id);
    const listUrl = `${base}/api/projects/${project.id}/scenarios`;
    const computeUrl = `${base}/api/compute`;
    const list = { method: "GET" as const, headers: { cookie } };
    const compute = { method: "POST" as const, headers: { cookie, "content-type": "application/json" }, body: document };
    // Ready when the list answers and the compute pool has loaded (its first answer waits for the threads).
    await waitFor(listUrl, list, (res) => res.status === 200, 180);
    await waitFor(computeUrl, compute, (res) => res.status === 200, 180);
    console.log(`server ${base} ready; ${CONNECTIONS} connections, ${SECONDS} s per run\n`);

    const listAlone = await cannon("scenario list, alone", listUrl, list);
    console.log(report(listAlone, false));
    const computeAlone = await cannon("POST /api/compute, alone", computeUrl, compute);
    console.log(report(computeAlone, false));
    const [listMixed, computeMixed] = await Promise.all([
      cannon("scenario list, with compute", listUrl, { ...list, connections: CONNECTIONS / 2 }),
      cannon("POST /api/compute, with the list", computeUrl, { ...compute, connections: CONNECTIONS / 2 }),
    ]);
    console.log(report(listMixed, true));
    console.log(report(computeMixed, true));
  } finally {
    stop();
    if (seeded) {
      await db.deleteFrom("projects").where("id", "=", seeded.projectId).execute();
      await db.deleteFrom("users").where("id", "=", seeded.userId).execute();
      console.log("\ndeleted the seeded project, its scenarios and its member");
    }
    await db.destroy();
  }
}

main().catch((error) => {
  console.error(error);
  process.exitCode = 1;
});

/**
 * `branchline pull PROJECT_ID` and `branchline push`: a project's scenarios as scenario files in a folder, kept in
 * step with the server over HTTP (BRANCHLINE_URL, BRANCHLINE_TOKEN). The folder's `.branchline.json` remembers,
 * per file, the scenario and the version it was pulled (or last pushed) at, and a fingerprint of its content then.
 *
 * pull writes every scenario of the project, but never over a file changed here since it was pulled (it says so).
 * push sends each changed file as a new version of its scenario, with the version it was pulled at: the server
 * refuses a stale one (409: someone saved the scenario since), and push then says which, overwrites nothing, and
 * exits with code 3; pull again and redo the change. A scenario file not yet in the folder's record becomes a new
 * scenario of the project.
 */
import { createHash } from "node:crypto";
import { existsSync, mkdirSync, readdirSync, readFileSync, writeFileSync } from "node:fs";
import path from "node:path";
import { parseScenarioFileText, scenarioFileName, scenarioFileText, toScenarioFile } from "../../../physics/scenario/exchange";
import type { ScenarioDocument } from "../../../physics/scenario/schema";
import { refuse, refuseIssues, type InputIssue } from "../../scenario-input";
import { outputFormat, readArgs } from "../args";
import { CommandFailure, EXIT } from "../failure";
import { json, table } from "../output";
import { remoteFromEnv, requireToken, send, type Remote } from "../remote";

export const MANIFEST = ".branchline.json";

export const pullUsage = [
  "usage: branchline pull PROJECT_ID [--dir DIR] [--format table|json]",
  "  Writes every scenario of the project as a scenario file in DIR (default: project-<first 8 of the id>), and",
  `  records each one's version in DIR/${MANIFEST}. A file changed here since the last pull is left as it is.`,
  "  Reads BRANCHLINE_URL (default http://localhost:3000) and BRANCHLINE_TOKEN (a personal API token).",
];

export const pushUsage = [
  "usage: branchline push [--dir DIR] [--format table|json]",
  "  Sends every file of DIR (default .) changed since it was pulled as a new version of its scenario, with the",
  "  version it was pulled at: a scenario saved on the server since is refused as stale (exit code 3) and its file",
  "  is left as it is; pull again to take the server's version. Files not yet in the record become new scenarios.",
  "  Needs a read-and-write token in BRANCHLINE_TOKEN.",
];

interface ManifestEntry {
  file: string;
  scenarioId: string;
  title: string;
  version: number;
  fingerprint: string;
}

interface Manifest {
  url: string;
  projectId: string;
  scenarios: ManifestEntry[];
}

interface ScenarioAnswer {
  id: string;
  title: string;
  version: number;
  document: ScenarioDocument | null;
}

interface SyncLine {
  file: string;
  scenario: string;
  version: number | null;
  outcome: string;
}

const fingerprint = (text: string) => createHash("sha256").update(text).digest("hex");

function readManifest(dir: string): Manifest | null {
  const file = path.join(dir, MANIFEST);
  if (!existsSync(file)) return null;
  try {
    return JSON.parse(readFileSync(file, "utf8")) as Manifest;
  } catch (error) {
    refuse([`${file} cannot be read: ${(error as Error).message}`]);
  }
}

function writeManifest(dir: string, manifest: Manifest): void {
  writeFileSync(path.join(dir, MANIFEST), json(manifest));
}

function report(lines: SyncLine[], format: "json" | "table" | "csv"): string {
  if (format === "json") return json({ scenarios: lines });
  return table([["file", "scenario", "version", "outcome"], ...lines.map((l) => [l.file, l.scenario, l.version === null ? "" : String(l.version), l.outcome])]);
}

/** Every scenario of the project, a page at a time. */
async function listAll(remote: Remote, projectId: string): Promise<{ id: string }[]> {
  const items: { id: string }[] = [];
  for (let page = 1; ; page++) {
    const answer = (await send(remote, "GET", `/api/projects/${encodeURIComponent(projectId)}/scenarios?page=${page}&pageSize=100&sort=createdAt&order=asc`)).json<{ items: { id: string }[]; total: number }>();
    items.push(...answer.items);
    if (answer.items.length === 0 || items.length >= answer.total) return items;
  }
}

/** A free file name in the folder for a title (a number added when taken). */
function freeName(dir: string, title: string, taken: Set<string>): string {
  const base = scenarioFileName(title, "json").replace(/\.json$/, "");
  for (let n = 1; ; n++) {
    const name = n === 1 ? `${base}.json` : `${base}-${n}.json`;
    if (!taken.has(name) && !existsSync(path.join(dir, name))) return name;
  }
}

export async function pullCommand(argv: string[]): Promise<string> {
  const args = readArgs(argv, { dir: { type: "string" }, format: { type: "string" } }, pullUsage);
  if (args.positionals.length !== 1) refuse(pullUsage);
  const issues: InputIssue[] = [];
  const format = outputFormat(args.values.format, issues, "table");
  if (issues.length > 0) refuseIssues("the options cannot be used:", issues);
  const projectId = args.positionals[0];
  const dir = path.resolve(args.values.dir ?? `project-${projectId.slice(0, 8)}`);
  const remote = requireToken(remoteFromEnv());
  const previous = readManifest(dir);
  if (previous && previous.projectId !== projectId) refuse([`${dir} holds project ${previous.projectId}, not ${projectId}: pull into another --dir`]);
  mkdirSync(dir, { recursive: true });
  const manifest: Manifest = { url: remote.url, projectId, scenarios: [] };
  const known = new Map((previous?.scenarios ?? []).map((e) => [e.scenarioId, e]));
  const taken = new Set((previous?.scenarios ?? []).map((e) => e.file));
  const lines: SyncLine[] = [];
  for (const { id } of await listAll(remote, projectId)) {
    const scenario = (await send(remote, "GET", `/api/projects/${encodeURIComponent(projectId)}/scenarios/${encodeURIComponent(id)}`)).json<{ scenario: ScenarioAnswer }>().scenario;
    const entry = known.get(id);
    const file = entry?.file ?? freeName(dir, scenario.title, taken);
    taken.add(file);
    const target = path.join(dir, file);
    if (entry && existsSync(target) && fingerprint(readFileSync(target, "utf8")) !== entry.fingerprint) {
      manifest.scenarios.push(entry);
      lines.push({ file, scenario: scenario.title, version: entry.version, outcome: `kept: changed here since version ${entry.version} was pulled (push it, or delete the file to take version ${scenario.version})` });
      continue;
    }
    if (!scenario.document) {
      lines.push({ file: "", scenario: scenario.title, version: scenario.version, outcome: "skipped: this version of Branchline cannot read its stored document" });
      continue;
    }
    const text = scenarioFileText(toScenarioFile({ title: scenario.title, document: scenario.document }));
    writeFileSync(target, text);
    manifest.scenarios.push({ file, scenarioId: id, title: scenario.title, version: scenario.version, fingerprint: fingerprint(text) });
    lines.push({ file, scenario: scenario.title, version: scenario.version, outcome: entry?.version === scenario.version ? "unchanged" : "pulled" });
  }
  writeManifest(dir, manifest);
  return report(lines, format);
}

export async function pushCommand(argv: string[]): Promise<string> {
  const args = readArgs(argv, { dir: { type: "string" }, format: { type: "string" } }, pushUsage);
  if (args.positionals.length !== 0) refuse(pushUsage);
  const issues: InputIssue[] = [];
  const format = outputFormat(args.values.format, issues, "table");
  if (issues.length > 0) refuseIssues("the options cannot be used:", issues);
  const dir = path.resolve(args.values.dir ?? ".");
  const manifest = readManifest(dir);
  if (!manifest) refuse([`${dir} has no ${MANIFEST}: pull a project into it first (branchline pull PROJECT_ID --dir ${args.values.dir ?? "."})`]);
  const remote = requireToken(remoteFromEnv());
  const base = `/api/projects/${encodeURIComponent(manifest.projectId)}/scenarios`;
  const lines: SyncLine[] = [];
  let stale = 0;
  const recorded = new Set(manifest.scenarios.map((e) => e.file));
  const files = readdirSync(dir).filter((f) => f.endsWith(".json") && f !== MANIFEST);
  for (const file of files) {
    const text = readFileSync(path.join(dir, file), "utf8");
    const entry = manifest.scenarios.find((e) => e.file === file);
    if (entry && fingerprint(text) === entry.fingerprint) continue;
    const parsed = parseScenarioFileText(text);
    if (!parsed.ok) refuseIssues(`${file} is not a scenario file Branchline can read:`, parsed.issues);
    if (!entry) {
      const created = (await send(remote, "POST", base, { title: parsed.title, document: parsed.document })).json<{ scenario: ScenarioAnswer }>().scenario;
      manifest.scenarios.push({ file, scenarioId: created.id, title: created.title, version: created.version, fingerprint: fingerprint(text) });
      lines.push({ file, scenario: created.title, version: created.version, outcome: "created" });
      continue;
    }
    const answer = await send(remote, "PUT", `${base}/${encodeURIComponent(entry.scenarioId)}`, { version: entry.version, title: parsed.title, document: parsed.document }, [409]);
    if (answer.status === 409) {
      stale += 1;
      const current = answer.json<{ error?: { currentVersion?: number } }>().error?.currentVersion;
      const since = current ? `the server has version ${current}, saved after version ${entry.version} was pulled` : `the scenario was saved on the server after version ${entry.version}`;
      lines.push({ file, scenario: entry.title, version: entry.version, outcome: `refused as stale: ${since}; pull again and redo your change` });
      continue;
    }
    const saved = answer.json<{ scenario: ScenarioAnswer }>().scenario;
    Object.assign(entry, { title: saved.title, version: saved.version, fingerprint: fingerprint(text) });
    lines.push({ file, scenario: saved.title, version: saved.version, outcome: `pushed as version ${saved.version}` });
  }
  const missing = manifest.scenarios.filter((e) => recorded.has(e.file) && !files.includes(e.file));
  for (const e of missing) lines.push({ file: e.file, scenario: e.title, version: e.version, outcome: "not here: left alone on the server (push never deletes)" });
  writeManifest(dir, manifest);
  const output = report(lines.length > 0 ? lines : [{ file: "", scenario: "", version: null, outcome: "nothing changed since the last pull" }], format);
  if (stale > 0) {
    const what = stale === 1 ? "1 scenario was refused as stale" : `${stale} scenarios were refused as stale`;
    throw new CommandFailure(EXIT.stale, [`${what}: changed on the server since pulled; nothing of it was overwritten (pull again, then redo the change)`], output);
  }
  return output;
}

import { spawnSync } from "node:child_process";
import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { computeScenarioFromJson } from "@/physics/compute";
import { sources } from "@/physics/estimators/sources";
import { CURRENT_SCHEMA_VERSION, defaultScenarioDocument, parseScenarioDocument } from "@/physics/scenario/schema";

const root = path.resolve(__dirname, "../../..");
const examplesDir = path.join(root, "examples");

function everySourceKey(value: unknown, keys: string[] = []): string[] {
  if (Array.isArray(value)) value.forEach((v) => everySourceKey(v, keys));
  else if (value && typeof value === "object") {
    for (const [k, v] of Object.entries(value)) {
      if (k === "sourceKey" && typeof v === "string") keys.push(v);
      else everySourceKey(v, keys);
    }
  }
  return keys;
}

describe("scenario documents and computeScenarioFromJson", () => {
  it("reads a version-1 document written before the numerics block existed", () => {
    const { numerics: _numerics, ...older } = defaultScenarioDocument();
    const parsed = parseScenarioDocument(older);
    expect(parsed.ok && parsed.document.numerics).toEqual({ kinkTimeResolutionSeconds: null });
    expect(CURRENT_SCHEMA_VERSION).toBe(3);
  });

  it("answers a document from a newer Branchline, or a malformed one, with {path, message} issues", () => {
    const newer = computeScenarioFromJson({ ...defaultScenarioDocument(), schemaVersion: 99 });
    expect(newer).toEqual({ ok: false, issues: [{ path: "schemaVersion", message: expect.stringMatching(/newer/) }] });
    const bad = computeScenarioFromJson({ ...defaultScenarioDocument(), separation: { axis: "sideways", split: "symmetric", distanceMetres: -1 } });
    expect(bad.ok).toBe(false);
    if (!bad.ok) expect(bad.issues.map((i) => i.path).sort()).toEqual(["separation.axis", "separation.distanceMetres"]);
    expect(computeScenarioFromJson("not an object")).toEqual({ ok: false, issues: [{ path: "", message: expect.any(String) }] });
  });

  it("turns documents that parse but cannot be computed into issues with their paths", () => {
    const doc = defaultScenarioDocument();
    const cases: [unknown, string][] = [
      [{ ...doc, background: { kind: "schwarzschild", massKg: 1e31 } }, "lab.placement"],
      [{ ...doc, background: { kind: "schwarzschild", massKg: 1e31 }, lab: { placement: "areal-radius", arealRadiusMetres: 1 } }, "lab.arealRadiusMetres"],
      [{ ...doc, protocol: { kind: "formula", expression: 'import("fs")', durationSeconds: 1 } }, "protocol.expression"],
      [{ ...doc, protocol: { kind: "formula", expression: "log(t - 0.5)", durationSeconds: 1 } }, "protocol.expression"],
    ];
    for (const [input, pathOfIssue] of cases) {
      const outcome = computeScenarioFromJson(input);
      expect(outcome.ok).toBe(false);
      if (!outcome.ok) expect(outcome.issues[0].path).toBe(pathOfIssue);
    }
  });

  it("computes every example, one per background, with every number keyed to an entry of the sources table", () => {
    const files = readdirSync(examplesDir).filter((f) => f.endsWith(".json"));
    const kinds = new Set<string>();
    for (const file of files) {
      const outcome = computeScenarioFromJson(JSON.parse(readFileSync(path.join(examplesDir, file), "utf8")));
      expect(outcome.ok, file).toBe(true);
      if (!outcome.ok) continue;
      kinds.add(outcome.result.background.kind);
      for (const key of everySourceKey(outcome.result)) expect(Object.keys(sources), `${file}: ${key}`).toContain(key);
      expect(JSON.parse(JSON.stringify(outcome.result))).toEqual(outcome.result);
      expect(outcome.result.flags.map((f) => f.code)).toEqual(expect.arrayContaining(["slow-motion", "separation-vs-horizon", "sampling-converged", "kink", "schwarzschild-regime", "double-range"]));
    }
    expect([...kinds].sort()).toEqual(["de-sitter", "minkowski", "rindler", "schwarzschild"]);
  });

  it("has a CLI that prints the result JSON, and for bad input a message on stderr with exit code 2", () => {
    const run = (args: string[], input?: string) =>
      spawnSync(process.execPath, ["--import", "tsx", path.join(root, "scripts/compute.ts"), ...args], { cwd: root, input, encoding: "utf8" });
    const good = run([path.join(examplesDir, "minkowski.json")]);
    expect(good.status).toBe(0);
    expect(JSON.parse(good.stdout).background.kind).toBe("minkowski");
    const fromStdin = run(["-"], JSON.stringify(defaultScenarioDocument()));
    expect(fromStdin.status).toBe(0);
    const invalid = run(["-"], JSON.stringify({ ...defaultScenarioDocument(), source: { chargeCoulombs: "lots", massKg: 1 } }));
    expect(invalid.status).toBe(2);
    expect(invalid.stderr).toMatch(/source\.chargeCoulombs/);
    const notJson = run(["-"], "{ nope");
    expect(notJson.status).toBe(2);
    expect(notJson.stderr).toMatch(/not valid JSON/);
  }, 60_000);
});

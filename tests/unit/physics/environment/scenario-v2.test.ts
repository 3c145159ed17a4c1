import { spawnSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { computeScenarioFromJson } from "@/physics/compute";
import { parseScenarioDocument } from "@/physics/scenario/schema";

const root = path.resolve(__dirname, "../../../..");
const fixture = (name: string) => JSON.parse(readFileSync(path.join(root, "tests/unit/physics/fixtures", name), "utf8"));

function computed(input: unknown) {
  const outcome = computeScenarioFromJson(input);
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.issues));
  return outcome.result;
}

describe("scenario document version 2: the optional environment block", () => {
  it("upgrades a version-1 document to an isolated body that computes exactly as the same document written as version 2 without an environment", () => {
    const v1 = fixture("scenario-v1.json");
    expect(v1.schemaVersion).toBe(1);
    const parsed = parseScenarioDocument(v1);
    expect(parsed.ok && parsed.document.environment).toBeNull();
    const fromV1 = computed(v1);
    const asV2 = computed({ ...v1, schemaVersion: 2, environment: null });
    expect(fromV1).toEqual(asV2);
    expect(fromV1.environment).toBeNull();
    expect(fromV1.flags.some((f) => f.code.startsWith("environment:"))).toBe(false);
  });

  it("leaves the body's own field channels untouched when an environment is added, and adds its channels, total, dominant channel and margins", () => {
    const v2 = fixture("scenario-v2.json");
    const isolated = computed(fixture("scenario-v1.json"));
    const result = computed(v2);
    for (const part of ["electromagnetic", "gravitational", "combined", "background", "protocol"] as const) expect(result[part]).toEqual(isolated[part]);
    expect(result.flags.slice(0, isolated.flags.length)).toEqual(isolated.flags);
    const env = result.environment!;
    expect(env.channels.map((ch) => ch.channel)).toEqual(["gas", "thermal-scattering", "thermal-absorption", "thermal-emission", "surface"]);
    const sum = env.channels.reduce((s, ch) => s + (ch.totalQuanta.value ?? 0), 0) + (isolated.combined.totalQuanta.value ?? 0);
    expect(env.total.totalQuanta.value! / sum).toBeCloseTo(1, 10);
    const largest = [...env.channels.map((ch) => [ch.channel, ch.totalQuanta.value!] as const), ["electromagnetic", isolated.electromagnetic.totalQuanta.value!] as const].sort((a, b) => b[1] - a[1])[0][0];
    expect(env.dominantChannel).toBe(largest);
    expect(env.margins.map((m) => m.parameter)).toEqual(["gas-pressure", "surroundings-temperature", "surroundings-temperature", "internal-temperature", "surface-distance"]);
    expect(result.flags.map((f) => f.code)).toEqual(expect.arrayContaining(["environment:body-density", "environment:gas-regime", "environment:thermal-size", "environment:surface-skin-depth"]));
    expect(JSON.parse(JSON.stringify(result))).toEqual(result);
  });

  it("answers a malformed environment with the path and the reason", () => {
    const v2 = fixture("scenario-v2.json");
    const cases: [unknown, string][] = [
      [{ ...v2, environment: { ...v2.environment, body: null } }, "environment.body"],
      [{ ...v2, environment: { ...v2.environment, gas: { pressurePascals: -1, temperatureKelvin: 4, species: "He" } } }, "environment.gas.pressurePascals"],
      [{ ...v2, environment: { ...v2.environment, gas: { pressurePascals: 1, temperatureKelvin: 4, species: "Xe" } } }, "environment.gas.species"],
      [{ ...v2, environment: { ...v2.environment, surface: { ...v2.environment.surface, resistivityOhmMetres: null } } }, "environment.surface.resistivityOhmMetres"],
      [{ ...v2, environment: { ...v2.environment, body: { radiusMetres: 1e-6, material: "diamond", permittivity: { real: 5, imaginary: 0 } } } }, "environment.body.permittivity"],
      [{ ...v2, environment: { ...v2.environment, surface: { ...v2.environment.surface, distanceMetres: 1e-6 } } }, "environment.surface.distanceMetres"],
    ];
    for (const [input, issuePath] of cases) {
      const outcome = computeScenarioFromJson(input);
      expect(outcome.ok, issuePath).toBe(false);
      if (!outcome.ok) expect(outcome.issues.map((i) => i.path)).toContain(issuePath);
    }
  });

  it("returns the environment from the CLI", () => {
    const run = spawnSync(process.execPath, ["--import", "tsx", path.join(root, "scripts/compute.ts"), path.join(root, "tests/unit/physics/fixtures/scenario-v2.json")], { cwd: root, encoding: "utf8" });
    expect(run.status).toBe(0);
    expect(JSON.parse(run.stdout).environment.channels).toHaveLength(5);
  }, 60_000);
});

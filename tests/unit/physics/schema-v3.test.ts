/**
 * Schema version 3 (physics/scenario/upgrade-v3.ts): names that say what things are. Version-1 and version-2
 * documents are upgraded on read and compute the same numbers as the version-3 document written by hand.
 */
import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { computeScenarioFromJson } from "@/physics/compute";
import { parseScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";

const fixture = (version: number) => JSON.parse(readFileSync(path.join(__dirname, `fixtures/scenario-v${version}.json`), "utf8"));

function parsed(input: unknown): ScenarioDocument {
  const result = parseScenarioDocument(input);
  if (!result.ok) throw new Error(JSON.stringify(result.issues));
  return result.document;
}

/** The numbers of a computation, without the schema version the document was written in. */
function numbers(input: unknown) {
  const outcome = computeScenarioFromJson(input);
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.issues));
  const { documentSchemaVersion: _version, ...rest } = outcome.result;
  return rest;
}

const rampsV2 = (shape: string) => ({
  kind: "segments",
  separation: { durationSeconds: 0.01, shape },
  hold: { durationSeconds: 0.1 },
  recombination: { durationSeconds: 0.01, shape },
});

describe("schema version 3", () => {
  it("reads the version-3 fixture as it is", () => {
    const v3 = fixture(3);
    expect(parsed(v3)).toEqual(v3);
  });

  it("upgrades the version-1 and version-2 fixtures: 'smoothstep' is now 'cubic', and the numbers are the version-3 fixture's", () => {
    for (const version of [1, 2]) {
      const upgraded = parsed(fixture(version));
      expect(upgraded.schemaVersion).toBe(3);
      expect(upgraded.protocol).toMatchObject({ kind: "segments", separation: { shape: "cubic" } });
    }
    expect(parsed(fixture(2))).toEqual(fixture(3));
    expect(numbers(fixture(2))).toEqual(numbers(fixture(3)));
  });

  it("renames a Rindler lab's 'inertial' placement to 'uniformly-accelerated', the numbers unchanged", () => {
    const background = { kind: "rindler", accelerationMetresPerSecondSquared: 1e15 };
    const v1 = { ...fixture(1), background, lab: { placement: "inertial" } };
    const v3 = { ...fixture(3), background, lab: { placement: "uniformly-accelerated" }, environment: null };
    expect(parsed(v1).lab).toEqual({ placement: "uniformly-accelerated" });
    expect(numbers(v1)).toEqual(numbers(v3));
  });

  it("puts a de Sitter lab 'inertial' at the centre at areal radius 0, the static geodesic observer, the numbers unchanged", () => {
    const background = { kind: "de-sitter", hubbleRatePerSecond: 1e3 };
    const v2 = { ...fixture(2), background, lab: { placement: "inertial" }, environment: null, protocol: rampsV2("smoothstep") };
    const v3 = { ...fixture(3), background, lab: { placement: "areal-radius", arealRadiusMetres: 0 }, environment: null, protocol: rampsV2("cubic") };
    expect(parsed(v2).lab).toEqual({ placement: "areal-radius", arealRadiusMetres: 0 });
    expect(numbers(v2)).toEqual(numbers(v3));
    // The static geodesic observer feels no acceleration, and the Gibbons–Hawking temperature ħH/(2πk_B).
    const result = computeScenarioFromJson(v3);
    if (!result.ok) throw new Error("de Sitter centre");
    expect(result.result.background.labProperAcceleration.value).toBe(0);
    // ħ/(2πk_B) = 1.2155e-12 K s (CODATA 2018 ħ = 1.054571817e-34 J s, k_B = 1.380649e-23 J/K).
    expect(result.result.background.labLocalTemperature.value! / (1e3 * 1.054571817e-34 / (2 * Math.PI * 1.380649e-23))).toBeCloseTo(1, 8);
  });

  it("renames 'proper-distance-above-horizon' to 'proper-distance-from-horizon' on every background that has one", () => {
    for (const background of [{ kind: "schwarzschild", massKg: 2e31 }, { kind: "de-sitter", hubbleRatePerSecond: 1e3 }]) {
      const v1 = { ...fixture(1), background, lab: { placement: "proper-distance-above-horizon", properDistanceMetres: 1e5 } };
      const v3 = { ...fixture(3), background, lab: { placement: "proper-distance-from-horizon", properDistanceMetres: 1e5 }, environment: null };
      expect(parsed(v1).lab).toEqual({ placement: "proper-distance-from-horizon", properDistanceMetres: 1e5 });
      expect(numbers(v1)).toEqual(numbers(v3));
    }
  });

  it("refuses the old names in a version-3 document, with the path", () => {
    const result = parseScenarioDocument({ ...fixture(3), protocol: rampsV2("smoothstep") });
    expect(result.ok).toBe(false);
    if (!result.ok) expect(result.issues.map((i) => i.path)).toContain("protocol.separation.shape");
    const inertialRindler = computeScenarioFromJson({ ...fixture(3), background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e15 }, lab: { placement: "inertial" } });
    expect(inertialRindler).toMatchObject({ ok: false, issues: [{ path: "lab.placement" }] });
  });
});

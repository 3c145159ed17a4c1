/**
 * The parameter ranges (physics/scenario/ranges.ts): a value outside its range is refused with the field, the range
 * and the unit in words, before any computation; inside the ranges, on every background, the engine answers a
 * result without NaN or a sentence — it never throws. The ranges were found by computing each parameter over
 * decades (1e-300 to 1e300) and keeping margin inside what worked; these checks keep them honest.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeScenarioFromJson } from "@/physics/compute";
import { PARAMETER_RANGES, rangeIssues, rangeText } from "@/physics/scenario/ranges";
import { defaultScenarioDocument, parseScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";

const R = PARAMETER_RANGES;

function withBackground(kind: "minkowski" | "schwarzschild" | "rindler" | "de-sitter"): ScenarioDocument {
  const doc = defaultScenarioDocument();
  if (kind === "schwarzschild") return { ...doc, background: { kind, massKg: 2e31 }, lab: { placement: "proper-distance-from-horizon", properDistanceMetres: 1e5 } };
  if (kind === "rindler") return { ...doc, background: { kind, accelerationMetresPerSecondSquared: 9.81 }, lab: { placement: "uniformly-accelerated" } };
  if (kind === "de-sitter") return { ...doc, background: { kind, hubbleRatePerSecond: 2.2e-18 }, lab: { placement: "proper-distance-from-horizon", properDistanceMetres: 1e20 } };
  return doc;
}

function hasNaN(value: unknown): boolean {
  if (typeof value === "number") return Number.isNaN(value);
  if (value && typeof value === "object") return Object.values(value).some(hasNaN);
  return false;
}

const tiny = 1e-300;
const huge = 1e300;

describe("parameter ranges", () => {
  it.each([
    ["de-sitter", "background.hubbleRatePerSecond", (d: any, v: number) => (d.background.hubbleRatePerSecond = v)],
    ["rindler", "background.accelerationMetresPerSecondSquared", (d: any, v: number) => (d.background.accelerationMetresPerSecondSquared = v)],
    ["schwarzschild", "background.massKg", (d: any, v: number) => (d.background.massKg = v)],
    ["schwarzschild", "lab.properDistanceMetres", (d: any, v: number) => (d.lab.properDistanceMetres = v)],
    ["minkowski", "source.chargeCoulombs", (d: any, v: number) => (d.source.chargeCoulombs = v)],
    ["minkowski", "separation.distanceMetres", (d: any, v: number) => (d.separation.distanceMetres = v)],
  ] as const)("refuse 1e-300 and 1e300 for the %s %s, saying the range", (kind, path, set) => {
    for (const value of [tiny, huge]) {
      const doc = structuredClone(withBackground(kind)) as any;
      set(doc, value);
      const outcome = computeScenarioFromJson(doc);
      expect(outcome.ok).toBe(false);
      if (outcome.ok) continue;
      expect(outcome.issues).toHaveLength(1);
      expect(outcome.issues[0].path).toBe(path);
      expect(outcome.issues[0].message).toMatch(/must be .*(from|between) .*e-?\d+.* where the computation is defined/);
    }
  });

  it("refuse a hold of 1e-300 s but compute one of 1e300 s (its count is then reported by log10 alone)", () => {
    const doc = structuredClone(withBackground("minkowski"));
    const tooShort = computeScenarioFromJson({ ...doc, protocol: { ...doc.protocol, hold: { durationSeconds: tiny } } });
    expect(tooShort.ok ? [] : tooShort.issues.map((i) => i.path)).toEqual(["protocol.hold.durationSeconds"]);
    expect(computeScenarioFromJson({ ...doc, protocol: { ...doc.protocol, hold: { durationSeconds: huge } } }).ok).toBe(true);
  });

  it("say the range with its unit", () => {
    expect(rangeText(R.hubbleRate)).toBe("from 1e-40 to 1e40 s^-1");
    expect(rangeText(R.sourceMass)).toBe("from 1e-40 to 1e60 kg (or exactly 0)");
  });

  it("keep a parsed document readable (a stored document that predates them still opens)", () => {
    const doc = withBackground("rindler") as any;
    doc.background.accelerationMetresPerSecondSquared = tiny;
    expect(parseScenarioDocument(doc).ok).toBe(true);
    expect(rangeIssues(parseScenarioDocument(doc).ok ? (parseScenarioDocument(doc) as any).document : doc)).toHaveLength(1);
  });

  it("refuse a kink time resolution finer than 1e-12 of the protocol, and accept one at that bound", () => {
    const doc = withBackground("minkowski");
    const total = 0.01 + 0.1 + 0.01;
    const fine = { ...doc, numerics: { kinkTimeResolutionSeconds: 1e-300 } };
    const issues = rangeIssues(fine);
    expect(issues.map((i) => i.path)).toEqual(["numerics.kinkTimeResolutionSeconds"]);
    expect(issues[0].message).toContain("1e-12");
    expect(rangeIssues({ ...doc, numerics: { kinkTimeResolutionSeconds: total * 1e-12 } })).toEqual([]);
  });

  it("answer a result without NaN, or a sentence, for any document inside them (every background)", () => {
    const within = (r: { min: number; max: number }) => fc.double({ min: Math.log10(r.min), max: Math.log10(r.max), noNaN: true }).map((e) => 10 ** e);
    const documents = fc.oneof(
      fc.record({ m: within(R.blackHoleMass), p: within(R.properDistance) }).map(({ m, p }) => ({ ...withBackground("schwarzschild"), background: { kind: "schwarzschild" as const, massKg: m }, lab: { placement: "proper-distance-from-horizon" as const, properDistanceMetres: p } })),
      within(R.acceleration).map((a) => ({ ...withBackground("rindler"), background: { kind: "rindler" as const, accelerationMetresPerSecondSquared: a }, lab: { placement: "uniformly-accelerated" as const } })),
      fc.record({ h: within(R.hubbleRate), p: within(R.properDistance) }).map(({ h, p }) => ({ ...withBackground("de-sitter"), background: { kind: "de-sitter" as const, hubbleRatePerSecond: h }, lab: { placement: "proper-distance-from-horizon" as const, properDistanceMetres: p } })),
    );
    const sources = fc.record({ q: within(R.charge), m: within(R.sourceMass), d: within(R.separation), ramp: within(R.rampDuration), hold: within(R.holdDuration) });
    fc.assert(
      fc.property(documents, sources, (doc, s) => {
        const full: ScenarioDocument = {
          ...doc,
          source: { chargeCoulombs: s.q, massKg: s.m, labMassKg: null },
          separation: { ...doc.separation, distanceMetres: s.d },
          protocol: { kind: "segments", separation: { durationSeconds: s.ramp, shape: "minimum-jerk" }, hold: { durationSeconds: s.hold }, recombination: { durationSeconds: s.ramp, shape: "minimum-jerk" } },
        };
        const outcome = computeScenarioFromJson(full);
        if (outcome.ok) expect(hasNaN(outcome.result)).toBe(false);
        else expect(outcome.issues[0].message.length).toBeGreaterThan(10);
      }),
      { numRuns: Number(process.env.RANGE_RUNS ?? 40), seed: Number(process.env.RANGE_SEED ?? 20261205) },
    );
  }, 120_000);
});

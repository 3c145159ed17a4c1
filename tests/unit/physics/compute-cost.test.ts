import { readdirSync, readFileSync } from "node:fs";
import path from "node:path";
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics";
import { COMPUTE_COST_CEILING, computeCostRefusal, estimateComputeCost } from "@/physics/compute-cost";
import { MAX_SAMPLES } from "@/physics/estimators/ramp-quanta";
import { defaultScenarioDocument, parseScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";

/** A document in which only what the test names differs from the default. */
function documentWith(changes: Record<string, unknown>): ScenarioDocument {
  const parsed = parseScenarioDocument({ ...defaultScenarioDocument(), ...changes });
  if (!parsed.ok) throw new Error(JSON.stringify(parsed.issues));
  return parsed.document;
}

const linearRamps = (holdSeconds: number) => ({
  kind: "segments",
  separation: { durationSeconds: 1, shape: "linear" },
  hold: { durationSeconds: holdSeconds },
  recombination: { durationSeconds: 1, shape: "linear" },
});

/** The probe of the stall: thirty oscillating terms with velocity jumps, resolved at 1e-300 s. */
const oscillatingFormula = Array.from({ length: 30 }, (_, k) => `abs(sin(${k + 1}*pi*t))/30`).join(" + ");

describe("the compute cost estimate", () => {
  it("leaves the default document and every example well within the ceiling", () => {
    expect(estimateComputeCost(defaultScenarioDocument()).units).toBeLessThan(COMPUTE_COST_CEILING / 10);
    const dir = path.resolve(__dirname, "../../../examples");
    for (const file of readdirSync(dir).filter((f) => f.endsWith(".json"))) {
      const parsed = parseScenarioDocument(JSON.parse(readFileSync(path.join(dir, file), "utf8")));
      expect(parsed.ok, file).toBe(true);
      if (parsed.ok) expect(computeCostRefusal(parsed.document), file).toBeNull();
    }
  });

  it("counts the samples the engine actually uses for a kinked profile at a stated resolution", () => {
    for (const resolution of [1e-3, 1e-4, 3e-5]) {
      const document = documentWith({ protocol: linearRamps(100), numerics: { kinkTimeResolutionSeconds: resolution } });
      const estimate = estimateComputeCost(document);
      const result = computeScenario(document);
      expect(estimate.channels.find((c) => c.channel === "electromagnetic")?.samples).toBe(result.electromagnetic.convergence.samplesPerWindow);
    }
  });

  it("counts the first level of a smooth profile's doubling as the engine starts it", () => {
    const document = defaultScenarioDocument();
    const result = computeScenario(document);
    expect(result.electromagnetic.convergence.converged).toBe(true);
    const estimated = estimateComputeCost(document).channels.find((c) => c.channel === "electromagnetic")!;
    // The engine may double past the first level to converge, never start below it.
    expect(result.electromagnetic.convergence.samplesPerWindow).toBeGreaterThanOrEqual(estimated.samples);
  });

  it("never costs less as the kink resolution gets finer, and stops growing at the sample cap", () => {
    fc.assert(
      fc.property(fc.double({ min: -300, max: 0, noNaN: true }), fc.double({ min: 0, max: 5, noNaN: true }), (log10Step, log10Ratio) => {
        const coarse = 10 ** log10Step * 10 ** log10Ratio;
        const fine = 10 ** log10Step;
        const at = (step: number) => estimateComputeCost(documentWith({ protocol: { kind: "formula", expression: "abs(sin(pi*t))", durationSeconds: 1 }, numerics: { kinkTimeResolutionSeconds: step } }));
        const [a, b] = [at(coarse), at(fine)];
        expect(b.units).toBeGreaterThanOrEqual(a.units);
        expect(Math.max(...b.channels.map((c) => c.samples))).toBeLessThanOrEqual(MAX_SAMPLES);
      }),
      { numRuns: 60 },
    );
  });

  it("counts no transform for a channel that does not radiate", () => {
    const uncharged = documentWith({ source: { chargeCoulombs: 0, massKg: 1e-14, labMassKg: null } });
    expect(estimateComputeCost(uncharged).channels.map((c) => c.channel)).toEqual([]);
  });

  it("refuses the oscillating formula at 1e-300 s, naming the resolution and the formula", () => {
    const document = documentWith({ protocol: { kind: "formula", expression: oscillatingFormula, durationSeconds: 1 }, numerics: { kinkTimeResolutionSeconds: 1e-300 } });
    const issues = computeCostRefusal(document);
    expect(issues?.map((i) => i.path)).toEqual(["numerics.kinkTimeResolutionSeconds", "protocol.expression"]);
    expect(issues?.[0].message).toMatch(/at least [0-9.e+-]+ s/);
  });

  it("accepts the document again at the coarser step its refusal suggests", () => {
    fc.assert(
      fc.property(fc.integer({ min: 5, max: 60 }), fc.double({ min: -300, max: -5, noNaN: true }), (terms, log10Step) => {
        const expression = Array.from({ length: terms }, (_, k) => `abs(sin(${k + 1}*pi*t))/${terms}`).join(" + ");
        const protocol = { kind: "formula", expression, durationSeconds: 1 };
        const issues = computeCostRefusal(documentWith({ protocol, numerics: { kinkTimeResolutionSeconds: 10 ** log10Step } }));
        if (issues === null) return;
        const offered = /at least ([0-9.e+-]+) s/.exec(issues[0].message);
        if (offered === null) {
          // No step is enough alone: the refusal says so and names the formula to change.
          expect(issues[0].message).toMatch(/No coarser step alone/);
          expect(issues.map((i) => i.path)).toContain("protocol.expression");
          return;
        }
        const suggested = Number(offered[1]);
        expect(Number.isFinite(suggested)).toBe(true);
        expect(estimateComputeCost(documentWith({ protocol, numerics: { kinkTimeResolutionSeconds: suggested } })).units).toBeLessThanOrEqual(COMPUTE_COST_CEILING);
      }),
      { numRuns: 40 },
    );
  });

  it("offers no step when no step is enough (the 35-term formula, whose set-up alone nearly fills the ceiling)", () => {
    const expression = Array.from({ length: 35 }, (_, k) => `abs(sin(${k + 1}*pi*t))/35`).join(" + ");
    const issues = computeCostRefusal(documentWith({ protocol: { kind: "formula", expression, durationSeconds: 1 }, numerics: { kinkTimeResolutionSeconds: 1e-300 } }));
    expect(issues?.[0].message).toMatch(/No coarser step alone/);
  });
});

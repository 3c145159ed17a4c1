import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { rampQuantaPerSquaredSource } from "@/physics/estimators/ramp-quanta";
import { separationHistory } from "@/physics/protocols";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { electromagneticChannel, gravitationalChannel } from "@/physics/spectra/channels";
import { scenario, segments, withSeparation, withSource } from "./scenarios";

const smoothShape = fc.constantFrom("cubic", "cosine", "minimum-jerk" as const);
const logUniform = (lo: number, hi: number) => fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true }).map((x) => 10 ** x);
const background = fc.constantFrom<ScenarioDocument["background"]>(
  { kind: "minkowski" },
  { kind: "rindler", accelerationMetresPerSecondSquared: 1e14 },
  { kind: "de-sitter", hubbleRatePerSecond: 1e2 },
  { kind: "schwarzschild", massKg: 2e31 },
);
const labFor = (b: ScenarioDocument["background"]): ScenarioDocument["lab"] =>
  b.kind === "schwarzschild"
    ? { placement: "areal-radius", arealRadiusMetres: 1e5 }
    : b.kind === "rindler"
      ? { placement: "uniformly-accelerated" }
      : b.kind === "de-sitter"
        ? { placement: "areal-radius", arealRadiusMetres: 0 }
        : { placement: "inertial" };

const documents = fc
  .record({
    background,
    shape: smoothShape,
    // Ramps within a factor 100 of each other: beyond that a short hold makes one transform very long (slow, not wrong).
    separationSeconds: logUniform(1e-3, 1e-1),
    recombinationSeconds: logUniform(1e-3, 1e-1),
    holdSeconds: fc.oneof(fc.constant(0), logUniform(1e-5, 1e3)),
    split: fc.constantFrom("symmetric", "one-branch-stays" as const),
  })
  .map(({ background, shape, separationSeconds, recombinationSeconds, holdSeconds, split }) =>
    withSeparation(scenario({ background, lab: labFor(background), protocol: segments({ shape, separationSeconds, recombinationSeconds, holdSeconds }) }), { split }),
  );

const log10Total = (doc: ScenarioDocument, channel: "electromagnetic" | "gravitational") => computeScenario(doc)[channel].totalQuanta.log10;

describe("properties of the counts (fast-check)", { timeout: 60_000 }, () => {
  it("⟨N⟩ ≥ 0 in every channel and background", () => {
    fc.assert(
      fc.property(documents, (doc) => {
        const result = computeScenario(doc);
        for (const ch of [result.electromagnetic, result.gravitational, result.combined]) {
          expect(ch.totalQuanta.value === null || ch.totalQuanta.value >= 0).toBe(true);
          expect(ch.decoherence.value! >= 0 && ch.decoherence.value! <= 1).toBe(true);
        }
      }),
      { numRuns: 40 },
    );
  });

  it("⟨N⟩ scales as q²", () => {
    fc.assert(
      fc.property(documents, fc.double({ min: 0.1, max: 10, noNaN: true }), (doc, factor) => {
        const scaled = withSource(doc, { chargeCoulombs: factor * doc.source.chargeCoulombs });
        expect(log10Total(scaled, "electromagnetic")! - log10Total(doc, "electromagnetic")!).toBeCloseTo(2 * Math.log10(factor), 9);
      }),
      { numRuns: 30 },
    );
  });

  it("swapping the branches leaves ⟨N⟩ unchanged (Δp → −Δp: the charge's sign, or a mirrored sampled profile)", () => {
    fc.assert(
      fc.property(documents, (doc) => {
        expect(log10Total(withSource(doc, { chargeCoulombs: -doc.source.chargeCoulombs }), "electromagnetic")).toBe(log10Total(doc, "electromagnetic"));
      }),
      { numRuns: 20 },
    );
    const samples = Array.from({ length: 21 }, (_, i) => ({ timeSeconds: i * 0.01, separationMetres: 1e-6 * Math.sin((Math.PI * i) / 20) ** 2 }));
    const sampled = (sign: number) => scenario({ protocol: { kind: "sampled", samples: samples.map((s) => ({ ...s, separationMetres: sign * s.separationMetres })), interpolation: "cubic-spline" } });
    expect(log10Total(sampled(-1), "electromagnetic")).toBe(log10Total(sampled(1), "electromagnetic"));
  });

  it("a zero separation gives exactly zero, not a small number", () => {
    fc.assert(
      fc.property(documents, (doc) => {
        const result = computeScenario(withSeparation(doc, { distanceMetres: 0 }));
        for (const ch of [result.electromagnetic, result.gravitational]) {
          expect(ch.totalQuanta).toMatchObject({ value: 0, log10: null });
          expect(ch.exactZeroReason).toMatch(/never separated/);
        }
      }),
      { numRuns: 20 },
    );
  });

  it("doubling the sampling changes a converged result by less than 1e-3", () => {
    fc.assert(
      fc.property(documents, fc.constantFrom(electromagneticChannel, gravitationalChannel), fc.double({ min: 0, max: 300, noNaN: true }), (doc, channel, alpha) => {
        if (channel === gravitationalChannel && doc.protocol.kind === "segments" && doc.protocol.separation.shape !== "minimum-jerk") return;
        const history = separationHistory(doc);
        const normal = rampQuantaPerSquaredSource(history, channel, alpha, null);
        fc.pre(normal.convergence.converged);
        const doubled = rampQuantaPerSquaredSource(history, channel, alpha, null, 1024);
        expect(Math.abs(10 ** (doubled.log10PerSquaredSource - normal.log10PerSquaredSource) - 1)).toBeLessThan(1e-3);
      }),
      { numRuns: 40 },
    );
  });
});

/**
 * The body's offset x₀ from the lab's centre of mass and the one recoil convention (issue 17, item 3).
 * Quadrupole of body (m) and lab (M) about their common centre of mass: μx², μ = mM/(m + M), x the body's place
 * measured by the lab (Landau & Lifshitz, Mechanics §13, reduced mass; the quadrupole of a two-body system).
 * With the branches at x₀ + x_A and x₀ + x_B: ΔI = μ[(x₀ + x_A)² − (x₀ + x_B)²] — 2μx₀d for a symmetric split
 * (x_{A,B} = ±d/2) and μ(2x₀d + d²) when one branch stays (x_A = d, x_B = 0).
 * The check: the Rindler hold rate, exactly (8G/(15πħc⁵))(a/c)⁵ ΔI² (the spin-2 S(0), tests/unit/physics/
 * thermal-horizon.test.ts), read back as ΔI.
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { G, c, hbar } from "@/physics/constants";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { scenario, valueOf, withSeparation, withSource } from "./scenarios";

const a = 1e14;
const rindler = () => scenario({ background: { kind: "rindler", accelerationMetresPerSecondSquared: a }, lab: { placement: "uniformly-accelerated" } });

/** ΔI at full separation, read from the gravitational hold rate. */
function quadrupoleDifference(doc: ScenarioDocument): number {
  const rate = valueOf(computeScenario(doc).gravitational.holdRate);
  return Math.sqrt(rate / ((8 * G) / (15 * Math.PI * hbar * c ** 5) * (a / c) ** 5));
}

const logUniform = (lo: number, hi: number) => fc.double({ min: Math.log10(lo), max: Math.log10(hi), noNaN: true }).map((x) => 10 ** x);

describe("the body offset x₀ and the lab's recoil", () => {
  it("gives ΔI = 2 m_eff x₀ d for a symmetric split and m_eff(2x₀d + d²) when one branch stays", () => {
    fc.assert(
      fc.property(logUniform(1e-8, 1e-4), fc.oneof(fc.constant(0), logUniform(1e-6, 50), logUniform(1e-6, 50).map((x) => -x)), logUniform(1e-16, 1e-10), fc.oneof(fc.constant(null), logUniform(1e-16, 1)), (d, offsetOverD, m, labMass) => {
        const x0 = offsetOverD * d;
        const mEff = labMass ? (m * labMass) / (m + labMass) : m;
        const base = withSource(rindler(), { massKg: m, labMassKg: labMass });
        const symmetric = withSeparation(base, { split: "symmetric", distanceMetres: d, bodyOffsetMetres: x0 });
        const oneStays = withSeparation(base, { split: "one-branch-stays", distanceMetres: d, bodyOffsetMetres: x0 });
        if (x0 !== 0) expect(quadrupoleDifference(symmetric) / Math.abs(2 * mEff * x0 * d)).toBeCloseTo(1, 9);
        const expected = Math.abs(mEff * (2 * x0 * d + d * d));
        if (expected > 1e-6 * mEff * d * d) expect(quadrupoleDifference(oneStays) / expected).toBeCloseTo(1, 9);
      }),
      { numRuns: 40 },
    );
  });

  it("makes a symmetric split's rate (2x₀/d)² times the one-branch-stays value at x₀ = 0", () => {
    const d = 1e-6;
    const x0 = 1e-3;
    const one = withSeparation(rindler(), { split: "one-branch-stays", distanceMetres: d });
    const symmetric = withSeparation(rindler(), { split: "symmetric", distanceMetres: d, bodyOffsetMetres: x0 });
    const ratio = valueOf(computeScenario(symmetric).gravitational.holdRate) / valueOf(computeScenario(one).gravitational.holdRate);
    expect(ratio / ((2 * x0) / d) ** 2).toBeCloseTo(1, 9);
  });

  it("counts the ramps with the offset's profile too (2x₀σ + σ²), continuous through x₀ = −d/2 where the hold rate vanishes", () => {
    const d = 1e-6;
    const at = (x0: number) => computeScenario(withSeparation(rindler(), { split: "one-branch-stays", distanceMetres: d, bodyOffsetMetres: x0 })).gravitational;
    const exact = at(-d / 2);
    expect(exact.holdRate.value).toBe(0);
    expect(exact.comparison).toBeNull();
    expect(valueOf(exact.rampDrivenQuanta)).toBeGreaterThan(0);
    expect(valueOf(at(-d / 2 * (1 + 1e-7)).totalQuanta) / valueOf(exact.totalQuanta)).toBeCloseTo(1, 4);
  });

  it("notes x₀ and its ratio 2x₀/d when set, and cautions that x₀ = 0 is an idealisation", () => {
    const note = computeScenario(withSeparation(rindler(), { split: "symmetric", bodyOffsetMetres: 3e-6 })).flags.find((f) => f.code === "symmetric-split-quadrupole")!;
    expect(note.status).toBe("note");
    expect(note.measure).toBeCloseTo((2 * 3e-6) / rindler().separation.distanceMetres, 9);
    expect(computeScenario(rindler()).flags.find((f) => f.code === "symmetric-split-quadrupole")!.status).toBe("caution");
  });
});

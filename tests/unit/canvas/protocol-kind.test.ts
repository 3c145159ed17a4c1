/**
 * Switching the protocol's kind (canvas/kernels/protocol-kind.ts): one undo step, the peak separation kept, the
 * ramps written out as a formula that is the same σ(t), and d honoured by a measured profile (its samples rescaled).
 */
import fc from "fast-check";
import { describe, expect, it } from "vitest";
import { peakSeparationReached, segmentsAsFormula, withPeakSeparation, withProtocolKind } from "@/canvas/kernels/protocol-kind";
import { computeScenario } from "@/physics/compute";
import { compileProfileFormula, fractionAt, separationHistory } from "@/physics/protocols";
import { rampShapeSchema, type ScenarioDocument } from "@/physics/scenario/schema";
import { scenario, segments } from "../physics/scenarios";
import { createHarness } from "./harness";

const peakOf = (doc: ScenarioDocument) => peakSeparationReached(separationHistory(doc));

describe("switching the protocol's kind", () => {
  it("writes ramps out as a formula whose σ(t) is the ramps' own, at any time, for every shape and any durations", () => {
    const seconds = fc.double({ min: 1e-6, max: 1e3, noNaN: true });
    fc.assert(
      fc.property(seconds, fc.double({ min: 0, max: 1e3, noNaN: true }), seconds, fc.constantFrom(...rampShapeSchema.options), fc.constantFrom(...rampShapeSchema.options), fc.double({ min: 0, max: 1, noNaN: true }), (a, hold, r, up, down, where) => {
        const protocol = segments({ separationSeconds: a, holdSeconds: hold, recombinationSeconds: r, shape: up, recombinationShape: down });
        if (protocol.kind !== "segments") throw new Error("segments expected");
        const history = separationHistory({ protocol, separation: scenario().separation });
        const formula = compileProfileFormula(segmentsAsFormula(protocol));
        const t = where * history.totalDurationSeconds;
        expect(formula.fractionAt(t)).toBeCloseTo(fractionAt(history, t), 9);
      }),
      { numRuns: 200 },
    );
  });

  it("keeps the peak separation through ramps → formula → measured profile → ramps", () => {
    let doc = scenario({ protocol: segments({ shape: "cosine" }) });
    const d = doc.separation.distanceMetres;
    for (const kind of ["formula", "sampled", "segments"] as const) {
      doc = withProtocolKind(doc, kind);
      expect(doc.protocol.kind).toBe(kind);
      expect(peakOf(doc) / d).toBeCloseTo(1, 9);
    }
  });

  it("keeps the separation the branches actually reach when a formula peaks below 1 (d becomes that peak)", () => {
    const doc = scenario({ protocol: { kind: "formula", expression: "0.5 * sin(pi * t / 0.4)^2", durationSeconds: 0.4 } });
    const ramps = withProtocolKind(doc, "segments");
    expect(ramps.separation.distanceMetres / (0.5 * doc.separation.distanceMetres)).toBeCloseTo(1, 6);
    if (ramps.protocol.kind !== "segments") throw new Error("segments expected");
    const total = ramps.protocol.separation.durationSeconds + ramps.protocol.hold.durationSeconds + ramps.protocol.recombination.durationSeconds;
    expect(total).toBeCloseTo(0.4, 12);
  });

  it("gives the same far-field count for ramps and for the formula they are written out as", () => {
    // The ramps' count comes from their closed-form windows, the formula's from its sampled, differenced σ(t):
    // two routes through the far-field integral (1/(6π²ε₀ħc³))∫ω³|Δp̃(ω)|²dω must agree.
    const ramps = scenario({ protocol: segments({ separationSeconds: 0.01, holdSeconds: 0.05, recombinationSeconds: 0.02 }) });
    const formula = withProtocolKind(ramps, "formula");
    const n = (doc: ScenarioDocument) => computeScenario(doc).electromagnetic.totalQuanta.value!;
    expect(n(formula) / n(ramps)).toBeCloseTo(1, 2);
  });

  it("is one undo step in the editor, and undo brings the ramps back exactly", () => {
    const h = createHarness();
    const before = h.document();
    expect(h.store.getState().edit("Switch to a formula", (d) => withProtocolKind(d, "formula")).ok).toBe(true);
    expect(h.document().protocol.kind).toBe("formula");
    expect(h.store.getState().history.past).toHaveLength(1);
    h.store.getState().undo();
    expect(h.document()).toEqual(before);
  });
});

describe("d with a measured profile", () => {
  it("is the profile's peak: a new d rescales the samples, and the far-field count grows as d² (Δp = q·d·σ)", () => {
    const measured = withProtocolKind(scenario(), "sampled");
    const d = measured.separation.distanceMetres;
    const doubled = withPeakSeparation(measured, 2 * d);
    expect(doubled.separation.distanceMetres).toBeCloseTo(2 * d, 18);
    expect(peakOf(doubled) / (2 * d)).toBeCloseTo(1, 12);
    const n = (doc: ScenarioDocument) => computeScenario(doc).electromagnetic.totalQuanta.value!;
    // Far field: ⟨N⟩∞ = (1/(6π²ε₀ħc³))∫ω³|Δp̃|²dω is quadratic in Δp (Larmor's formula counted in quanta).
    expect(n(doubled) / n(measured)).toBeCloseTo(4, 6);
  });

  it("leaves ramps and formulas measuring σ in units of d, as before", () => {
    const doc = withPeakSeparation(scenario(), 3e-6);
    expect(doc.separation.distanceMetres).toBe(3e-6);
    expect(doc.protocol).toEqual(scenario().protocol);
  });
});

import { describe, expect, it } from "vitest";
import { bothChannels } from "@/canvas/kernels/budget/both-channels";
import { computeScenario } from "@/physics/compute";
import type { Quantity } from "@/physics/result";
import { defaultScenarioDocument } from "@/physics/scenario/schema";
import { schwarzschildDocument } from "./harness";

const count = (value: number | null, log10: number | null): Quantity => ({ value, log10, unit: "1", sourceKey: "far-field-em" });

// Independent field states: ⟨N_EM + N_GW⟩ = ⟨N_EM⟩ + ⟨N_GW⟩ on a product state, by linearity of the expectation
// value (from memory; the rule physics/compute.ts states for the total).
describe("the Budget's both-channels count", () => {
  it("adds the two channels' counts", () => {
    const both = bothChannels(count(2, Math.log10(2)), count(3, Math.log10(3)))!;
    expect(both.value).toBeCloseTo(5, 12);
    expect(both.log10).toBeCloseTo(Math.log10(5), 12);
    expect(both.unit).toBe("1");
    expect(both.sourceKey).toBe("combined-channels");
  });

  it("keeps a count when the other channel is exactly zero, and answers an exact zero for two zeros", () => {
    expect(bothChannels(count(0, null), count(3, Math.log10(3)))!.value).toBeCloseTo(3, 12);
    expect(bothChannels(count(0, null), count(0, null))).toMatchObject({ value: 0, log10: null });
  });

  it("adds counts past the range of a double through their logarithms", () => {
    const both = bothChannels(count(null, 400), count(null, 400))!;
    expect(both.value).toBeNull();
    expect(both.log10).toBeCloseTo(400 + Math.log10(2), 12);
  });

  it("has no count where a channel has none (quanta into the horizon of flat spacetime)", () => {
    expect(bothChannels(null, count(1, 0))).toBeNull();
    const flat = computeScenario(defaultScenarioDocument());
    expect(bothChannels(flat.electromagnetic.horizonQuanta, flat.gravitational.horizonQuanta)).toBeNull();
  });

  it("gives the physics' own both-channels total when applied to the per-channel totals", () => {
    const result = computeScenario(schwarzschildDocument());
    const both = bothChannels(result.electromagnetic.totalQuanta, result.gravitational.totalQuanta)!;
    expect(both.log10).toBeCloseTo(result.combined.totalQuanta.log10!, 12);
  });
});

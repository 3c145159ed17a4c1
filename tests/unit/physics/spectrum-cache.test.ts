/** The spectrum cache reuses the buffers of spectra it drops: the counts must not depend on what was computed before. */
import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import { clearSpectrumCache } from "@/physics/spectra/window-spectrum";
import { scenario, segments, withSeparation } from "./scenarios";

/** Ramps of 10 and 20 ms around a short hold: transformed together, as one window whose cache key depends on the hold. */
const ramped = (holdSeconds: number) =>
  withSeparation(scenario({ protocol: segments({ separationSeconds: 0.01, recombinationSeconds: 0.02, holdSeconds }) }), { split: "one-branch-stays" });

describe("the spectrum cache", () => {
  it("gives the same counts after its buffers were dropped and reused by other spectra", () => {
    clearSpectrumCache();
    const first = computeScenario(ramped(0.002));
    expect(first.electromagnetic.convergence.mode).toBe("whole-protocol");
    // Fewer than the cache holds: the first spectra are still cached, and must not have lent their buffers.
    for (let i = 1; i <= 10; i++) computeScenario(ramped(0.002 + 0.0003 * i));
    const cached = computeScenario(ramped(0.002));
    // More distinct windows than the cache holds (64), so that the first spectra are dropped and their buffers reused.
    for (let i = 11; i <= 90; i++) computeScenario(ramped(0.002 + 0.0003 * i));
    const again = computeScenario(ramped(0.002));
    clearSpectrumCache();
    for (let i = 1; i <= 5; i++) computeScenario(ramped(0.01 * i));
    const afterClear = computeScenario(ramped(0.002));
    for (const result of [cached, again, afterClear]) {
      expect(result.electromagnetic.rampDrivenQuanta).toEqual(first.electromagnetic.rampDrivenQuanta);
      expect(result.gravitational.rampDrivenQuanta).toEqual(first.gravitational.rampDrivenQuanta);
    }
  });
});

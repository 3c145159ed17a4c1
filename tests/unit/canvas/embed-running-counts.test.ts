/**
 * The embed's running counts (canvas/kernels/embed/running-counts.ts): rows in the Budget's words whose totals are
 * the Budget's own both-channels sums, reached at the end of the protocol and never decreasing before it.
 */
import { describe, expect, it } from "vitest";
import { countText, createRunningCounts } from "@/canvas/kernels/embed/running-counts";
import { computeScenario } from "@/physics/compute";
import { defaultScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import { schwarzschildDocument } from "./harness";

function withSegments(document: ScenarioDocument): ScenarioDocument {
  return {
    ...document,
    separation: { ...document.separation, split: "one-branch-stays" },
    protocol: { kind: "segments", separation: { durationSeconds: 1e-3, shape: "minimum-jerk" }, hold: { durationSeconds: 1e-2 }, recombination: { durationSeconds: 1e-3, shape: "minimum-jerk" } },
  };
}

/** Two counts added in the logarithm by hand: log10(10^a + 10^b) (independent channels add, by linearity). */
const added = (a: number, b: number) => Math.max(a, b) + Math.log10(1 + 10 ** -Math.abs(a - b));

const scenarios: [string, ScenarioDocument, string[]][] = [
  ["Schwarzschild", withSegments(schwarzschildDocument()), ["ramp", "horizon"]],
  ["Minkowski", withSegments(defaultScenarioDocument()), ["far-field"]],
  ["Rindler", withSegments({ ...defaultScenarioDocument(), background: { kind: "rindler", accelerationMetresPerSecondSquared: 1e15 }, lab: { placement: "uniformly-accelerated" } }), ["ramp", "hold"]],
];

describe.each(scenarios)("running counts on %s", (_name, document, keys) => {
  const result = computeScenario(document);
  const running = createRunningCounts(document, result)!;

  it("show the rows of the result's split, in the Budget's words", () => {
    expect(running.rows(0).map((r) => r.key)).toEqual(keys);
  });

  it("reach each total at the end of the protocol, the total being both channels added", () => {
    expect(running.rows(running.totalSeconds).some((r) => Number.isFinite(r.log10Total))).toBe(true);
    for (const row of running.rows(running.totalSeconds)) {
      if (row.log10Total === -Infinity) continue;
      expect(row.log10Now).toBeCloseTo(row.log10Total, 9);
    }
    const ramp = running.rows(running.totalSeconds).find((r) => r.key === "ramp");
    if (ramp) expect(ramp.log10Total).toBeCloseTo(added(result.electromagnetic.rampDrivenQuanta.log10!, result.gravitational.rampDrivenQuanta.log10!), 12);
  });

  it("start from none and never go down", () => {
    expect(running.rows(0).every((r) => r.log10Now === -Infinity)).toBe(true);
    let previous = running.rows(0).map(() => -Infinity);
    for (let i = 1; i <= 100; i++) {
      const now = running.rows((running.totalSeconds * i) / 100).map((r) => r.log10Now);
      now.forEach((v, k) => expect(v).toBeGreaterThanOrEqual(previous[k] - 1e-12));
      previous = now;
    }
  });
});

describe("a count in a line of text", () => {
  it("reads plainly near one and in powers of ten far from it, and none as 0", () => {
    expect(countText(-Infinity)).toBe("0");
    expect(countText(Math.log10(2.5))).toBe("2.5");
    expect(countText(12.5)).toMatch(/10/);
    expect(countText(-7)).toMatch(/10/);
  });
});

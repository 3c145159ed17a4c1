/** The profile-range flag: a formula σ(t) is the separation as a fraction of d and must stay within [0, 1]. */
import { describe, expect, it } from "vitest";
import { computeScenario } from "@/physics/compute";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { scenario, segments } from "./scenarios";

const formula = (expression: string, durationSeconds = 0.4) => scenario({ protocol: { kind: "formula", expression, durationSeconds } });
const flag = (doc: ScenarioDocument) => computeScenario(doc).flags.find((f) => f.code === "profile-range")!;

describe("the profile-range flag", () => {
  it("is ok for a formula within [0, 1]", () => {
    expect(flag(formula("sin(pi * t / 0.4)^2")).status).toBe("ok");
  });

  it("is invalid when σ exceeds 1, naming the separation the branches really reach", () => {
    const raised = flag(formula("1e6 * sin(pi * t / 0.4)^4"));
    expect(raised.status).toBe("invalid");
    // σ peaks at 10⁶ at t = 0.2 s, so the branches separate by 10⁶·d = 1 m for the default d = 1 µm.
    expect(raised.message).toContain("reaches 1 × 10⁶");
    expect(raised.message).toContain("1.00 m");
    expect(raised.measure).toBeCloseTo(1e6 - 1, 0);
  });

  it("is invalid when σ goes negative, saying the branches change sides", () => {
    const raised = flag(formula("sin(2 * pi * t / 0.4)^3"));
    expect(raised.status).toBe("invalid");
    expect(raised.message).toMatch(/falls to −1: below 0 the branches change sides/);
  });

  it("does not apply to ramps or to a measured profile", () => {
    expect(flag(scenario({ protocol: segments() })).status).toBe("not-applicable");
  });
});

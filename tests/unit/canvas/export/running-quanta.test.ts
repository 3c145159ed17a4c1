/**
 * The embed's scrubber: the protocol cut at a cursor on lab time, and the running counts of quanta
 * (physics/estimators/accumulation.ts), which share the computed totals out along the protocol.
 */
import { describe, expect, it } from "vitest";
import { cutAtCursor, timeCursor } from "@/canvas/export/time-cursor";
import { buildDiagramScene, type DiagramScene } from "@/canvas/kernels/diagram/scene";
import { computeScenario } from "@/physics/compute";
import { createQuantaAccumulation } from "@/physics/estimators/accumulation";
import { log10Sum } from "@/physics/estimators/quantity";
import { separationHistory } from "@/physics/protocols";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { schwarzschildDocument } from "../harness";

function withSegments(document: ScenarioDocument, separationSeconds: number, holdSeconds: number, recombinationSeconds: number, shape: "linear" | "minimum-jerk"): ScenarioDocument {
  return {
    ...document,
    separation: { ...document.separation, split: "one-branch-stays" },
    protocol: {
      kind: "segments",
      separation: { durationSeconds: separationSeconds, shape },
      hold: { durationSeconds: holdSeconds },
      recombination: { durationSeconds: recombinationSeconds, shape },
    },
  };
}

function sceneOf(document: ScenarioDocument): DiagramScene {
  const outcome = buildDiagramScene(document);
  if (!outcome.ok) throw new Error(outcome.issue.message);
  return outcome.scene;
}

describe("running counts of quanta", () => {
  // Linear ramps of 1 ms, a 10 ms hold: σ = u on the way out, so ∫ f² dt has closed forms.
  const [T1, H] = [1e-3, 1e-2];
  const document = withSegments(schwarzschildDocument(), T1, H, T1, "linear");
  const history = separationHistory(document);
  const result = computeScenario(document);
  const running = createQuantaAccumulation(history, result);

  it("share the hold-driven count by ∫ f² dt: ∫₀¹ u² du = 1/3 for the dipole, ∫₀¹ u⁴ du = 1/5 for the quadrupole (f = σ²)", () => {
    // Elementary integrals; the hold-driven count is Γ A² ∫ f² dt (physics/spectra/channels.ts).
    const atEndOfSeparation = running(T1).shares;
    expect(atEndOfSeparation.electromagnetic.hold).toBeCloseTo(T1 / 3 / ((2 * T1) / 3 + H), 4);
    expect(atEndOfSeparation.gravitational.hold).toBeCloseTo(T1 / 5 / ((2 * T1) / 5 + H), 4);
    const midHold = running(T1 + H / 2).shares.electromagnetic.hold;
    expect(midHold).toBeCloseTo((T1 / 3 + H / 2) / ((2 * T1) / 3 + H), 4);
  });

  it("give each of two equal ramps half the ramp-driven count", () => {
    const { shares } = running(T1 + H / 2);
    expect(shares.electromagnetic.ramp).toBeCloseTo(0.5, 9);
    expect(shares.gravitational.ramp).toBeCloseTo(0.5, 9);
  });

  it("weigh a ramp twice as slow by 1/4 for the dipole and 1/16 for the quadrupole", () => {
    // A lone smooth ramp radiates ⟨N⟩ ∝ A²/τ² (dipole) and ∝ A²/τ⁴ (quadrupole): Larmor's power ∝ |d̈|² and the
    // quadrupole power ∝ |d³Q/dt³|² (Jackson, Classical Electrodynamics §9.2; Misner–Thorne–Wheeler §36.10),
    // counted in quanta of energy ħω ∝ 1/τ (from memory).
    const slow = withSegments(schwarzschildDocument(), T1, H, 2 * T1, "minimum-jerk");
    const shares = createQuantaAccumulation(separationHistory(slow), computeScenario(slow))(T1 + H / 2).shares;
    expect(shares.electromagnetic.ramp).toBeCloseTo(1 / (1 + 1 / 4), 3);
    expect(shares.gravitational.ramp).toBeCloseTo(1 / (1 + 1 / 16), 3);
  });

  it("reach the computed totals at the end, and never go down", () => {
    const end = running(history.totalDurationSeconds);
    expect(end.split).toBe("ramps-and-horizon");
    expect(end.log10RampDriven).toBeCloseTo(result.electromagnetic.rampDrivenQuanta.log10! + Math.log10(1 + 10 ** (result.gravitational.rampDrivenQuanta.log10! - result.electromagnetic.rampDrivenQuanta.log10!)), 9);
    let previous = -Infinity;
    for (let i = 0; i <= 200; i++) {
      const now = running((history.totalDurationSeconds * i) / 200);
      const total = log10Sum(now.log10RampDriven, now.log10Horizon ?? -Infinity);
      expect(total).toBeGreaterThanOrEqual(previous - 1e-12);
      previous = total;
    }
  });

  it("are zero before the protocol starts", () => {
    const before = running(0);
    expect(before.log10RampDriven).toBe(-Infinity);
    expect(before.log10Horizon).toBe(-Infinity);
  });
});

describe("the protocol cut at a time cursor", () => {
  const document = withSegments(schwarzschildDocument(), 1e-3, 1e-2, 1e-3, "minimum-jerk");
  const scene = sceneOf(document);
  const total = 1.2e-2;

  it("ends the branches at the cursor, apart during the hold", () => {
    const cursor = timeCursor(scene, total, 6e-3);
    const cut = cutAtCursor(scene, cursor)!;
    const last = cut.branches[cut.branches.length - 1];
    expect(last.point).toEqual(cursor.point);
    // One branch stays (b = 0), the other is fully out (a = 1).
    expect(last.a).toBeCloseTo(1, 9);
    expect(last.b).toBeCloseTo(0, 9);
    expect(cut.branches.length).toBeLessThan(scene.protocol!.branches.length);
  });

  it("keeps only the radiation emitted before the cursor: in the hold, the recombination's has not left yet", () => {
    const farField = (tau: number) => cutAtCursor(scene, timeCursor(scene, total, tau))!.strips.filter((s) => s.kind === "far-field").length;
    expect(farField(6e-3)).toBe(1);
    expect(farField(total)).toBe(2);
  });

  it("puts the end of the protocol where the scene put its last mark", () => {
    const end = timeCursor(scene, total, total).point;
    const lastMark = scene.protocol!.marks[scene.protocol!.marks.length - 1];
    expect(end.T).toBeCloseTo(lastMark.T, 9);
    expect(end.X).toBeCloseTo(lastMark.X, 9);
  });
});

import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { sweepCurves } from "@/canvas/kernels/sweep-channels";
import { currentSweepValue, defaultSweepRange } from "@/canvas/kernels/sweep-range";
import { ScenarioInputError } from "@/physics/scenario/input-error";
import { defaultScenarioDocument, parseScenarioDocument, type ScenarioDocument } from "@/physics/scenario/schema";
import { canVary, parameterUnit, sweepScenario, withParameter, type SweepResult } from "@/physics/sweeps";

function chip(): ScenarioDocument {
  const parsed = parseScenarioDocument(JSON.parse(readFileSync("examples/environment-cryogenic-chip.json", "utf8")));
  if (!parsed.ok) throw new Error(parsed.issues.map((i) => i.message).join("; "));
  return parsed.document;
}

/** d log⟨N⟩ / d log x of one channel between the sweep's first and last points. */
function slope(sweep: SweepResult, channel: string): number {
  const of = (i: number) => sweep.points[i].environmentQuanta.find((e) => e.channel === channel)!.quanta.log10!;
  const last = sweep.points.length - 1;
  return (of(last) - of(0)) / (Math.log10(sweep.points[last].x) - Math.log10(sweep.points[0].x));
}

describe("sweeps over the environment's control parameters", () => {
  it("vary the gas pressure, with the gas channel's ⟨N⟩ proportional to it (Λ, γ ∝ P: Joos & Zeh, Z. Phys. B 59, 223 (1985))", () => {
    const sweep = sweepScenario(chip(), { parameter: "gas-pressure", fromValue: 1e-12, toValue: 1e-8, points: 3 });
    expect(sweep.unit).toBe("Pa");
    expect(slope(sweep, "gas")).toBeCloseTo(1, 9);
    // The other channels do not see the pressure.
    const surface = sweep.points.map((p) => p.environmentQuanta.find((e) => e.channel === "surface")!.quanta.log10);
    expect(new Set(surface).size).toBe(1);
  });

  it("vary the surroundings' temperature: scattering ∝ T⁹ and absorption ∝ T⁶ at long wavelength (Schlosshauer, Decoherence and the Quantum-to-Classical Transition (2007) §3.4; Romero-Isart, PRA 84, 052121 (2011))", () => {
    const sweep = sweepScenario(chip(), { parameter: "surroundings-temperature", fromValue: 1, toValue: 2, points: 2 });
    expect(sweep.unit).toBe("K");
    expect(slope(sweep, "thermal-scattering")).toBeCloseTo(9, 2);
    expect(slope(sweep, "thermal-absorption")).toBeCloseTo(6, 2);
  });

  it("vary the surface distance: ⟨N⟩ ∝ 1/z³ once the separation is small against z (Anglin, Paz & Zurek, PRA 55, 4041 (1997))", () => {
    const sweep = sweepScenario(chip(), { parameter: "surface-distance", fromValue: 1e-3, toValue: 2e-3, points: 2 });
    expect(sweep.unit).toBe("m");
    expect(slope(sweep, "surface")).toBeCloseTo(-3, 2);
  });

  it("refuse a parameter whose part of the environment is absent, with its path", () => {
    const isolated = defaultScenarioDocument();
    expect(canVary(isolated, "gas-pressure")).toBe(false);
    expect(() => withParameter(isolated, "surface-distance", 1e-4)).toThrow(ScenarioInputError);
    try {
      withParameter(isolated, "surroundings-temperature", 4);
    } catch (error) {
      expect((error as ScenarioInputError).path).toBe("environment.radiation");
    }
    expect(canVary(chip(), "gas-pressure") && canVary(chip(), "surroundings-temperature") && canVary(chip(), "surface-distance")).toBe(true);
    expect(parameterUnit("lab-distance")).toBe("m");
  });

  it("start from the scenario's value, inside a default range around it", () => {
    const document = chip();
    for (const parameter of ["gas-pressure", "surroundings-temperature", "surface-distance"] as const) {
      const now = currentSweepValue(document, parameter)!;
      const range = defaultSweepRange(document, parameter)!;
      expect(range.from).toBeLessThan(now);
      expect(range.to).toBeGreaterThan(now);
    }
  });

  it("draw one curve per channel and the total, the total above every channel at every point", () => {
    const sweep = sweepScenario(chip(), { parameter: "gas-pressure", fromValue: 1e-12, toValue: 1e-8, points: 3 });
    const curves = sweepCurves(sweep.points);
    expect(curves.map((c) => c.key)).toEqual(["fields", "gas", "thermal-scattering", "thermal-absorption", "thermal-emission", "surface", "total"]);
    expect(new Set(curves.map((c) => `${c.colour} ${c.dash.join(",")}`)).size).toBe(curves.length);
    const total = curves.find((c) => c.key === "total")!;
    for (const c of curves) c.values.forEach((v, i) => expect(v! <= total.values[i]! * (1 + 1e-12)).toBe(true));
    expect(sweepCurves(sweepScenario(defaultScenarioDocument(), { parameter: "hold-time", fromValue: 0.01, toValue: 0.1, points: 2 }).points)).toEqual([]);
  });
});

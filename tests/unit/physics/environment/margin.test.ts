import { describe, expect, it } from "vitest";
import { elementaryCharge } from "@/physics/constants";
import { brentRoot, environmentChannels, environmentMargins, findMargin, RootNotBracketedError, type EnvironmentInputs } from "@/physics/environment";
import { linearPaths, numberOf } from "./paths";

const inputs = (overrides: Partial<EnvironmentInputs> = {}): EnvironmentInputs => ({
  body: { chargeCoulombs: 100 * elementaryCharge.value, radiusMetres: 1e-6, permittivity: { real: 5.7, imaginary: 0.2 }, permittivitySource: "given", internalTemperatureKelvin: 4 },
  gas: { pressurePascals: 1e-8, temperatureKelvin: 4, species: "He" },
  radiation: { surroundingsTemperatureKelvin: 4 },
  surface: { distanceMetres: 40e-6, resistivityOhmMetres: 2.2e-8, temperatureKelvin: 4, orientation: "parallel", backgroundPermittivity: 1, relaxationTimeSeconds: null },
  ...overrides,
});

describe("Brent's bracketing root-finder (Brent 1973, ch. 4; Numerical Recipes 3rd ed. §9.3)", () => {
  it("finds the fixed point of cos, 0.739085133215160641… (the Dottie number — from memory)", () => {
    expect(brentRoot((x) => Math.cos(x) - x, 0, 1)).toBeCloseTo(0.739_085_133_215_160_6, 12);
  });

  it("finds √2 as the root of x² − 2 and refuses an interval that does not bracket a root", () => {
    expect(brentRoot((x) => x * x - 2, 0, 2)).toBeCloseTo(Math.SQRT2, 12);
    expect(() => brentRoot((x) => x * x + 1, -1, 1)).toThrow(RootNotBracketedError);
  });
});

describe("the margin: where each environmental channel equals the body's own field channels", () => {
  const paths = linearPaths(1e-9, { separationSeconds: 0.01, holdSeconds: 0.1, recombinationSeconds: 0.01 });

  it("finds the gas pressure exactly where ⟨N⟩ ∝ P reaches the target (both regimes are linear in the density)", () => {
    const now = environmentChannels(paths, inputs()).find((ch) => ch.channel === "gas")!;
    const target = numberOf(now.totalQuanta) / 1e3;
    const gas = environmentMargins(paths, inputs(), Math.log10(target)).find((m) => m.channel === "gas")!;
    expect(gas.parameter).toBe("gas-pressure");
    expect(gas.outcome.kind).toBe("crossing");
    if (gas.outcome.kind === "crossing") {
      expect(gas.outcome.value.value! / 1e-11).toBeCloseTo(1, 6);
      expect(gas.outcome.value.unit).toBe("Pa");
    }
  });

  it("finds the surface distance where ⟨N⟩ ∝ z⁻³ (Δx ≪ z) falls to the target", () => {
    const now = environmentChannels(paths, inputs()).find((ch) => ch.channel === "surface")!;
    const target = numberOf(now.totalQuanta) / 8;
    const surface = environmentMargins(paths, inputs(), Math.log10(target)).find((m) => m.channel === "surface")!;
    expect(surface.outcome.kind).toBe("crossing");
    if (surface.outcome.kind === "crossing") expect(surface.outcome.value.value! / 80e-6).toBeCloseTo(1, 6);
  });

  it("finds the surroundings' temperature where scattering ∝ T⁹ falls to the target", () => {
    const now = environmentChannels(paths, inputs()).find((ch) => ch.channel === "thermal-scattering")!;
    const target = numberOf(now.totalQuanta) / 2 ** 9;
    const scattering = environmentMargins(paths, inputs(), Math.log10(target)).find((m) => m.channel === "thermal-scattering")!;
    expect(scattering.outcome.kind).toBe("crossing");
    if (scattering.outcome.kind === "crossing") expect(scattering.outcome.value.value! / 2).toBeCloseTo(1, 5);
  });

  it("says 'already below' when a channel is already smaller, and 'not reachable' when the field channels are zero or the limit is passed", () => {
    const margins = environmentMargins(paths, inputs(), 10);
    expect(margins.every((m) => m.outcome.kind === "already-below")).toBe(true);
    expect(environmentMargins(paths, inputs(), -Infinity).find((m) => m.channel === "gas")!.outcome.kind).toBe("not-reachable");
    const unreachable = findMargin((p) => Math.log10(p) + 100, 1, 1e-20, -200, "Pa");
    expect(unreachable.kind).toBe("not-reachable");
    expect(unreachable.kind === "not-reachable" && unreachable.reason).toBe("still above the field channels at the search limit, 1e-20 Pa");
  });
});

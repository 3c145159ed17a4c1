import { describe, expect, it } from "vitest";
import { atomicMassConstant, hbar, kB } from "@/physics/constants";
import { gasChannel, gasDecoherenceFunction, gasRates, molecularMassKg, type GasParameters } from "@/physics/environment";
import { linearPaths, linearSquaredSeparationSeconds, numberOf } from "./paths";

const air = (overrides: Partial<GasParameters> = {}): GasParameters => ({ pressurePascals: 101_325, temperatureKelvin: 300, species: "air", bodyRadiusMetres: 1e-5, ...overrides });

describe("residual gas: long-wavelength localisation rate and saturated collision rate", () => {
  it("gives Λ ≈ 10³⁷ cm⁻² s⁻¹ for a 10 µm dust grain in air (Joos & Zeh, Z. Phys. B 59, 223 (1985), table; Schlosshauer 2007, Table 3.2 — values from memory)", () => {
    const perSquareCentimetre = gasRates(air()).localisationRate * 1e-4;
    expect(Math.abs(Math.log10(perSquareCentimetre) - 37)).toBeLessThan(1);
  });

  it("scales with the density in a laboratory vacuum of 10³ molecules per cm³ (same table, recalled entry 10²³ cm⁻² s⁻¹ — see the note)", () => {
    // The recalled table lists 10³⁷ for air (2.5e19 cm⁻³) and 10²³ for 10³ cm⁻³: a ratio of 10¹⁴, where Λ ∝ n — which
    // both the source's formula and ours obey — gives 10^16.4. The recalled entries are not consistent with one another
    // under Λ ∝ n, so the check is the law itself, and the recalled entry only within three orders of magnitude.
    const T = 300;
    const vacuum = air({ pressurePascals: 1e3 * 1e6 * kB * T });
    const atmosphere = air({ pressurePascals: 2.5e19 * 1e6 * kB * T });
    const ratio = gasRates(atmosphere).localisationRate / gasRates(vacuum).localisationRate;
    expect(ratio / 2.5e16).toBeCloseTo(1, 12);
    expect(Math.abs(Math.log10(gasRates(vacuum).localisationRate * 1e-4) - 23)).toBeLessThan(3);
  });

  it("scales as Λ ∝ P R² √(m T) (Schlosshauer 2007, ch. 3)", () => {
    const base = gasRates(air()).localisationRate;
    expect(gasRates(air({ pressurePascals: 2 * 101_325 })).localisationRate / base).toBeCloseTo(2, 12);
    expect(gasRates(air({ bodyRadiusMetres: 3e-5 })).localisationRate / base).toBeCloseTo(9, 12);
    expect(gasRates(air({ temperatureKelvin: 1200 })).localisationRate / base).toBeCloseTo(2, 12);
    const heavy = gasRates(air({ species: "Ar" })).localisationRate / gasRates(air({ species: "He" })).localisationRate;
    expect(heavy / Math.sqrt(39.95 / 4.0026)).toBeCloseTo(1, 12);
  });

  it("saturates at the kinetic-theory collision rate n·πR²·⟨v⟩ with ⟨v⟩ = √(8k_BT/πm) (F. Reif, Fundamentals of Statistical and Thermal Physics, §7.9–7.10)", () => {
    const p = air({ pressurePascals: 1e-6, species: "N2" });
    const m = 2 * 14.007 * atomicMassConstant.value;
    const kinetic = (p.pressurePascals / (kB * p.temperatureKelvin)) * Math.PI * p.bodyRadiusMetres ** 2 * Math.sqrt((8 * kB * p.temperatureKelvin) / (Math.PI * m));
    expect(gasRates(p).collisionRate / kinetic).toBeCloseTo(1, 12);
    const F = gasDecoherenceFunction(p);
    expect(F(1e-6) / kinetic).toBeCloseTo(1, 6); // Δx ≫ λ_th ≈ 2e-11 m
  });

  it("the joined form reduces to ΛΔx² far below the crossover (independent limit of the Maxwell average: ⟨v³⟩ = (4/√π)(2k_BT/m)^{3/2})", () => {
    const p = air({ species: "He", temperatureKelvin: 4 });
    const { localisationRate, crossoverSeparationMetres } = gasRates(p);
    const dx = crossoverSeparationMetres * 1e-4;
    expect(gasDecoherenceFunction(p)(dx) / (localisationRate * dx * dx)).toBeCloseTo(1, 6);
    // n πR² ⟨v p²⟩/(3ħ²) with ⟨v³⟩ of the Maxwell distribution, written out independently of the code's Λ:
    const m = molecularMassKg("He");
    const meanCube = (4 / Math.sqrt(Math.PI)) * ((2 * kB * 4) / m) ** 1.5;
    const lambda = ((p.pressurePascals / (kB * 4)) * Math.PI * 1e-10 * m * m * meanCube) / (3 * hbar * hbar);
    expect(localisationRate / lambda).toBeCloseTo(1, 12);
  });

  it("puts the crossover at Δx_c = √(γ/Λ) ≈ 0.345 of the thermal de Broglie wavelength", () => {
    const rates = gasRates(air());
    expect(Math.sqrt(rates.collisionRate / rates.localisationRate) / rates.crossoverSeparationMetres).toBeCloseTo(1, 12);
    expect(rates.crossoverSeparationMetres / rates.thermalWavelengthMetres).toBeCloseTo(Math.sqrt(3) / (2 * Math.sqrt(2 * Math.PI)), 12);
  });

  it("counts the ramps' partial separation: ⟨N⟩ = 2Λd²(T_s/3 + T_h + T_r/3) for linear ramps at long wavelength", () => {
    const p = air({ pressurePascals: 1e-9, temperatureKelvin: 4, species: "He" });
    const timing = { separationSeconds: 0.02, holdSeconds: 0.1, recombinationSeconds: 0.04 };
    const d = gasRates(p).crossoverSeparationMetres * 1e-4;
    const result = gasChannel(linearPaths(d, timing), p);
    const expected = 2 * gasRates(p).localisationRate * d * d * linearSquaredSeparationSeconds(timing);
    expect(numberOf(result.totalQuanta) / expected).toBeCloseTo(1, 6);
    expect(numberOf(result.holdRate) / (2 * gasRates(p).localisationRate * d * d)).toBeCloseTo(1, 6);
    expect(result.regime).toBe("long-wavelength");
    expect(result.sourceKey).toBe("environment-gas");
  });

  it("reports the saturated regime with ⟨N⟩ = 2γ × the time spent resolvably apart", () => {
    const p = air({ pressurePascals: 1e-12 });
    const result = gasChannel(linearPaths(1e-6, { separationSeconds: 1e-3, holdSeconds: 1, recombinationSeconds: 1e-3 }), p);
    expect(result.regime).toBe("saturated");
    expect(numberOf(result.totalQuanta) / (2 * gasRates(p).collisionRate * 1.002)).toBeCloseTo(1, 3);
    expect(result.flags.find((f) => f.code === "gas-regime")?.status).toBe("note");
  });

  it("is exactly zero without gas, and flags the cross-section of bodies below the van der Waals range", () => {
    expect(gasChannel(linearPaths(1e-6), air({ pressurePascals: 0 })).exactZeroReason).toMatch(/no residual gas/);
    expect(gasChannel(linearPaths(1e-9), air({ bodyRadiusMetres: 1e-9 })).flags.find((f) => f.code === "gas-cross-section")?.status).toBe("caution");
  });
});

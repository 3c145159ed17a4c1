import { describe, expect, it } from "vitest";
import { c, hbar, kB } from "@/physics/constants";
import { bodyMaterials, clausiusMossotti, riemannZeta, thermalChannel, thermalChannels, thermalDecoherenceFunction, thermalRates, type ThermalParameters } from "@/physics/environment";
import { linearPaths, linearSquaredSeparationSeconds, numberOf } from "./paths";

const CMB_KELVIN = 2.725; // Fixsen, ApJ 707, 916 (2009)
const perSquareCentimetre = (perSquareMetre: number) => perSquareMetre * 1e-4;
const orders = (x: number, power: number) => Math.abs(Math.log10(x) - power);

const silica = (overrides: Partial<ThermalParameters> = {}): ThermalParameters => ({
  bodyRadiusMetres: 1e-7,
  permittivity: bodyMaterials["fused-silica"].permittivity,
  permittivitySource: bodyMaterials["fused-silica"].reference,
  surroundingsTemperatureKelvin: 300,
  internalTemperatureKelvin: 300,
  ...overrides,
});

describe("thermal radiation: scattering, absorption and emission by a small dielectric sphere", () => {
  it("gives Λ ≈ 10⁶ cm⁻² s⁻¹ for a 10 µm grain in the cosmic background (Joos & Zeh 1985 table; Schlosshauer 2007 Table 3.2, χ = 1 — from memory)", () => {
    expect(orders(perSquareCentimetre(thermalRates(1e-5, null, CMB_KELVIN).scatteringLocalisationRate), 6)).toBeLessThan(1);
  });

  it("gives Λ ≈ 10¹² cm⁻² s⁻¹ for a 10⁻⁵ cm particle in 300 K photons, and flags a 10 µm grain at 300 K as outside the Rayleigh regime (same table — from memory)", () => {
    expect(orders(perSquareCentimetre(thermalRates(1e-7, null, 300).scatteringLocalisationRate), 12)).toBeLessThan(1);
    const grain = thermalChannel(linearPaths(1e-9), silica({ bodyRadiusMetres: 1e-5 }), "thermal-scattering");
    expect(grain.flags.find((f) => f.code === "thermal-size")?.status).toBe("invalid");
  });

  it("scales as R⁶T⁹ for scattering and R³T⁶ for absorption (Joos & Zeh 1985; Romero-Isart, PRA 84, 052121 (2011))", () => {
    const eps = silica().permittivity;
    const base = thermalRates(1e-7, eps, 100);
    const bigger = thermalRates(2e-7, eps, 100);
    const hotter = thermalRates(1e-7, eps, 200);
    expect(bigger.scatteringLocalisationRate / base.scatteringLocalisationRate).toBeCloseTo(2 ** 6, 9);
    expect(hotter.scatteringLocalisationRate / base.scatteringLocalisationRate).toBeCloseTo(2 ** 9, 9);
    expect(bigger.absorptionLocalisationRate / base.absorptionLocalisationRate).toBeCloseTo(2 ** 3, 9);
    expect(hotter.absorptionLocalisationRate / base.absorptionLocalisationRate).toBeCloseTo(2 ** 6, 9);
  });

  it("computes ζ(7) and ζ(9) to the tabulated values (Abramowitz & Stegun, Table 23.3 — from memory)", () => {
    expect(riemannZeta(7)).toBeCloseTo(1.008_349_277_381_92, 12);
    expect(riemannZeta(9)).toBeCloseTo(1.002_008_392_826_08, 12);
    expect(riemannZeta(4)).toBeCloseTo(Math.PI ** 4 / 90, 10);
  });

  it("the joined integrals reduce to Λ at small Δx and to the total rates γ at large Δx (independent: ∫n(k)σ(k)c dk by a trapezoid sum)", () => {
    const p = silica();
    const T = 300;
    const kT = (kB * T) / (hbar * c);
    const rates = thermalRates(p.bodyRadiusMetres, p.permittivity, T);
    const small = 1e-4 / kT;
    const F = (process: "scattering" | "absorption") => thermalDecoherenceFunction(p.bodyRadiusMetres, p.permittivity, T, process);
    expect(F("scattering")(small) / (rates.scatteringLocalisationRate * small * small)).toBeCloseTo(1, 6);
    expect(F("absorption")(small) / (rates.absorptionLocalisationRate * small * small)).toBeCloseTo(1, 6);
    // Total rates straight from the photon density n(k) = k²/(π²(e^{ħck/k_BT} − 1)) and the Rayleigh cross-sections.
    const chi = clausiusMossotti(p.permittivity);
    let scattering = 0;
    let absorption = 0;
    const dk = kT / 2000;
    for (let i = 1; i < 200_000; i++) {
      const k = i * dk;
      const n = (k * k) / (Math.PI ** 2 * Math.expm1(k / kT));
      scattering += c * n * ((8 * Math.PI) / 3) * k ** 4 * p.bodyRadiusMetres ** 6 * chi.modulusSquared * dk;
      absorption += c * n * 4 * Math.PI * k * p.bodyRadiusMetres ** 3 * chi.imaginary * dk;
    }
    expect(rates.scatteringRate / scattering).toBeCloseTo(1, 6);
    expect(rates.absorptionRate / absorption).toBeCloseTo(1, 6);
    const large = 1e5 / kT;
    expect(F("scattering")(large) / rates.scatteringRate).toBeCloseTo(1, 4);
    expect(F("absorption")(large) / rates.absorptionRate).toBeCloseTo(1, 3);
  });

  it("emits at the internal temperature exactly as it absorbs at the same surroundings' temperature (Kirchhoff; Romero-Isart 2011)", () => {
    const timing = { separationSeconds: 0.01, holdSeconds: 0.5, recombinationSeconds: 0.01 };
    const paths = linearPaths(1e-8, timing);
    const [, absorption, emission] = thermalChannels(paths, silica({ surroundingsTemperatureKelvin: 500, internalTemperatureKelvin: 500 }));
    expect(numberOf(emission.totalQuanta) / numberOf(absorption.totalQuanta)).toBeCloseTo(1, 12);
    const cold = thermalChannels(paths, silica({ surroundingsTemperatureKelvin: 4, internalTemperatureKelvin: 500 }));
    expect(numberOf(cold[2].totalQuanta) / numberOf(emission.totalQuanta)).toBeCloseTo(1, 12);
    expect(numberOf(cold[1].totalQuanta) / numberOf(absorption.totalQuanta)).toBeCloseTo((4 / 500) ** 6, 6);
  });

  it("counts the ramps: ⟨N⟩ = 2Λd²(T_s/3 + T_h + T_r/3) at long wavelength", () => {
    const timing = { separationSeconds: 0.05, holdSeconds: 0.2, recombinationSeconds: 0.05 };
    const p = silica({ surroundingsTemperatureKelvin: 20 });
    const d = 1e-8; // kΔx ≲ 1e-3 for the photons that matter, so the next order (kΔx)⁴ stays below 1e-6
    const result = thermalChannel(linearPaths(d, timing), p, "thermal-scattering");
    const lambda = thermalRates(p.bodyRadiusMetres, p.permittivity, 20).scatteringLocalisationRate;
    expect(result.regime).toBe("long-wavelength");
    expect(numberOf(result.totalQuanta) / (2 * lambda * d * d * linearSquaredSeparationSeconds(timing))).toBeCloseTo(1, 6);
  });

  it("is exactly zero for a lossless body's absorption and emission, and notes a perfect conductor's missing magnetic dipole", () => {
    const diamond = silica({ permittivity: bodyMaterials.diamond.permittivity });
    const [scattering, absorption, emission] = thermalChannels(linearPaths(1e-8), diamond);
    expect(scattering.exactZeroReason).toBeNull();
    expect(absorption.exactZeroReason).toMatch(/lossless/);
    expect(emission.exactZeroReason).toMatch(/lossless/);
    const metal = thermalChannel(linearPaths(1e-8), silica({ permittivity: null }), "thermal-scattering");
    expect(metal.flags.find((f) => f.code === "thermal-magnetic-dipole")?.status).toBe("note");
  });

  it("takes the Clausius–Mossotti factor of a complex ε (Jackson §4.4): χ(ε → ∞) → 1 and χ(1) = 0", () => {
    expect(clausiusMossotti({ real: 1, imaginary: 0 }).real).toBe(0);
    expect(clausiusMossotti({ real: 1e12, imaginary: 0 }).real).toBeCloseTo(1, 10);
    const chi = clausiusMossotti({ real: 5.7, imaginary: 0.2 });
    const direct = { re: (4.7 * 7.7 + 0.2 * 0.2) / (7.7 ** 2 + 0.04), im: (0.2 * 7.7 - 4.7 * 0.2) / (7.7 ** 2 + 0.04) };
    expect(chi.real).toBeCloseTo(direct.re, 14);
    expect(chi.imaginary).toBeCloseTo(direct.im, 14);
  });
});

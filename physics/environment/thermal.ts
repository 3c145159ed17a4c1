/**
 * Thermal radiation: a dielectric sphere of radius R, small against the thermal wavelength 2πħc/(k_BT), in
 * black-body radiation at the surroundings' temperature T (scattering and absorption), emitting at its own
 * internal temperature T_int (emission). Polarisability α = 4πε₀R³χ, χ = (ε − 1)/(ε + 2) (materials.ts).
 *
 * Photons per volume per wavenumber n(k) = (k²/π²)/(e^{ħck/k_BT} − 1) (two polarisations); Rayleigh cross-sections
 * σ_sc = (8π/3)k⁴R⁶|χ|², σ_abs = 4πkR³ Im χ (Jackson, Classical Electrodynamics §10.1; Bohren & Huffman §5.2).
 * A scattered photon carries away the phase (k_in − k_out)·Δx, an absorbed or emitted one k·Δx; averaged over
 * isotropic directions these give 1 − sinc²(kΔx) and 1 − sinc(kΔx). The decoherence functions evaluated, at
 * every Δx, are
 *   F_sc(Δx)  = c ∫dk n(k) σ_sc(k) (1 − sinc²(kΔx)),   F_abs(Δx) = c ∫dk n(k) σ_abs(k) (1 − sinc(kΔx)),
 * in closed form through the Bose sums of special-functions.ts, whose limits are the published rates:
 *   long wavelength (Δx ≪ ħc/k_BT): Λ_sc = 8!·8ζ(9) c R⁶ |χ|² (k_BT/ħc)⁹ / (9π)  (E. Joos & H. D. Zeh, Z. Phys. B
 *     59, 223 (1985); M. Schlosshauer (2007) ch. 3, with χ = 1 there), Λ_abs = 16π⁵ c R³ Im χ (k_BT/ħc)⁶ / 189,
 *     emission the same at T_int (O. Romero-Isart, PRA 84, 052121 (2011));
 *   saturated (Δx ≫ ħc/k_BT): the total rates γ_sc = 1920ζ(7) c R⁶ |χ|² (k_BT/ħc)⁷ / π and
 *     γ_abs = 4π³ c R³ Im χ (k_BT/ħc)⁴ / 15 (derived here from the same integrals: ∫y^{s−1}/(e^y − 1) = Γ(s)ζ(s)).
 * Approximations: electric-dipole (Rayleigh) response, so R ≪ ħc/k_BT (flagged); one ε for the whole thermal band;
 * |χ|² in the scattering rate (the sources write (Re χ)², the same for low-loss materials); in the crossover the
 * dipole pattern of the scattered photon is replaced by an isotropic one (both limits are exact); emission is
 * spontaneous, into empty space (no stimulated emission by the surroundings' photons); a perfect conductor's
 * magnetic dipole is left out, as in Joos & Zeh (flagged).
 */
import { c, hbar, kB } from "../constants";
import type { FlagStatus, ValidityFlag } from "../result-basics";
import { accumulate, environmentResult, zeroEnvironmentResult } from "./channel-result";
import { clausiusMossotti, type Permittivity } from "./materials";
import type { BranchPaths, EnvironmentChannelResult } from "./types";
import { boseSum, riemannZeta } from "./special-functions";
import { regimeOf } from "./which-path";
import { formatNumber } from "../units";

export interface ThermalParameters {
  bodyRadiusMetres: number;
  /** null: a perfect conductor. */
  permittivity: Permittivity | null;
  /** Where ε came from (a table entry's reference, or "given"), for the flag. */
  permittivitySource: string;
  surroundingsTemperatureKelvin: number;
  internalTemperatureKelvin: number;
}

const FACTORIAL_8 = 40320;
const ZETA_4 = riemannZeta(4);
const ZETA_5 = riemannZeta(5);
const ZETA_7 = riemannZeta(7);
const ZETA_9 = riemannZeta(9);

export interface ThermalRates {
  scatteringLocalisationRate: number;
  scatteringRate: number;
  absorptionLocalisationRate: number;
  absorptionRate: number;
}

/** The four limits at temperature T (K): Λ in m⁻² s⁻¹, γ in s⁻¹. */
export function thermalRates(bodyRadiusMetres: number, permittivity: Permittivity | null, temperatureKelvin: number): ThermalRates {
  const chi = clausiusMossotti(permittivity);
  const kT = (kB * temperatureKelvin) / (hbar * c);
  const R3 = bodyRadiusMetres ** 3;
  const R6 = R3 * R3;
  return {
    scatteringLocalisationRate: ((FACTORIAL_8 * 8 * ZETA_9) / (9 * Math.PI)) * c * R6 * chi.modulusSquared * kT ** 9,
    scatteringRate: ((1920 * ZETA_7) / Math.PI) * c * R6 * chi.modulusSquared * kT ** 7,
    absorptionLocalisationRate: ((16 * Math.PI ** 5) / 189) * c * R3 * chi.imaginary * kT ** 6,
    absorptionRate: ((4 * Math.PI ** 3) / 15) * c * R3 * chi.imaginary * kT ** 4,
  };
}

/** Series coefficients of g_sc(x) = ∫y⁶(1 − sinc²(xy))/(e^y − 1)dy and g_abs(x) = ∫y³(1 − sinc(xy))/(e^y − 1)dy in x². */
const SERIES_TERMS = 30;
const scatteringSeries = Array.from({ length: SERIES_TERMS }, (_, i) => {
  const j = i + 1; // 1 − sinc²(z) = Σ (−1)^{j+1} 2^{2j+1} z^{2j}/(2j+2)!, and ∫y^{6+2j}/(e^y − 1) = (6+2j)! ζ(7+2j)
  return (-1) ** (j + 1) * 2 ** (2 * j + 1) * (2 * j + 3) * (2 * j + 4) * (2 * j + 5) * (2 * j + 6) * riemannZeta(7 + 2 * j);
});
const absorptionSeries = Array.from({ length: SERIES_TERMS }, (_, i) => {
  const j = i + 1; // 1 − sinc(z) = Σ (−1)^{j+1} z^{2j}/(2j+1)!, and ∫y^{3+2j}/(e^y − 1) = (3+2j)! ζ(4+2j)
  return (-1) ** (j + 1) * (2 * j + 2) * (2 * j + 3) * riemannZeta(4 + 2 * j);
});

function powerSeries(coefficients: number[], x2: number): number {
  let sum = 0;
  let power = x2;
  for (const a of coefficients) {
    const term = a * power;
    sum += term;
    if (Math.abs(term) < 1e-17 * Math.abs(sum)) break;
    power *= x2;
  }
  return sum;
}

/**
 * g_sc(x) = ∫₀^∞ y⁶(1 − sinc²(xy))/(e^y − 1) dy = 720ζ(7) − (12/x²)[ζ(5) − Re B₅(2x)], from
 * sin²(xy) = (1 − cos 2xy)/2 and ∫y⁴e^{−(n−2ix)y}dy = 24/(n − 2ix)⁵; by its series below x = 0.05 (radius ½).
 */
export function scatteringResolution(x: number): number {
  if (x < 0.05) return powerSeries(scatteringSeries, x * x);
  return 720 * ZETA_7 - (12 / (x * x)) * (ZETA_5 - boseSum(5, 2 * x).re);
}

/** g_abs(x) = ∫₀^∞ y³(1 − sinc(xy))/(e^y − 1) dy = 6ζ(4) − (2/x) Im B₃(x); by its series below x = 0.1 (radius 1). */
export function absorptionResolution(x: number): number {
  if (x < 0.1) return powerSeries(absorptionSeries, x * x);
  return 6 * ZETA_4 - (2 / x) * boseSum(3, x).im;
}

export type ThermalProcess = "scattering" | "absorption";

/**
 * F(Δx), s⁻¹, of one process at temperature T: c(8/3π)R⁶|χ|²(k_BT/ħc)⁷ g_sc(k_BTΔx/ħc) for scattering,
 * c(4/π)R³ Im χ (k_BT/ħc)⁴ g_abs(k_BTΔx/ħc) for absorption (and emission, at T_int).
 */
export function thermalDecoherenceFunction(bodyRadiusMetres: number, permittivity: Permittivity | null, temperatureKelvin: number, process: ThermalProcess): (separationMetres: number) => number {
  const chi = clausiusMossotti(permittivity);
  const kT = (kB * temperatureKelvin) / (hbar * c);
  const R3 = bodyRadiusMetres ** 3;
  if (process === "scattering") {
    const prefactor = (8 / (3 * Math.PI)) * c * R3 * R3 * chi.modulusSquared * kT ** 7;
    return (dx) => (dx === 0 ? 0 : prefactor * scatteringResolution(kT * Math.abs(dx)));
  }
  const prefactor = (4 / Math.PI) * c * R3 * chi.imaginary * kT ** 4;
  return (dx) => (dx === 0 || prefactor === 0 ? 0 : prefactor * absorptionResolution(kT * Math.abs(dx)));
}

function sizeFlag(p: ThermalParameters): ValidityFlag {
  const hottest = Math.max(p.surroundingsTemperatureKelvin, p.internalTemperatureKelvin);
  const measure = (p.bodyRadiusMetres * kB * hottest) / (hbar * c);
  const status: FlagStatus = measure <= 0.01 ? "ok" : measure <= 0.1 ? "caution" : "invalid";
  return {
    code: "thermal-size",
    status,
    message:
      `body radius is ${formatNumber(measure)} of ħc/k_BT at ${hottest} K: the Rayleigh (dipole) rates need ≪ 1` +
      (status === "invalid" ? "; a body this large scatters geometrically and these rates overestimate it by orders of magnitude" : ""),
    measure,
  };
}

function materialFlags(p: ThermalParameters): ValidityFlag[] {
  const flags: ValidityFlag[] = [
    { code: "thermal-permittivity", status: "note", message: `one ε for the whole thermal band (${p.permittivitySource}); real materials disperse there: an order-of-magnitude input` },
  ];
  flags.push(
    p.permittivity === null
      ? { code: "thermal-magnetic-dipole", status: "note", message: "perfect conductor: χ = 1, electric dipole only as in Joos & Zeh; the induced magnetic dipole would add to the scattering" }
      : { code: "thermal-magnetic-dipole", status: "not-applicable", message: "dielectric body: no induced magnetic dipole at this order" },
  );
  return flags;
}

const PROCESS_KEYS = {
  "thermal-scattering": "environment-thermal-scattering",
  "thermal-absorption": "environment-thermal-absorption",
  "thermal-emission": "environment-thermal-emission",
} as const;

export type ThermalChannel = keyof typeof PROCESS_KEYS;

/** One of the three thermal channels, with its regime and the size and material flags. */
export function thermalChannel(paths: BranchPaths, p: ThermalParameters, channel: ThermalChannel): EnvironmentChannelResult {
  const flags = [sizeFlag(p), ...materialFlags(p)];
  const key = PROCESS_KEYS[channel];
  const temperature = channel === "thermal-emission" ? p.internalTemperatureKelvin : p.surroundingsTemperatureKelvin;
  const process = channel === "thermal-scattering" ? "scattering" : "absorption";
  const chi = clausiusMossotti(p.permittivity);
  if (temperature === 0) return zeroEnvironmentResult(channel, key, channel === "thermal-emission" ? "the body's internal temperature is 0 K" : "the surroundings are at 0 K");
  if (process === "absorption" && chi.imaginary === 0) return zeroEnvironmentResult(channel, key, "the body's permittivity is lossless (Im ε = 0): it neither absorbs nor emits", flags);
  const d = paths.history.peakSeparationMetres;
  if (d === 0) return zeroEnvironmentResult(channel, key, "the branches are never separated", flags);
  const rates = thermalRates(p.bodyRadiusMetres, p.permittivity, temperature);
  const [lambda, gamma] = process === "scattering" ? [rates.scatteringLocalisationRate, rates.scatteringRate] : [rates.absorptionLocalisationRate, rates.absorptionRate];
  const regime = regimeOf((lambda * d * d) / gamma);
  const F = thermalDecoherenceFunction(p.bodyRadiusMetres, p.permittivity, temperature, process);
  const regimeFlag: ValidityFlag = {
    code: `${channel}-regime`,
    status: regime === "crossover" ? "caution" : "note",
    message: `${channel.replace("thermal-", "")} at ${temperature} K, full separation: ${regime} (Λd²/γ = ${formatNumber(((lambda * d * d) / gamma))})`,
    measure: (lambda * d * d) / gamma,
  };
  return environmentResult(channel, key, accumulate(paths, (a, b) => F(a - b)), regime, [regimeFlag, ...flags]);
}

/** Scattering and absorption of the surroundings' radiation, and emission at the internal temperature. */
export function thermalChannels(paths: BranchPaths, p: ThermalParameters): EnvironmentChannelResult[] {
  return (["thermal-scattering", "thermal-absorption", "thermal-emission"] as const).map((channel) => thermalChannel(paths, p, channel));
}

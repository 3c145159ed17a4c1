/**
 * Conversions between SI (the module's interface) and the geometrized Gaussian units used inside it.
 *
 * Inside this module: G = c = 1, lengths in units of the hole's mass length M = GM/c², and Gaussian
 * electrodynamics (∇·E = 4πρ, Coulomb field q/r²). A Gaussian charge squared is q²/(4πε0) in SI (J·m), so a
 * Gaussian field q/L² is q/(4πε0 L²) in V/m. Heaviside–Lorentz fields (used by the horizon quantisation formula)
 * differ from Gaussian ones by E_HL = E_G/√(4π); in SI they are √ε0·E_SI. These helpers do the SI side.
 */
import { G, c, epsilon0 } from "../../constants";

/** GM/c²: the hole's mass expressed as a length, metres. */
export function massLengthMetres(massKg: number): number {
  return (G * massKg) / (c * c);
}

/** Schwarzschild radius 2GM/c², metres. */
export function horizonRadiusMetres(massKg: number): number {
  return 2 * massLengthMetres(massKg);
}

/** Surface gravity κ = c³/(4GM) of the horizon, s⁻¹, for the Killing vector normalised at infinity. */
export function surfaceGravityPerSecond(massKg: number): number {
  return (c * c * c) / (4 * G * massKg);
}

/** q/(4πε0), V·m: the SI value of a Gaussian charge, so that q/(4πε0 L²) is a field in V/m. */
export function gaussianChargeVoltMetres(chargeCoulombs: number): number {
  return chargeCoulombs / (4 * Math.PI * epsilon0);
}

/**
 * ε = b/M − 2, the lab's coordinate height above the horizon in units of M, computed as (b − 2M)/M so that
 * near the horizon no digits are lost beyond those already lost in representing b itself.
 */
export function heightOverMassLength(labArealRadiusMetres: number, massKg: number): number {
  const m = massLengthMetres(massKg);
  return (labArealRadiusMetres - 2 * m) / m;
}

/** Lapse √(1 − 2M/b) = √(ε/(ε + 2)), computed from ε without cancellation. */
export function lapseFromHeight(heightOverM: number): number {
  return Math.sqrt(heightOverM / (heightOverM + 2));
}

/**
 * The ramps' quanta for a static lab outside a Schwarzschild hole (per unit squared source, log10), right in both
 * limits and flagged between them.
 *
 * 1. Slow ramps (Killing-time duration long against b/c, hence against GM/c³): the field the ramps change is the
 *    static field of the charge together with the hole's induced field, whose dipole seen from null infinity is that
 *    of the Copson–Linet potential, p = q(b − 2GM/c²) = q b f, f = 1 − 2GM/(c²b) (expand Φ at large r: the cos θ/r²
 *    term is q cos θ (b − 2M)/r² in geometrized units; Copson 1928, Linet 1976; checked numerically in
 *    tests/unit/physics/schwarzschild-ramps.test.ts). A radial shift by the proper length d moves b by √f d, so
 *    δp = q √f d (β² = f); a tangential one turns p by d/b, δp = q f d (β² = f²). Seen at ℐ⁺ the profile runs in
 *    Killing time t = τ/√f, and the photon count of a profile of duration T scales as T⁻², so
 *      N(ℐ⁺) = β² · f · N_flat,
 *    N_flat the flat-space count of the same profile in the lab's proper time. Gravity: the Killing-time stretch
 *    alone (the graviton count scales as T⁻⁴: f²); the static quadrupole's matching to the hole's tidal response
 *    (the analogue of β²) is not computed, so gravity carries relative corrections of order GM/(c²b) there.
 * 2. Near the horizon (b − 2GM/c² ≪ 2GM/c²) the geometry around the lab is Rindler's: the ramp-driven count is the
 *    Rindler spectral count at the lab's proper acceleration a (physics/spectra/channels.ts, W_rest at α = a/c), at
 *    any ramp speed (fast ramps: the flat count). Most of those quanta cross the horizon.
 * 3. Fast ramps far from the hole (wavelengths short against b): the flat count, which the Rindler count at the
 *    small local acceleration equals.
 * Between the limits: log N = w log N_slow + (1 − w) log N_Rindler with w = w_far·w_slow, w_far = h²/(1 + h²)
 * (h = b/r_s − 1 = f/(1 − f)) and w_slow = s²/(1 + s²) (s = c τ_min/(√f b), the shortest moving window in Killing
 * time against the light time b/c). The count is continuous; the flag states w and the factor between the two
 * limits, the size of the uncertainty where neither holds. Not a computation between the limits: an interpolation.
 */
import type { SeparationHistory } from "../protocols/types";
import type { ValidityFlag } from "../result-basics";
import type { ChannelDefinition } from "../spectra/channels";
import { c } from "../constants";
import { rampQuantaPerSquaredSource, type RampIntegral } from "./ramp-quanta";
import { formatNumber } from "../units";

export interface SchwarzschildRampLab {
  /** √(1 − 2GM/(c²b)) at the lab. */
  labRedshiftFactor: number;
  labArealRadiusMetres: number;
  labProperAccelerationMetresPerSecondSquared: number;
  axis: "radial" | "tangential";
}

export interface SchwarzschildRampCount extends RampIntegral {
  /** Weight of the slow-ramp (matched far-zone) limit, in [0, 1]. */
  slowWeight: number;
  flag: ValidityFlag;
}

/** N(ℐ⁺)/N_flat for slow ramps: β²f (electromagnetism), the Killing-time stretch f² (gravity, leading order). */
export function slowRampFactor(definition: ChannelDefinition, f: number, axis: "radial" | "tangential"): number {
  if (definition.channel === "gravitational") return f * f;
  return axis === "radial" ? f * f : f * f * f;
}

/** The weight w = w_far·w_slow of the slow-ramp limit (module comment). */
export function slowRampWeight(history: SeparationHistory, lab: SchwarzschildRampLab): number {
  const f = lab.labRedshiftFactor * lab.labRedshiftFactor;
  const h = f / (1 - f);
  const far = Number.isFinite(h) ? (h * h) / (1 + h * h) : 1;
  const moving = history.windows.map((w) => w.durationSeconds).filter((t) => t > 0);
  if (moving.length === 0) return far;
  const s = (c * Math.min(...moving)) / (lab.labRedshiftFactor * lab.labArealRadiusMetres);
  const slow = Number.isFinite(s) ? (s * s) / (1 + s * s) : 1;
  return far * slow;
}

export function schwarzschildRampQuanta(
  history: SeparationHistory,
  definition: ChannelDefinition,
  lab: SchwarzschildRampLab,
  kinkTimeResolutionSeconds: number | null,
): SchwarzschildRampCount {
  const flat = rampQuantaPerSquaredSource(history, definition, 0, kinkTimeResolutionSeconds);
  const rindler = rampQuantaPerSquaredSource(history, definition, lab.labProperAccelerationMetresPerSecondSquared / c, kinkTimeResolutionSeconds);
  const f = lab.labRedshiftFactor * lab.labRedshiftFactor;
  const log10Slow = flat.log10PerSquaredSource + Math.log10(slowRampFactor(definition, f, lab.axis));
  const w = slowRampWeight(history, lab);
  const log10Rindler = rindler.log10PerSquaredSource;
  const log10 = log10Rindler === -Infinity || log10Slow === -Infinity ? -Infinity : w * log10Slow + (1 - w) * log10Rindler;
  const worse = flat.convergence.relativeChange >= rindler.convergence.relativeChange ? flat.convergence : rindler.convergence;
  return { log10PerSquaredSource: log10, convergence: worse, slowWeight: w, flag: rampModelFlag(definition, w, log10Slow, log10Rindler) };
}

function rampModelFlag(definition: ChannelDefinition, w: number, log10Slow: number, log10Rindler: number): ValidityFlag {
  const code = "schwarzschild-ramp-model";
  const away = Math.min(w, 1 - w);
  const who = definition.channel === "electromagnetic" ? "photons" : "gravitons";
  const factor = log10Slow === -Infinity || log10Rindler === -Infinity ? 1 : 10 ** Math.abs(log10Slow - log10Rindler);
  if (away <= 0.01) {
    const limit =
      w > 0.5
        ? "slow ramps: the count to null infinity ℐ⁺ matched to the static Copson–Linet dipole, β²·f·N_flat" +
          (definition.channel === "gravitational" ? " (gravity: the Killing-time stretch f² only, corrections O(GM/(c²b)) not computed)" : "")
        : "the Rindler count at the lab's acceleration (near the horizon, or fast ramps: most quanta near the horizon go into it)";
    return { code, status: "note", message: `ramp-driven ${who}: ${limit}; weight of the slow-ramp limit ${formatNumber(w)}`, measure: away };
  }
  return {
    code,
    status: "caution",
    message:
      `ramp-driven ${who}: between the near-horizon (Rindler) and the slow-ramp (ℐ⁺, matched) limits, interpolated in the logarithm ` +
      `with weight ${formatNumber(w)} on the slow-ramp limit; the two limits differ by a factor ${formatNumber(factor)} here, ` +
      "the size of the uncertainty of this count",
    measure: away,
  };
}

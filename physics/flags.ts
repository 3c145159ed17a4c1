/**
 * Validity flags, on every result: each check is always present, with status ok, note, caution, invalid or
 * not-applicable, so a reader sees what was checked as well as what failed.
 * Thresholds for "≪" are common practice: a ratio below 0.01 is ok, below 0.1 a caution, above it invalid.
 */
import type { Background } from "./backgrounds";
import { G, c, hbar, kB } from "./constants";
import { squaredProfileIntegralSeconds } from "./estimators/hold-quanta";
import { electromagneticChannel } from "./spectra/channels";
import type { SeparationHistory } from "./protocols/types";
import { CONVERGENCE_TARGET } from "./estimators/ramp-quanta";
import { isOutsideDoubleRange } from "./estimators/quantity";
import type { ChannelResult, FlagStatus, ValidityFlag } from "./result";
import type { ScenarioDocument } from "./scenario/schema";
import { formatNumber, formatQuantity } from "./units";

const OK_RATIO = 0.01;
const CAUTION_RATIO = 0.1;

function ratioStatus(ratio: number): FlagStatus {
  return ratio <= OK_RATIO ? "ok" : ratio <= CAUTION_RATIO ? "caution" : "invalid";
}

export interface FlagInputs {
  document: ScenarioDocument;
  history: SeparationHistory;
  background: Background;
  peakBranchSpeedMetresPerSecond: number;
  electromagnetic: ChannelResult;
  gravitational: ChannelResult;
  /** Every reported quantity, for the double-range check. */
  reported: { name: string; quantity: ChannelResult["totalQuanta"] | null }[];
  /** The checks the Schwarzschild rate model raised (physics/estimators/schwarzschild-exact-rate.ts). */
  modelFlags: ValidityFlag[];
}

function slowMotion(speed: number): ValidityFlag {
  const ratio = speed / c;
  return {
    code: "slow-motion",
    status: ratioStatus(ratio),
    message: `peak branch speed is ${formatNumber(ratio)} c; the dipole and quadrupole formulas assume speeds ≪ c`,
    measure: ratio,
  };
}

function separationVsHorizon(d: number, background: Background): ValidityFlag {
  const distance = background.labProperDistanceToHorizonMetres;
  if (distance === null) return { code: "separation-vs-horizon", status: "not-applicable", message: "no horizon" };
  const ratio = d / distance;
  return {
    code: "separation-vs-horizon",
    status: ratioStatus(ratio),
    message: `separation is ${formatNumber(ratio)} of the proper distance to the horizon; the estimates sample the field on one worldline and need ≪ 1`,
    measure: ratio,
  };
}

function samplingConverged(channels: ChannelResult[]): ValidityFlag {
  const active = channels.filter((ch) => ch.exactZeroReason === null && ch.convergence.mode !== "none");
  if (active.length === 0) return { code: "sampling-converged", status: "not-applicable", message: "no channel needed a transform" };
  const worst = Math.max(...active.map((ch) => ch.convergence.relativeChange));
  const converged = worst <= CONVERGENCE_TARGET;
  return {
    code: "sampling-converged",
    status: converged ? "ok" : "caution",
    message: converged
      ? `ramp-driven counts changed by at most ${formatNumber(worst)} at the last doubling of the samples (target ${formatNumber(CONVERGENCE_TARGET)})`
      : `ramp-driven counts still changed by ${formatNumber(worst)} at the last doubling of the samples: not converged to ${formatNumber(CONVERGENCE_TARGET)}`,
    measure: worst,
  };
}

function kinkFlags(history: SeparationHistory, channels: ChannelResult[]): ValidityFlag[] {
  const kinks = history.kinks.filter((k) => k.kind === "kink");
  const jumps = history.kinks.filter((k) => k.kind === "jump");
  const step = Math.min(...channels.map((ch) => (ch.convergence.timeStepSeconds > 0 ? ch.convergence.timeStepSeconds : Infinity)));
  const at = (list: typeof kinks) => list.slice(0, 5).map((k) => formatQuantity(k.timeSeconds, "time", { digits: 4 })).join(", ") + (list.length > 5 ? ", …" : "");
  return [
    kinks.length === 0
      ? { code: "kink", status: "ok", message: "the branch velocity is continuous" }
      : {
          code: "kink",
          status: "caution",
          message:
            `the branch velocity jumps at ${at(kinks)}: the far-field count grows without bound as the time resolution shrinks; ` +
            `reported at a time step of ${Number.isFinite(step) ? formatQuantity(step, "time") : "an unknown step"}. Use smooth ramps (minimum-jerk) for a resolution-free number`,
        },
    accelerationJumpFlag(history, channels),
    jumps.length === 0
      ? { code: "separation-jump", status: "ok", message: "the separation is continuous and starts and ends at zero" }
      : {
          code: "separation-jump",
          status: "invalid",
          message: `the separation jumps at ${at(jumps)} (the branches start or end apart, or the separation changes with no time between): the counts omit the jump, which would make them diverge`,
        },
  ];
}

const PROFILE_PROBES = 4097;
const PROFILE_TOLERANCE = 1e-9;

/**
 * σ(t) is the separation as a fraction of d: 0 together, 1 fully apart. Ramps stay in [0, 1] by construction and a
 * measured profile is measured in units of its own peak; a formula may leave the range, and then d no longer says
 * how far apart the branches are (σ > 1), or the branches change sides (σ < 0). Probed on a uniform grid.
 */
export function profileRange(history: SeparationHistory): ValidityFlag {
  const code = "profile-range";
  if (history.protocolKind !== "formula") {
    return {
      code,
      status: "not-applicable",
      message: history.protocolKind === "segments" ? "ramps run σ(t) from 0 to 1 by construction" : "a measured profile is measured in units of its own peak",
    };
  }
  let lowest = Infinity;
  let highest = -Infinity;
  for (const w of history.windows) {
    for (let i = 0; i < PROFILE_PROBES; i++) {
      const sigma = w.fraction(i / (PROFILE_PROBES - 1));
      lowest = Math.min(lowest, sigma);
      highest = Math.max(highest, sigma);
    }
  }
  const d = history.peakSeparationMetres;
  const problems: string[] = [];
  if (highest > 1 + PROFILE_TOLERANCE) {
    problems.push(`σ(t) reaches ${formatNumber(highest)}: the branches separate by up to ${formatQuantity(highest * d, "length")}, not d = ${formatQuantity(d, "length")}`);
  }
  if (lowest < -PROFILE_TOLERANCE) problems.push(`σ(t) falls to ${formatNumber(lowest)}: below 0 the branches change sides`);
  if (problems.length === 0) return { code, status: "ok", message: "the formula's σ(t) stays within [0, 1]", measure: highest };
  return {
    code,
    status: "invalid",
    message: `${problems.join("; ")}. Write σ(t) as a fraction of d between 0 and 1, and set d to the peak separation`,
    measure: Math.max(highest - 1, -lowest),
  };
}

function accelerationJumpFlag(history: SeparationHistory, channels: ChannelResult[]): ValidityFlag {
  const gravity = channels.find((ch) => ch.channel === "gravitational");
  if (!gravity || gravity.exactZeroReason !== null) {
    return { code: "acceleration-jump", status: "not-applicable", message: "no gravitational count to affect" };
  }
  if (!history.windows.some((w) => w.smoothness === 1)) return { code: "acceleration-jump", status: "ok", message: "the branch acceleration is continuous" };
  return {
    code: "acceleration-jump",
    status: "caution",
    message:
      "the branch acceleration jumps (cubic or cosine ramps): the gravitational far-field count grows like the logarithm " +
      `of the bandwidth and is reported at a time step of ${formatQuantity(gravity.convergence.timeStepSeconds, "time")}; use minimum-jerk ramps for a resolution-free number`,
  };
}

const ESTIMATE_REGIME_TEXT = {
  far: "far from the hole (b ≥ 10 r_s): the published order-of-magnitude estimate, coefficient not established",
  "near-horizon": "near the horizon (b ≤ 1.01 r_s): the Rindler limit with the lab's local acceleration, an estimate",
  interpolated: "between near and far: the two estimates interpolated in ln b, marked as an interpolation, not a computation",
} as const;

function schwarzschildRegime(document: ScenarioDocument, electromagnetic: ChannelResult): ValidityFlag {
  if (document.background.kind !== "schwarzschild") return { code: "schwarzschild-regime", status: "not-applicable", message: "not a Schwarzschild background" };
  const regime = electromagnetic.regime;
  if (regime === "exact") {
    const beside = electromagnetic.comparison
      ? `the published estimate shown beside it for comparison is in its ${electromagnetic.comparison.estimateRegime} regime (${ESTIMATE_REGIME_TEXT[electromagnetic.comparison.estimateRegime]})`
      : "no comparison is shown for an exactly zero channel";
    return {
      code: "schwarzschild-regime",
      status: "note",
      message:
        "electromagnetic horizon rate: the exact value (horizon method with the Copson–Linet field, /methods/schwarzschild-exact) " +
        `is used at every radius; ${beside}`,
    };
  }
  const text = ESTIMATE_REGIME_TEXT[regime as keyof typeof ESTIMATE_REGIME_TEXT];
  return { code: "schwarzschild-regime", status: regime === "interpolated" ? "caution" : "note", message: `horizon rate estimated ${text}` };
}

/** Checks that every result carries, filled in as not applicable where the rate model did not raise them. */
const ALWAYS_PRESENT_MODEL_CHECKS = ["schwarzschild-multipole-check", "schwarzschild-gravity-model", "schwarzschild-ramp-model"] as const;

const SEVERITY: Record<FlagStatus, number> = { "not-applicable": 0, ok: 1, note: 2, caution: 3, invalid: 4 };

/** The raised checks, one per code (both channels may raise the ramp model's: the more severe is kept), and the always-present ones. */
function modelChecks(raised: ValidityFlag[]): ValidityFlag[] {
  const byCode = new Map<string, ValidityFlag>();
  for (const flag of raised) {
    const kept = byCode.get(flag.code);
    if (!kept || SEVERITY[flag.status] > SEVERITY[kept.status]) byCode.set(flag.code, flag);
  }
  const missing = ALWAYS_PRESENT_MODEL_CHECKS.filter((code) => !byCode.has(code));
  return [...byCode.values(), ...missing.map((code): ValidityFlag => ({ code, status: "not-applicable", message: "no Schwarzschild model computed for this channel" }))];
}

/**
 * The quadrupole difference depends on where the body sits relative to the lab's centre of mass, x₀
 * (channel-source.ts): ΔI = m_eff(2x₀d + d²) when one branch stays, 2m_eff·x₀·d for a symmetric split.
 */
function bodyOffsetNote(document: ScenarioDocument): ValidityFlag {
  const code = "symmetric-split-quadrupole";
  const offset = document.separation.bodyOffsetMetres ?? 0;
  const d = document.separation.distanceMetres;
  const symmetric = document.separation.split === "symmetric";
  if (document.source.massKg === 0 || d === 0) return { code, status: "not-applicable", message: "no body mass or no separation: no quadrupole difference" };
  if (offset === 0) {
    return {
      code,
      status: "caution",
      message:
        "x₀ = 0: the body is taken to sit exactly at the lab's centre of mass before the split, an idealisation" +
        (symmetric
          ? " — a symmetric split then leaves the quadrupoles equal and the gravitational count exactly zero at leading order; any offset x₀ gives ΔI = 2m_eff·x₀·d, (2x₀/d)² times the one-branch-stays count for x₀ ≫ d"
          : " — one branch staying then gives ΔI = m_eff d²; an offset x₀ gives m_eff(2x₀d + d²)") +
        ". Set separation.bodyOffsetMetres to the body's place along the axis, measured from the lab's centre of mass",
    };
  }
  const ratio = d > 0 ? (2 * offset) / d : 0;
  return {
    code,
    status: "note",
    message: symmetric
      ? `body offset x₀ = ${formatQuantity(offset, "length")}: the symmetric split's quadrupole difference is 2m_eff·x₀·d (2x₀/d = ${formatNumber(ratio)})`
      : `body offset x₀ = ${formatQuantity(offset, "length")}: the quadrupole difference is m_eff(2x₀d + d²) (2x₀/d = ${formatNumber(ratio)})`,
    measure: ratio,
  };
}

function modelNotes(document: ScenarioDocument, gravitational: ChannelResult): ValidityFlag[] {
  const kind = document.background.kind;
  const notes: ValidityFlag[] = [];
  const thermal = kind === "rindler" || kind === "de-sitter";
  const gravityActive = gravitational.exactZeroReason === null;
  notes.push(
    kind === "de-sitter" && gravityActive
      ? {
          code: "thermal-form-assumed",
          status: "note",
          message:
            "de Sitter gravity: the spin-2 field equation of the Weyl tensor is conformally invariant, but that the Bunch–Davies graviton state's " +
            "Weyl correlator is the conformal image of the Minkowski vacuum's is assumed, not established here",
        }
      : {
          code: "thermal-form-assumed",
          status: "not-applicable",
          message: thermal ? "the spectrum in use is derived (Rindler: boost invariance of the vacuum; de Sitter electromagnetism: conformal invariance)" : "no thermal spectrum in use",
        },
  );
  notes.push(bodyOffsetNote(document));
  notes.push(
    gravitational.exactZeroReason === null
      ? document.source.labMassKg
        ? { code: "lab-recoil", status: "ok", message: "the lab's recoil is included through m_eff = m M_lab/(m + M_lab), with d and x₀ measured by the lab" }
        : { code: "lab-recoil", status: "note", message: "no lab mass given: the lab is taken as immovable (m_eff = m)" }
      : { code: "lab-recoil", status: "not-applicable", message: "no quadrupole difference to correct" },
  );
  return notes;
}

/**
 * The hold rates are zero-frequency limits of the field's noise: they describe the count as a steady rate only when
 * the time the branches spend apart (∫σ²dτ, lab proper time) is long against the time over which the noise is
 * correlated. That time, in the lab's proper time:
 * - Schwarzschild: the hole's response, GM/c³ and the light time b/c, both Killing times, times the lapse (the
 *   written assumption of the exact rate and of the far-zone gravitational rate, sources.ts);
 * - Rindler: c/a; de Sitter: 1/α = c/√(a² + c²H²) (the thermal time ħ/(2πk_B T_local)).
 * Schwarzschild is judged by ratioStatus (a rate outside its assumption is invalid). In Rindler and de Sitter the
 * spectral count is exact for any protocol and only the reading of the hold-driven part as a steady rate fails, so
 * the status stops at caution.
 */
function holdTimescale(document: ScenarioDocument, history: SeparationHistory, background: Background): ValidityFlag {
  const code = "hold-timescale";
  const kind = document.background.kind;
  if (kind === "minkowski") return { code, status: "not-applicable", message: "no horizon: no hold rate" };
  const apart = squaredProfileIntegralSeconds(history, electromagneticChannel);
  if (!(apart > 0)) return { code, status: "not-applicable", message: "the branches are never apart" };
  const apartText = `the time spent apart, ∫σ²dτ = ${formatQuantity(apart, "time")} of lab proper time`;
  if (kind === "schwarzschild") {
    const massTime = (G * document.background.massKg) / c ** 3;
    const lightTime = background.labRadiusMetres / c;
    const response = background.labRedshiftFactor * Math.max(massTime, lightTime);
    const ratio = response / apart;
    return {
      code,
      status: ratioStatus(ratio),
      message:
        `the Schwarzschild hold rates are zero-frequency limits: they need ${apartText}, long against the hole's response ` +
        `time, GM/c³ = ${formatQuantity(massTime, "time")} and b/c = ${formatQuantity(lightTime, "time")} of Killing time (${formatQuantity(response, "time")} of lab time); ratio ${formatNumber(ratio)}`,
      measure: ratio,
    };
  }
  const correlation = hbar / (2 * Math.PI * kB * background.labLocalTemperatureKelvin);
  const ratio = correlation / apart;
  const status = ratioStatus(ratio);
  return {
    code,
    status: status === "invalid" ? "caution" : status,
    message:
      `the hold rate is a steady rate only for ${apartText}, long against the field's thermal time ${kind === "rindler" ? "c/a" : "c/√(a² + c²H²)"} = ${formatQuantity(correlation, "time")}; ` +
      `ratio ${formatNumber(ratio)}${status === "ok" ? "" : " (the total count is exact for any protocol; only its reading as rate × time fails)"}`,
    measure: ratio,
  };
}

function doubleRange(reported: FlagInputs["reported"]): ValidityFlag {
  const outside = reported.filter((r) => isOutsideDoubleRange(r.quantity)).map((r) => r.name);
  return outside.length === 0
    ? { code: "double-range", status: "ok", message: "every value fits a double" }
    : { code: "double-range", status: "note", message: `outside the range of a double, reported by log10 only: ${outside.join(", ")}` };
}

export function validityFlags(inputs: FlagInputs): ValidityFlag[] {
  const channels = [inputs.electromagnetic, inputs.gravitational];
  return [
    slowMotion(inputs.peakBranchSpeedMetresPerSecond),
    separationVsHorizon(inputs.history.peakSeparationMetres, inputs.background),
    samplingConverged(channels),
    ...kinkFlags(inputs.history, channels),
    profileRange(inputs.history),
    holdTimescale(inputs.document, inputs.history, inputs.background),
    schwarzschildRegime(inputs.document, inputs.electromagnetic),
    ...modelChecks(inputs.modelFlags),
    ...modelNotes(inputs.document, inputs.gravitational),
    doubleRange(inputs.reported),
    ...inputs.background.flags.map((f) => ({ code: `background:${f.code}`, status: f.severity, message: f.message }) satisfies ValidityFlag),
  ];
}

/**
 * The default Schwarzschild hold-rate model: the exact horizon-method rate for electromagnetism at every radius, the
 * far-zone tidal-heating rate for gravity, each with the published order-of-magnitude estimate beside it.
 *
 * Electromagnetism (physics/horizon/schwarzschild-exact, derivation at /methods/schwarzschild-exact): per second of
 * lab proper time, with a = GM/(b²√(1 − 2GM/(c²b))) and ε = c²b/(GM) − 2,
 *   Γ_τ = q²d²a³/(6π²ε0ħc⁶) · [cos²α (1 + 3ε − (3/2)ε² ln(1 + 2/ε)) + sin²α],   α = 0 radial, π/2 tangential,
 * from the Copson field with Linet's correction (Copson, Proc. R. Soc. A 118, 184 (1928); Linet, J. Phys. A 9,
 * 1081 (1976); Hanni & Ruffini, PRD 8, 3259 (1973)) and the horizon-memory count ⟨N⟩ = (κT/πħ)∫|ΔA|²dS
 * (arXiv:2205.06279, arXiv:2301.00026). d is the proper separation measured by the lab.
 * Gravity: the far-zone rate (leading order in GM/(c²b)) of schwarzschildGravityFarZoneRate for the channel's
 * quadrupole scale m_eff·d² (body mass m_eff, immovable lab, so that ΔI = m_eff d² (n̂n̂)^STF as in channel-source.ts).
 * It is used at every radius (no other value is ever swapped in, so the rate is continuous in b), with a flag whose
 * measure is the size GM/(c²b) of the relative corrections it leaves out: a note up to 1 %, a caution up to 10 %,
 * and invalid closer in, where the corrections are of order one. The published estimate is only shown beside it.
 *
 * Both module rates are exactly quadratic in the source, so each is evaluated for a unit charge (1 C, at the actual
 * d, which its separation check needs) or a unit quadrupole scale (1 kg m²) and multiplied by q² or (m_eff d²)² in
 * the logarithm: the product never leaves the range of a double. Two edges the module cannot take are handled
 * here and flagged: a lab placed so close to the horizon that its areal radius rounds onto 2GM/c² (the Rindler
 * rate with the background's precise acceleration, the exact limit to O(ε) below double resolution), and a lab so
 * far away that the rate underflows (the exact far-zone law, FAR_ZONE_COEFFICIENT times the estimate, exact to
 * O(GM/(c²b))); gravity likewise in the logarithm. Flags raised: schwarzschild-multipole-check, schwarzschild-gravity-model, and the module's own
 * cautions as schwarzschild-exact:<code>.
 */
import type { FlagStatus, ValidityFlag } from "../result-basics";
import {
  FAR_ZONE_COEFFICIENT,
  GRAVITY_FAR_ZONE_CORRECTION_CAUTION,
  farZoneCorrectionSize,
  massLengthMetres,
  schwarzschildGravityFarZoneRate,
  schwarzschildHorizonRate,
  type SchwarzschildRateFlag,
} from "../horizon/schwarzschild-exact";
import { electromagneticChannel, log10HoldRateCoefficient } from "../spectra/channels";
import { c } from "../constants";
import {
  describeEstimate,
  log10SourceAmplitude,
  publishedEstimateRate,
  type EstimatedRate,
  type SchwarzschildHorizonRate,
  type SchwarzschildHorizonRateInput,
  type SchwarzschildHorizonRateModel,
  type SchwarzschildRateLab,
} from "./schwarzschild-horizon-rate";
import { formatNumber } from "../units";

const severityStatus: Record<SchwarzschildRateFlag["severity"], FlagStatus> = { info: "note", caution: "caution" };

function carried(flag: SchwarzschildRateFlag): ValidityFlag {
  return { code: `schwarzschild-exact:${flag.code}`, status: severityStatus[flag.severity], message: flag.message };
}

function isPositiveFinite(x: number): boolean {
  return x > 0 && Number.isFinite(x);
}

function multipoleFlag(status: "converged" | "not-converged" | "skipped", lMax: number | null, relativeTolerance: number | null, moduleFlags: SchwarzschildRateFlag[]): ValidityFlag {
  if (status === "converged") {
    return {
      code: "schwarzschild-multipole-check",
      status: "ok",
      message: `the Legendre multipole sum (ℓ ≤ ${lMax}) agrees with the closed-form horizon memory to ${formatNumber(relativeTolerance!, 2)}`,
      measure: relativeTolerance!,
    };
  }
  const reason = moduleFlags.find((f) => f.code === "multipole-check-skipped" || f.code === "multipole-check-not-converged");
  return {
    code: "schwarzschild-multipole-check",
    status: status === "skipped" ? "note" : "caution",
    message: reason?.message ?? "the Legendre multipole check was not run",
    ...(relativeTolerance === null ? {} : { measure: relativeTolerance }),
  };
}

function exactElectromagneticRate(input: SchwarzschildHorizonRateInput, estimate: EstimatedRate): SchwarzschildHorizonRate {
  const log10Charge = Math.log10(input.chargeOrEffectiveMass);
  const key = "schwarzschild-exact-em" as const;
  if (!(input.labArealRadiusMetres > 2 * massLengthMetres(input.massKg))) {
    const rindler = 2 * log10SourceAmplitude(input) + log10HoldRateCoefficient(electromagneticChannel, input.labProperAccelerationMetresPerSecondSquared / c);
    return {
      log10RatePerSecond: rindler,
      regime: "exact",
      sourceKey: key,
      estimate,
      flags: [
        { code: "schwarzschild-multipole-check", status: "not-applicable", message: "the lab's areal radius rounds onto the horizon: no multipole sum" },
        {
          code: "schwarzschild-exact:lab-radius-at-horizon-in-double",
          status: "caution",
          message:
            "the lab's areal radius is not distinguishable from 2GM/c² in double precision: the exact rate's near-horizon limit " +
            "(the Rindler rate with the lab's acceleration, which the exact rate equals to O(b/M − 2)) is reported",
        },
      ],
    };
  }
  const exact = schwarzschildHorizonRate({
    massKg: input.massKg,
    labArealRadiusMetres: input.labArealRadiusMetres,
    chargeCoulombs: 1,
    separationMetres: input.separationMetres,
    axis: input.axis,
  });
  const flags: ValidityFlag[] = [
    multipoleFlag(exact.multipoleStatus, exact.lMax, exact.relativeTolerance, exact.flags),
    ...exact.flags.filter((f) => !f.code.startsWith("multipole-check")).map(carried),
  ];
  if (isPositiveFinite(exact.ratePerLabSecond)) {
    return { log10RatePerSecond: 2 * log10Charge + Math.log10(exact.ratePerLabSecond), regime: "exact", sourceKey: key, estimate, flags };
  }
  flags.push({
    code: "schwarzschild-exact:far-zone-limit-used",
    status: "note",
    message: "the exact rate underflows a double this far out: its far-zone law (exact to O(GM/(c²b))) is reported, computed in the logarithm",
  });
  const coefficient = FAR_ZONE_COEFFICIENT[input.axis] / (4 * Math.PI);
  return { log10RatePerSecond: Math.log10(coefficient) + estimate.log10RatePerSecond, regime: "exact", sourceKey: key, estimate, flags };
}

/** Size GM/(c²b) of the corrections the leading-order gravitational rate leaves out, judged as in physics/flags.ts. */
function gravityModelFlag(correction: number): ValidityFlag {
  const size = `relative corrections of order GM/(c²b) = ${formatNumber(correction, 2)} (b = ${formatNumber(1 / correction)} GM/c²) are not computed`;
  const base = "gravitational hold rate: the far-zone tidal-heating rate, leading order in GM/(c²b), the same formula at every radius";
  if (correction <= GRAVITY_FAR_ZONE_CORRECTION_CAUTION) {
    return { code: "schwarzschild-gravity-model", status: "note", message: `${base}; ${size}`, measure: correction };
  }
  if (correction <= 0.1) {
    return { code: "schwarzschild-gravity-model", status: "caution", message: `${base}; ${size}: the rate is uncertain by about that fraction`, measure: correction };
  }
  return {
    code: "schwarzschild-gravity-model",
    status: "invalid",
    message:
      `${base}; ${size}: corrections of order one, so not even the order of magnitude is assured this close to the hole ` +
      "(the published order-of-magnitude estimate, the Rindler limit near the horizon, is shown beside it for comparison)",
    measure: correction,
  };
}

/**
 * The far-zone rate per unit quadrupole scale at every radius outside the horizon: the Killing-time rate is
 * continuous in b down to 2GM/c², and the lab's lapse comes from the background (accurate however close the lab
 * sits), so a lab whose areal radius rounds onto 2GM/c² still gets the limit of the same formula.
 */
function farZoneGravityRate(input: SchwarzschildHorizonRateInput, estimate: EstimatedRate): SchwarzschildHorizonRate {
  const horizon = 2 * massLengthMetres(input.massKg);
  const b = Math.max(input.labArealRadiusMetres, horizon * (1 + Number.EPSILON));
  const far = schwarzschildGravityFarZoneRate({ massKg: input.massKg, labArealRadiusMetres: b, bodyMassKg: 1, separationMetres: 1, axis: input.axis });
  const flags = [gravityModelFlag(farZoneCorrectionSize(input.massKg, input.labArealRadiusMetres))];
  const log10Quadrupole = 2 * log10SourceAmplitude(input);
  const base = { regime: "far-zone" as const, sourceKey: "schwarzschild-exact-gw-far-zone" as const, estimate, flags };
  if (isPositiveFinite(far.ratePerKillingSecond)) {
    return { ...base, log10RatePerSecond: log10Quadrupole + Math.log10(far.ratePerKillingSecond) - Math.log10(input.labRedshiftFactor) };
  }
  // So far out that the unit rate underflows: the same leading-order law, 96/(5π) or 26/(5π) times the published
  // far estimate (which carries the same lapse), in the logarithm.
  flags.push({ code: "schwarzschild-exact:far-zone-limit-used", status: "note", message: "the far-zone gravitational rate underflows a double this far out: it is computed in the logarithm" });
  return { ...base, log10RatePerSecond: Math.log10(GRAVITY_FAR_ZONE_RATIO[input.axis]) + estimate.log10RatePerSecond };
}

/** The far-zone gravitational rate over the published estimate with coefficient 1 (one branch stays, gravity-far-zone.ts). */
const GRAVITY_FAR_ZONE_RATIO = { radial: 96 / (5 * Math.PI), tangential: 26 / (5 * Math.PI) } as const;

function describeExact(lab: SchwarzschildRateLab): Pick<SchwarzschildHorizonRate, "regime" | "sourceKey"> {
  if (lab.channel === "electromagnetic") return { regime: "exact", sourceKey: "schwarzschild-exact-em" };
  return { regime: "far-zone", sourceKey: "schwarzschild-exact-gw-far-zone" };
}

export const exactHorizonRateModel: SchwarzschildHorizonRateModel = {
  name: "exact horizon-method rate (electromagnetism, every radius; gravity, far zone), with the published estimate beside it",
  rate(input) {
    const estimate = publishedEstimateRate(input);
    return input.channel === "electromagnetic" ? exactElectromagneticRate(input, estimate) : farZoneGravityRate(input, estimate);
  },
  describe: describeExact,
};

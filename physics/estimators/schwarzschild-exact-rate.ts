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
 * Below b = GRAVITY_FAR_ZONE_MIN_B_OVER_M·GM/c² that formula does not hold and no exact near-zone gravity is
 * computed: the published estimate (near-horizon, interpolated or far) is reported instead, with a caution.
 *
 * Both module rates are exactly quadratic in the source, so each is evaluated for a unit charge (1 C, at the actual
 * d, which its separation check needs) or a unit quadrupole scale (1 kg m²) and multiplied by q² or (m_eff d²)² in
 * the logarithm: the product never leaves the range of a double. Two edges the module cannot take are handled
 * here and flagged: a lab placed so close to the horizon that its areal radius rounds onto 2GM/c² (the Rindler
 * rate with the background's precise acceleration, the exact limit to O(ε) below double resolution), and a lab so
 * far away that the rate underflows (the exact far-zone law, FAR_ZONE_COEFFICIENT times the estimate, exact to
 * O(GM/(c²b))). Flags raised: schwarzschild-multipole-check, schwarzschild-gravity-model, and the module's own
 * cautions as schwarzschild-exact:<code>.
 */
import type { FlagStatus, ValidityFlag } from "../result";
import {
  FAR_ZONE_COEFFICIENT,
  GRAVITY_FAR_ZONE_MIN_B_OVER_M,
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
      message: `the Legendre multipole sum (ℓ ≤ ${lMax}) agrees with the closed-form horizon memory to ${relativeTolerance!.toExponential(1)}`,
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

function gravityModelFlag(status: FlagStatus, message: string, measure: number): ValidityFlag {
  return { code: "schwarzschild-gravity-model", status, message, measure };
}

function farZoneGravityRate(input: SchwarzschildHorizonRateInput, estimate: EstimatedRate): SchwarzschildHorizonRate {
  const bOverM = input.labArealRadiusMetres / massLengthMetres(input.massKg);
  const fallback = (why: string): SchwarzschildHorizonRate => ({
    ...estimate,
    estimate: null,
    flags: [gravityModelFlag("caution", `${why}; the published estimate (${estimate.regime}) is reported as the gravitational hold rate`, bOverM)],
  });
  if (bOverM < GRAVITY_FAR_ZONE_MIN_B_OVER_M) {
    return fallback(
      `b = ${bOverM.toPrecision(3)} GM/c² is inside ${GRAVITY_FAR_ZONE_MIN_B_OVER_M} GM/c², where the far-zone tidal-heating rate does not hold ` +
        "and no exact near-zone gravitational rate is computed",
    );
  }
  const far = schwarzschildGravityFarZoneRate({
    massKg: input.massKg,
    labArealRadiusMetres: input.labArealRadiusMetres,
    bodyMassKg: 1,
    separationMetres: 1,
    axis: input.axis,
  });
  if (!isPositiveFinite(far.ratePerLabSecond)) return fallback("the far-zone rate underflows a double this far out");
  return {
    log10RatePerSecond: 2 * log10SourceAmplitude(input) + Math.log10(far.ratePerLabSecond),
    regime: "far-zone",
    sourceKey: "schwarzschild-exact-gw-far-zone",
    estimate,
    flags: [
      gravityModelFlag(
        "note",
        `far-zone gravitational rate (tidal heating of the hole, leading order in GM/(c²b), b = ${bOverM.toPrecision(3)} GM/c²); ` +
          "the exact near-zone gravitational rate is not computed",
        bOverM,
      ),
    ],
  };
}

function describeExact(lab: SchwarzschildRateLab): Pick<SchwarzschildHorizonRate, "regime" | "sourceKey"> {
  if (lab.channel === "electromagnetic") return { regime: "exact", sourceKey: "schwarzschild-exact-em" };
  const inFarZone = lab.labArealRadiusMetres / massLengthMetres(lab.massKg) >= GRAVITY_FAR_ZONE_MIN_B_OVER_M;
  return inFarZone ? { regime: "far-zone", sourceKey: "schwarzschild-exact-gw-far-zone" } : describeEstimate(lab);
}

export const exactHorizonRateModel: SchwarzschildHorizonRateModel = {
  name: "exact horizon-method rate (electromagnetism, every radius; gravity, far zone), with the published estimate beside it",
  rate(input) {
    const estimate = publishedEstimateRate(input);
    return input.channel === "electromagnetic" ? exactElectromagneticRate(input, estimate) : farZoneGravityRate(input, estimate);
  },
  describe: describeExact,
};

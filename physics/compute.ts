/**
 * computeScenario: a scenario document in, a typed result out (physics/result.ts). Pure: the same in Node, the
 * browser and a web worker. computeScenarioFromJson takes unknown JSON (any schema version), parses and upgrades
 * it, and answers either the result or the list of {path, message} issues; it never throws on bad input.
 */
import { BackgroundInputError, makeBackground, type Background } from "./backgrounds";
import { hbar, kB } from "./constants";
import { decoherenceFromQuanta, decoherenceTimeFromRate, visibilityFromQuanta } from "./decoherence";
import { channelResult, type ChannelEstimate } from "./estimators/channel-estimate";
import { electromagneticSource, gravitationalSource, type ChannelSource } from "./estimators/channel-source";
import { farFieldEstimate } from "./estimators/far-field";
import { log10Sum, quantityFromLog10, quantityFromValue } from "./estimators/quantity";
import { schwarzschildEstimate } from "./estimators/schwarzschild";
import { exactHorizonRateModel } from "./estimators/schwarzschild-exact-rate";
import type { SchwarzschildHorizonRateModel } from "./estimators/schwarzschild-horizon-rate";
import { thermalHorizonEstimate } from "./estimators/thermal-horizon";
import { environmentBudget } from "./environment/from-document";
import { validityFlags } from "./flags";
import { peakBranchSpeed, separationHistory } from "./protocols";
import type { SeparationHistory } from "./protocols/types";
import { RESULT_FORMAT_VERSION, type ChannelResult, type ComputeOutcome, type ScenarioResult } from "./result";
import { ScenarioInputError } from "./scenario/input-error";
import { rangeIssues } from "./scenario/ranges";
import { parseScenarioDocument, type ScenarioDocument } from "./scenario/schema";

export interface ComputeOptions {
  /**
   * The Schwarzschild hold-rate model; default: exactHorizonRateModel (physics/estimators/schwarzschild-exact-rate.ts),
   * which reports the published estimate beside it. publishedEstimateRateModel reports the estimate alone.
   */
  schwarzschildRateModel?: SchwarzschildHorizonRateModel;
}

/** α = 2π k_B T_local / ħ (s⁻¹): a/c for Rindler, √(a² + c²H²)/c for de Sitter. */
function thermalRatePerSecond(background: Background): number {
  return (2 * Math.PI * kB * background.labLocalTemperatureKelvin) / hbar;
}

function estimateChannel(
  document: ScenarioDocument,
  history: SeparationHistory,
  background: Background,
  source: ChannelSource,
  options: ComputeOptions,
): ChannelEstimate {
  const resolution = document.numerics.kinkTimeResolutionSeconds;
  switch (document.background.kind) {
    case "minkowski":
      return farFieldEstimate(history, source, resolution);
    case "rindler":
    case "de-sitter":
      return thermalHorizonEstimate(history, source, document.background.kind, thermalRatePerSecond(background), resolution);
    case "schwarzschild":
      return schwarzschildEstimate(
        history,
        source,
        {
          massKg: document.background.massKg,
          labArealRadiusMetres: background.labRadiusMetres,
          labRedshiftFactor: background.labRedshiftFactor,
          labProperAccelerationMetresPerSecondSquared: background.labProperAccelerationMetresPerSecondSquared,
          axis: document.separation.axis,
        },
        options.schwarzschildRateModel ?? exactHorizonRateModel,
        resolution,
      );
  }
}

function smoothnessOf(history: SeparationHistory): ScenarioResult["protocol"]["smoothness"] {
  if (history.kinks.some((k) => k.kind === "jump")) return "discontinuous";
  if (history.kinks.length > 0) return "kinked";
  return history.windows.some((w) => w.smoothness < 2) ? "acceleration-jumps" : "smooth";
}

function combine(electromagnetic: ChannelResult, gravitational: ChannelResult): ScenarioResult["combined"] {
  const log10Of = (q: ChannelResult["totalQuanta"]) => (q.log10 === null ? -Infinity : q.log10);
  const total = log10Sum(log10Of(electromagnetic.totalQuanta), log10Of(gravitational.totalQuanta));
  const rate = log10Sum(log10Of(electromagnetic.holdRate), log10Of(gravitational.holdRate));
  return {
    totalQuanta: quantityFromLog10(total, "1", "combined-channels"),
    decoherence: decoherenceFromQuanta(total),
    visibility: visibilityFromQuanta(total),
    decoherenceTime: decoherenceTimeFromRate(rate),
  };
}

/**
 * Computes a parsed scenario document. Throws ScenarioInputError or BackgroundInputError (each with a document
 * path) for a document that parses but cannot be computed; computeScenarioFromJson turns those into issues.
 */
export function computeScenario(document: ScenarioDocument, options: ComputeOptions = {}): ScenarioResult {
  const outOfRange = rangeIssues(document);
  if (outOfRange.length > 0) throw new ScenarioInputError(outOfRange[0].path, outOfRange[0].message);
  const history = separationHistory(document);
  const background = makeBackground(document.background, document.lab);
  const estimates = [electromagneticSource(document, history), gravitationalSource(document, history)].map((source) => estimateChannel(document, history, background, source, options));
  const [electromagnetic, gravitational] = estimates.map(channelResult);
  const speed = peakBranchSpeed(history, document.separation.split);
  const combined = combine(electromagnetic, gravitational);
  const environment = environmentBudget(document, { history, split: document.separation.split }, [electromagnetic, gravitational]);
  const result: Omit<ScenarioResult, "flags"> = {
    resultVersion: RESULT_FORMAT_VERSION,
    documentSchemaVersion: document.schemaVersion,
    background: {
      kind: document.background.kind,
      labProperAcceleration: quantityFromValue(background.labProperAccelerationMetresPerSecondSquared, "m s^-2", "background-lab"),
      labRedshiftFactor: quantityFromValue(background.labRedshiftFactor, "1", "background-lab"),
      labLocalTemperature: quantityFromValue(background.labLocalTemperatureKelvin, "K", "background-lab"),
      labProperDistanceToHorizon:
        background.labProperDistanceToHorizonMetres === null ? null : quantityFromValue(background.labProperDistanceToHorizonMetres, "m", "background-lab"),
    },
    protocol: {
      kind: history.protocolKind,
      totalDuration: quantityFromValue(history.totalDurationSeconds, "s", "protocol-kinematics"),
      peakSeparation: quantityFromValue(history.peakSeparationMetres, "m", "protocol-kinematics"),
      peakBranchSpeed: quantityFromValue(speed, "m s^-1", "protocol-kinematics"),
      smoothness: smoothnessOf(history),
      kinks: history.kinks,
      interpolation: history.interpolation,
    },
    electromagnetic,
    gravitational,
    combined,
    environment,
  };
  const reported = [electromagnetic, gravitational].flatMap((ch) => [
    ...(["totalQuanta", "rampDrivenQuanta", "holdDrivenQuanta", "holdRate", "decoherenceTime"] as const).map((field) => ({ name: `${ch.channel}.${field}`, quantity: ch[field] })),
    ...(ch.comparison === null
      ? []
      : (["estimateHoldRate", "ratioExactToEstimate"] as const).map((field) => ({ name: `${ch.channel}.comparison.${field}`, quantity: ch.comparison![field] }))),
  ]);
  reported.push({ name: "combined.totalQuanta", quantity: combined.totalQuanta }, { name: "combined.decoherenceTime", quantity: combined.decoherenceTime });
  if (environment) {
    for (const ch of environment.channels) reported.push({ name: `environment.${ch.channel}.totalQuanta`, quantity: ch.totalQuanta }, { name: `environment.${ch.channel}.holdRate`, quantity: ch.holdRate });
    reported.push({ name: "environment.total.totalQuanta", quantity: environment.total.totalQuanta });
  }
  const channelFlags = environment ? environment.channels.flatMap((ch) => ch.flags.map((f) => ({ ...f, code: `environment:${f.code}` }))) : [];
  const environmentFlags = [...(environment?.flags ?? []), ...channelFlags.filter((f, i) => channelFlags.findIndex((g) => g.code === f.code) === i)]; // the thermal channels share their size and material checks
  return {
    ...result,
    flags: [...validityFlags({
      document,
      history,
      background,
      peakBranchSpeedMetresPerSecond: speed,
      electromagnetic,
      gravitational,
      reported,
      modelFlags: estimates.flatMap((e) => e.modelFlags),
    }), ...environmentFlags],
  };
}

/** Parses (and upgrades) unknown JSON, then computes it: the result, or the issues with their document paths. */
export function computeScenarioFromJson(input: unknown, options: ComputeOptions = {}): ComputeOutcome {
  const parsed = parseScenarioDocument(input);
  if (!parsed.ok) return { ok: false, issues: parsed.issues };
  return computeParsedScenario(parsed.document, options);
}

/** Computes a parsed document: the result, or the issues of a document that parses but cannot be computed. */
export function computeParsedScenario(document: ScenarioDocument, options: ComputeOptions = {}): ComputeOutcome {
  const outOfRange = rangeIssues(document);
  if (outOfRange.length > 0) return { ok: false, issues: outOfRange };
  try {
    return { ok: true, result: computeScenario(document, options) };
  } catch (error) {
    if (error instanceof ScenarioInputError || error instanceof BackgroundInputError) {
      return { ok: false, issues: [{ path: error.path, message: error.message }] };
    }
    // A quantity that overflowed or lost every digit (physics/estimators/quantity.ts): a combination of parameters,
    // each inside its range, that the engine still cannot compute. Said in words, not thrown at the caller.
    if (error instanceof RangeError) {
      return { ok: false, issues: [{ path: "", message: `this combination of parameters cannot be computed (${error.message}); move a parameter away from the extremes of its range` }] };
    }
    throw error;
  }
}

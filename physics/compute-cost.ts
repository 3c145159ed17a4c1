/**
 * What a computation will cost, estimated from the document alone before any of it runs, so that a server can
 * refuse a document whose numerics ask for more than it will spend on one request.
 *
 * The engine's cost drivers (physics/estimators/ramp-quanta.ts): per radiating channel and per window group, one
 * transform of n samples, n a power of two up to MAX_SAMPLES = 2^18; every sample evaluates the profile once. n is
 * 512 per shortest moving window for a smooth profile (doubled until converged), and for a profile with kinks
 * (velocity jumps for the dipole, acceleration jumps for the quadrupole) the shortest window divided by
 * numerics.kinkTimeResolutionSeconds — the one field that can ask for 2^18 samples at once. One sample costs a
 * closed-form evaluation (segments, sampled profiles) or a walk of the formula's parsed tree (formula protocols,
 * whose kinks are also searched on a fixed grid first). A sampled profile adds its own set-up, linear in its points.
 *
 * Units: one work unit is about one microsecond of one core of the 2-core reference machine (calibrated by timing
 * computeScenarioFromJson: a closed-form sample with its share of the transform ≈ 1 µs; a formula sample ≈ 3 µs plus
 * 1/8 µs per node of its tree; a sampled profile's point ≈ 1.5 µs of set-up). Only the first level of a smooth
 * profile's doubling is counted: the rest depends on how fast it converges, which only the computation knows (a
 * server's time budget covers it).
 */
import { MAX_FEATURE_PROBES } from "./protocols/kinks";
import { formulaNodeCount } from "./protocols/formula";
import { rampShapes } from "./protocols/ramp-shapes";
import { BASE_SAMPLES_PER_SHORTEST_WINDOW, DEFAULT_KINK_SAMPLES, MAX_SAMPLES, kinkSamplesPerShortestWindow, samplesForGroup } from "./estimators/ramp-quanta";
import { SEPARATE_WHEN_GAP_EXCEEDS } from "./spectra/window-groups";
import type { ScenarioDocument, SchemaIssue } from "./scenario/schema";

/** Work units (≈ µs of one core) a server computes for one document at most: about a second. */
export const COMPUTE_COST_CEILING = 1_500_000;

const CLOSED_FORM_SAMPLE_UNITS = 1;
const FORMULA_SAMPLE_UNITS = 3;
const FORMULA_NODE_UNITS = 1 / 8;
const SAMPLED_POINT_UNITS = 1.5;

type ChannelName = "electromagnetic" | "gravitational";

/** Continuous derivatives of σ each channel needs (ChannelDefinition.smoothnessNeeded). */
const SMOOTHNESS_NEEDED: Record<ChannelName, number> = { electromagnetic: 1, gravitational: 2 };

export interface ChannelCost {
  channel: ChannelName;
  /** Window groups transformed, and the samples of the largest. */
  groups: number;
  samples: number;
  /** Whether the count is taken at the kink resolution (the stated numerics, or the default). */
  atKinkResolution: boolean;
  units: number;
}

export interface ComputeCostEstimate {
  /** Estimated work units in all (≈ µs of one core). */
  units: number;
  channels: ChannelCost[];
  /** Work units of one profile evaluation. */
  unitsPerSample: number;
  /** Work units spent before the transforms (kink search of a formula, set-up of a sampled profile). */
  setupUnits: number;
}

interface ProtocolShape {
  /** Durations of the window groups, and of the shortest moving window inside each. */
  groups: { seconds: number; shortestSeconds: number }[];
  unitsPerSample: number;
  setupUnits: number;
  /** Smoothness of the profile (0 kinked, 1 acceleration jumps, 2 smooth), or null when only computing tells. */
  smoothness: 0 | 1 | 2 | null;
  peakSeparationMetres: number;
}

function protocolShape(document: ScenarioDocument): ProtocolShape {
  const protocol = document.protocol;
  switch (protocol.kind) {
    case "segments": {
      const up = protocol.separation.durationSeconds;
      const down = protocol.recombination.durationSeconds;
      const together = protocol.hold.durationSeconds < SEPARATE_WHEN_GAP_EXCEEDS * (up + down);
      const shortestSeconds = Math.min(up, down);
      return {
        groups: together ? [{ seconds: up + protocol.hold.durationSeconds + down, shortestSeconds }] : [{ seconds: up, shortestSeconds: up }, { seconds: down, shortestSeconds: down }],
        unitsPerSample: CLOSED_FORM_SAMPLE_UNITS,
        setupUnits: 0,
        smoothness: Math.min(rampShapes[protocol.separation.shape].smoothness, rampShapes[protocol.recombination.shape].smoothness) as 0 | 1 | 2,
        peakSeparationMetres: document.separation.distanceMetres,
      };
    }
    case "formula": {
      const unitsPerSample = FORMULA_SAMPLE_UNITS + FORMULA_NODE_UNITS * formulaNodeCount(protocol.expression);
      return {
        groups: [{ seconds: protocol.durationSeconds, shortestSeconds: protocol.durationSeconds }],
        unitsPerSample,
        setupUnits: MAX_FEATURE_PROBES * unitsPerSample,
        smoothness: null,
        peakSeparationMetres: document.separation.distanceMetres,
      };
    }
    case "sampled": {
      const samples = protocol.samples;
      const seconds = samples[samples.length - 1].timeSeconds - samples[0].timeSeconds;
      return {
        groups: [{ seconds, shortestSeconds: seconds }],
        unitsPerSample: CLOSED_FORM_SAMPLE_UNITS,
        setupUnits: SAMPLED_POINT_UNITS * samples.length,
        smoothness: protocol.interpolation === "linear" ? 0 : 2,
        peakSeparationMetres: samples.reduce((peak, s) => Math.max(peak, Math.abs(s.separationMetres)), 0),
      };
    }
  }
}

/** The channels that radiate at all (physics/estimators/channel-source.ts: the others are exactly zero, never transformed). */
function radiatingChannels(document: ScenarioDocument, peakSeparationMetres: number): ChannelName[] {
  if (peakSeparationMetres === 0) return [];
  const channels: ChannelName[] = [];
  if (document.source.chargeCoulombs !== 0) channels.push("electromagnetic");
  if (document.source.massKg !== 0 && document.separation.split !== "symmetric") channels.push("gravitational");
  return channels;
}

/** Samples of one group's transform at the kink resolution, or at the first level of the doubling. */
function groupSamples(group: ProtocolShape["groups"][number], shortestSeconds: number, kinked: boolean, resolution: number | null): number {
  const perShortest = kinked ? kinkSamplesPerShortestWindow(shortestSeconds, resolution) : BASE_SAMPLES_PER_SHORTEST_WINDOW;
  return samplesForGroup(group.seconds, group.shortestSeconds, perShortest);
}

/**
 * The estimated cost of computing a parsed document. A formula's smoothness is known only once its kinks are
 * searched, so a formula is costed at the larger of the kinked and the smooth first level.
 */
export function estimateComputeCost(document: ScenarioDocument): ComputeCostEstimate {
  const shape = protocolShape(document);
  const resolution = document.numerics.kinkTimeResolutionSeconds;
  const shortestSeconds = Math.min(...shape.groups.map((g) => g.shortestSeconds));
  const channels = radiatingChannels(document, shape.peakSeparationMetres).map((channel): ChannelCost => {
    const kinked = shape.smoothness === null ? "either" : shape.smoothness < SMOOTHNESS_NEEDED[channel];
    const samplesOf = (group: ProtocolShape["groups"][number]) =>
      kinked === "either"
        ? Math.max(groupSamples(group, shortestSeconds, true, resolution), groupSamples(group, shortestSeconds, false, resolution))
        : groupSamples(group, shortestSeconds, kinked, resolution);
    const perGroup = shape.groups.map(samplesOf);
    const totalSamples = perGroup.reduce((sum, n) => sum + n, 0);
    return {
      channel,
      groups: shape.groups.length,
      samples: Math.max(...perGroup),
      atKinkResolution: kinked !== false,
      units: totalSamples * shape.unitsPerSample,
    };
  });
  const units = shape.setupUnits + channels.reduce((sum, c) => sum + c.units, 0);
  return { units, channels, unitsPerSample: shape.unitsPerSample, setupUnits: shape.setupUnits };
}

const format = (x: number) => (x >= 1e4 ? x.toExponential(2) : x.toPrecision(3));

/**
 * null when the document's estimated cost is within the ceiling; else the fields to change, each with what to do,
 * for a refusal that says which numerics to relax (a path, a message, as schema issues are).
 */
export function computeCostRefusal(document: ScenarioDocument, ceiling = COMPUTE_COST_CEILING): SchemaIssue[] | null {
  const estimate = estimateComputeCost(document);
  if (estimate.units <= ceiling) return null;
  const over = `about ${format(estimate.units)} work units (≈ µs of one core) against a ceiling of ${format(ceiling)}`;
  const issues: SchemaIssue[] = [];
  const atResolution = estimate.channels.filter((c) => c.atKinkResolution);
  const resolution = document.numerics.kinkTimeResolutionSeconds;
  const largestSamples = Math.max(0, ...atResolution.map((c) => c.samples));
  if (atResolution.length > 0 && resolution !== null && largestSamples > DEFAULT_KINK_SAMPLES) {
    // The transforms fit when the samples shrink by the overshoot; the time step grows by the same factor.
    const transformUnits = estimate.units - estimate.setupUnits;
    const room = Math.max(0, ceiling - estimate.setupUnits);
    const factor = room > 0 ? transformUnits / room : Infinity;
    // The step in effect: the stated one, or coarser where the samples hit MAX_SAMPLES; ×2 for the rounding to powers of two.
    const longestGroupSeconds = Math.max(...protocolShape(document).groups.map((g) => g.seconds));
    const stepInEffect = Math.max(resolution, longestGroupSeconds / largestSamples);
    const coarser = Number.isFinite(factor) ? Number(format(stepInEffect * Math.max(1, factor) * 2)) : null;
    // Offered only when it is enough: the set-up and a smooth profile's first level do not shrink with the step.
    const fits = (step: number) => estimateComputeCost({ ...document, numerics: { ...document.numerics, kinkTimeResolutionSeconds: step } }).units <= ceiling;
    const step = coarser !== null && fits(coarser) ? coarser : null;
    issues.push({
      path: "numerics.kinkTimeResolutionSeconds",
      message:
        `a kink time resolution of ${format(resolution)} s samples the profile ${largestSamples.toLocaleString("en")} times per channel ` +
        `(at most ${MAX_SAMPLES.toLocaleString("en")}): ${over}. ` +
        (step === null
          ? "No coarser step alone brings it within the ceiling: change the protocol named below, or clear it (null) for the default of 1/1024 of the shortest moving window"
          : `Use a coarser step, at least ${format(step)} s, or clear it (null) for the default of 1/1024 of the shortest moving window`),
    });
  }
  if (document.protocol.kind === "formula") {
    issues.push({
      path: "protocol.expression",
      message: `every sample evaluates the formula's ${formulaNodeCount(document.protocol.expression)} nodes: ${over}. Shorten the formula, or use a segments or sampled protocol`,
    });
  }
  if (document.protocol.kind === "sampled") {
    issues.push({
      path: "protocol.samples",
      message: `${document.protocol.samples.length.toLocaleString("en")} samples: ${over}. Thin the profile, or use cubic-spline interpolation (no kinks to resolve)`,
    });
  }
  if (issues.length === 0) issues.push({ path: "protocol", message: `this protocol costs ${over}: shorten it or make its ramps fewer` });
  return issues;
}

/**
 * The result of computing a scenario: typed, JSON-safe (no Infinity or NaN), every number with its unit and the
 * key of the `sources` entry (physics/estimators/sources.ts) that says where its formula comes from.
 */
import type { BackgroundKind } from "./scenario/schema";
import type { EnvironmentBudget } from "./environment/types";
import type { Channel, FlagStatus, KinkReport, Quantity, ValidityFlag } from "./result-basics";

export type { Channel, FlagStatus, KinkReport, Quantity, ValidityFlag };

export const RESULT_FORMAT_VERSION = 1 as const;

/** How the hold rate of a channel was obtained. */
export type RateRegime =
  | "none" // flat spacetime: a held superposition does not decohere
  | "thermal-spectrum" // Rindler, de Sitter: the spectral formula along the lab's worldline
  | "exact" // Schwarzschild, electromagnetism: the exact horizon-method rate, at every radius
  | "far-zone" // Schwarzschild, gravity: the far-zone rate, leading order in GM/(c²b)
  | "far" // Schwarzschild, published large-distance estimate
  | "near-horizon" // Schwarzschild, Rindler limit with the lab's local acceleration
  | "interpolated"; // Schwarzschild, between the two, interpolated in the logarithm

/** The regimes of the published Schwarzschild estimate. */
export type EstimateRegime = "far" | "near-horizon" | "interpolated";

/**
 * The published order-of-magnitude estimate beside a computed Schwarzschild hold rate (the exact electromagnetic
 * rate, or the far-zone gravitational rate), for comparison.
 */
export interface HorizonRateComparison {
  /** The published estimate of the hold rate at the same lab and source, per second of lab proper time. */
  estimateHoldRate: Quantity;
  /** holdRate / estimateHoldRate. */
  ratioExactToEstimate: Quantity;
  estimateRegime: EstimateRegime;
}

export interface Convergence {
  /** |N(2n) − N(n)| / N(2n) at the last doubling of the samples per moving window; 0 when N is exactly zero. */
  relativeChange: number;
  converged: boolean;
  /** Samples across each moving window at the reported level, and the zero-padded FFT length. */
  samplesPerWindow: number;
  transformLength: number;
  /** "separate-ramps": each ramp transformed alone, their interference added in the time domain; "whole-protocol": one transform. */
  mode: "separate-ramps" | "whole-protocol" | "none";
  /** Time step of the reported level, seconds. */
  timeStepSeconds: number;
}

export interface ChannelResult {
  channel: Channel;
  /** Source amplitude: q·d for electromagnetism (C m), the quadrupole difference scale m·d² for gravity (kg m²). */
  sourceStrength: Quantity;
  /** Why the channel is exactly zero (no charge, no separation, symmetric split for gravity), or null. */
  exactZeroReason: string | null;
  totalQuanta: Quantity;
  /** Driven by the ramps: falls as the ramps get slower. */
  rampDrivenQuanta: Quantity;
  /** Driven by the zero-frequency field noise over the time spent apart: grows linearly with the hold. */
  holdDrivenQuanta: Quantity;
  /** Quanta reaching null infinity, where that count is distinct from the horizon's (Minkowski, Schwarzschild); else null. */
  farFieldQuanta: Quantity | null;
  /** Quanta into the horizon, where distinct from the far-field count (Schwarzschild); else null. */
  horizonQuanta: Quantity | null;
  /** Hold-driven quanta per second of lab proper time at full separation. */
  holdRate: Quantity;
  regime: RateRegime;
  /** Schwarzschild, when holdRate is computed (not itself the estimate) and the channel is not exactly zero; else null. */
  comparison: HorizonRateComparison | null;
  decoherence: Quantity;
  visibility: Quantity;
  /** Hold time at which the hold-driven part reaches one quantum; null where there is no hold-driven part. */
  decoherenceTime: Quantity | null;
  convergence: Convergence;
}

export interface ProtocolSummary {
  kind: "segments" | "formula" | "sampled";
  totalDuration: Quantity;
  peakSeparation: Quantity;
  peakBranchSpeed: Quantity;
  /** "smooth": acceleration continuous; "acceleration-jumps": velocity continuous only; "kinked": velocity jumps; "discontinuous": the separation jumps. */
  smoothness: "smooth" | "acceleration-jumps" | "kinked" | "discontinuous";
  kinks: KinkReport[];
  /** Interpolation used for a sampled profile; null otherwise. */
  interpolation: string | null;
}

export interface BackgroundSummary {
  kind: BackgroundKind;
  labProperAcceleration: Quantity;
  labRedshiftFactor: Quantity;
  labLocalTemperature: Quantity;
  labProperDistanceToHorizon: Quantity | null;
}

export interface ScenarioResult {
  resultVersion: typeof RESULT_FORMAT_VERSION;
  documentSchemaVersion: number;
  background: BackgroundSummary;
  protocol: ProtocolSummary;
  electromagnetic: ChannelResult;
  gravitational: ChannelResult;
  /** Both channels together: the field states are independent, so the overlaps multiply and the counts add. */
  combined: {
    totalQuanta: Quantity;
    decoherence: Quantity;
    visibility: Quantity;
    decoherenceTime: Quantity | null;
  };
  /** The lab's environment beside the field channels (schema version 2); null for an isolated body. */
  environment: EnvironmentBudget | null;
  flags: ValidityFlag[];
}

export interface ComputeIssue {
  /** Dotted path into the document, e.g. "protocol.hold.durationSeconds"; "" for the whole document. */
  path: string;
  message: string;
}

export type ComputeOutcome = { ok: true; result: ScenarioResult } | { ok: false; issues: ComputeIssue[] };

/**
 * What every environmental channel takes and returns. A channel is a decoherence function F(x_A, x_B) of the two
 * branch positions (s⁻¹): the literature writes the coherence as e^{−Ft} (F = ΛΔx² at long wavelength, F = γ when
 * saturated), and Branchline reports ⟨N⟩ with |⟨ψ_A|ψ_B⟩| = e^{−⟨N⟩/2}, so d⟨N⟩/dt = 2F and
 * ⟨N⟩ = 2∫F(x_A(t), x_B(t)) dt over the whole protocol — the ramps' partial separation counted, not only the hold.
 */
import type { SeparationHistory } from "../protocols/types";
import type { Quantity, ValidityFlag } from "../result-basics";
import type { SeparationSpec } from "../scenario/schema";
import type { SourceKey } from "../estimators/sources";

export type EnvironmentChannel = "gas" | "thermal-scattering" | "thermal-absorption" | "thermal-emission" | "surface";

/**
 * long-wavelength: Δx below the crossover, F = ΛΔx²; saturated: every event resolves the path, F = γ;
 * crossover: between the two (the joined form is used throughout); quasi-static-image: the warm surface's
 * fluctuation–dissipation rate; none: the channel is exactly zero.
 */
export type EnvironmentRegime = "long-wavelength" | "crossover" | "saturated" | "quasi-static-image" | "none";

/** The protocol as the environment sees it: the separation history and where each branch sits in it. */
export interface BranchPaths {
  history: SeparationHistory;
  split: SeparationSpec["split"];
}

export interface EnvironmentChannelResult {
  channel: EnvironmentChannel;
  /** Why the channel is exactly zero (no gas, no absorption, no charge…), or null. */
  exactZeroReason: string | null;
  /** ⟨N⟩ = 2∫F dt over the protocol. */
  totalQuanta: Quantity;
  /** d⟨N⟩/dt = 2F at full separation, per second. */
  holdRate: Quantity;
  regime: EnvironmentRegime;
  sourceKey: SourceKey;
  decoherence: Quantity;
  visibility: Quantity;
  /** 1/holdRate; null when the channel is exactly zero. */
  decoherenceTime: Quantity | null;
  flags: ValidityFlag[];
}

export type MarginParameter = "gas-pressure" | "surroundings-temperature" | "internal-temperature" | "surface-distance";

export type MarginOutcome =
  | { kind: "crossing"; value: Quantity }
  | { kind: "already-below" }
  | { kind: "not-reachable"; reason: string };

export interface ChannelMargin {
  channel: EnvironmentChannel;
  parameter: MarginParameter;
  current: Quantity;
  outcome: MarginOutcome;
}

/** The environment block of a result: every channel, the whole budget with the body's own fields, the margins. */
export interface EnvironmentBudget {
  channels: EnvironmentChannelResult[];
  /** Every channel together, the body's own fields included: counts add, overlaps multiply. */
  total: { totalQuanta: Quantity; decoherence: Quantity; visibility: Quantity; decoherenceTime: Quantity | null };
  /** The channel with the largest ⟨N⟩ ("electromagnetic", "gravitational" or an environmental channel); null when all are zero. */
  dominantChannel: string | null;
  margins: ChannelMargin[];
  /** Checks on the block as a whole (the body's density); each channel carries its own. */
  flags: ValidityFlag[];
}

/**
 * The Budget's channel table: one row per channel that leaks which-path information — the body's own fields
 * (quanta to null infinity, quanta into the horizon; electromagnetic and gravitational counts added) and each environmental
 * channel the scenario switches on — with its ⟨N⟩, its share of the whole, and which one dominates; then the whole
 * budget's total, decoherence and decoherence time, and the margin of each environmental channel in words.
 * Pure: a ScenarioResult in, rows out.
 */
import { log10Sum } from "@/physics/estimators/quantity";
import type { ChannelMargin, EnvironmentChannel, MarginParameter } from "@/physics/environment";
import type { ChannelResult, Quantity, ScenarioResult } from "@/physics/result";
import { bothChannels } from "./both-channels";

export type ChannelRowKey = "far-field" | "horizon" | "fields-ramps" | "fields-hold" | EnvironmentChannel;

export interface ChannelRow {
  key: ChannelRowKey;
  words: string;
  quanta: Quantity;
  /** ⟨N⟩ over the whole budget's ⟨N⟩, between 0 and 1; null when the whole budget is exactly zero. */
  share: number | null;
  /** The largest ⟨N⟩ of the table (never marked when every row is zero). */
  dominant: boolean;
  /** Why the row is exactly zero, when the physics says. */
  exactZeroReason: string | null;
}

export interface MarginRow {
  channel: EnvironmentChannel;
  channelWords: string;
  parameterWords: string;
  current: Quantity;
  outcome: { kind: "crossing"; value: Quantity } | { kind: "already-below" } | { kind: "not-reachable"; reason: string };
}

export interface ChannelTable {
  rows: ChannelRow[];
  /** The dominant row's words, or null when every channel is exactly zero. */
  dominantWords: string | null;
  total: Quantity;
  decoherence: Quantity;
  decoherenceTime: Quantity | null;
  margins: MarginRow[];
  /** False for an isolated body (no environment block): the table holds the field channels alone. */
  hasEnvironment: boolean;
}

export const ENVIRONMENT_CHANNEL_WORDS: Record<EnvironmentChannel, string> = {
  gas: "Residual gas",
  "thermal-scattering": "Thermal scattering",
  "thermal-absorption": "Thermal absorption",
  "thermal-emission": "Thermal emission",
  surface: "Nearby surface",
};

export const MARGIN_PARAMETER_WORDS: Record<MarginParameter, string> = {
  "gas-pressure": "gas pressure",
  "surroundings-temperature": "surroundings temperature",
  "internal-temperature": "internal temperature",
  "surface-distance": "surface distance",
};

/** log10 of a count: −Infinity for an exact zero. */
function log10OfCount(q: Quantity): number {
  if (q.log10 !== null) return q.log10;
  return q.value === 0 ? -Infinity : Infinity;
}

const zeroReasonOf = (channels: ChannelResult[]) => (channels.every((c) => c.exactZeroReason) ? channels.map((c) => c.exactZeroReason).join("; ") : null);

/**
 * The field rows, whose ⟨N⟩ add up to the field channels' total: in flat spacetime everything goes to null infinity;
 * near a black hole the ramps radiate to ℐ⁺ and the hold feeds the horizon; in the Rindler wedge and the de Sitter
 * static patch the quanta into the horizon are the ones reaching infinity, so the rows split them by what drives them.
 */
function fieldRows(result: ScenarioResult): Omit<ChannelRow, "share" | "dominant">[] {
  const { electromagnetic: em, gravitational: gw } = result;
  const zero = zeroReasonOf([em, gw]);
  const sum = (of: (c: ChannelResult) => Quantity | null) => bothChannels(of(em), of(gw));
  const farField = sum((c) => c.farFieldQuanta);
  const horizon = sum((c) => c.horizonQuanta);
  const ramps = sum((c) => c.rampDrivenQuanta)!;
  const hold = sum((c) => c.holdDrivenQuanta)!;
  if (farField) return [{ key: "far-field", words: "To null infinity ℐ⁺", quanta: farField, exactZeroReason: zero }];
  if (horizon) {
    return [
      { key: "far-field", words: "Ramps, to null infinity ℐ⁺", quanta: ramps, exactZeroReason: zero },
      { key: "horizon", words: "Into the horizon", quanta: horizon, exactZeroReason: zero },
    ];
  }
  return [
    { key: "fields-ramps", words: "Ramps, into the horizon (= to ℐ⁺)", quanta: ramps, exactZeroReason: zero },
    { key: "fields-hold", words: "Hold, into the horizon (= to ℐ⁺)", quanta: hold, exactZeroReason: zero },
  ];
}

export function channelTable(result: ScenarioResult): ChannelTable {
  const environment = result.environment;
  const unshared = [
    ...fieldRows(result),
    ...(environment?.channels ?? []).map((ch) => ({ key: ch.channel, words: ENVIRONMENT_CHANNEL_WORDS[ch.channel], quanta: ch.totalQuanta, exactZeroReason: ch.exactZeroReason })),
  ];
  const whole = environment ? environment.total : result.combined;
  const totalLog10 = unshared.reduce((sum, row) => log10Sum(sum, log10OfCount(row.quanta)), -Infinity);
  const largest = unshared.reduce((best, row, i) => (log10OfCount(row.quanta) > log10OfCount(unshared[best].quanta) ? i : best), 0);
  const anyNonZero = totalLog10 > -Infinity;
  const rows = unshared.map((row, i) => ({
    ...row,
    share: anyNonZero ? 10 ** (log10OfCount(row.quanta) - totalLog10) : null,
    dominant: anyNonZero && i === largest,
  }));
  return {
    rows,
    dominantWords: anyNonZero ? rows[largest].words : null,
    // The physics' own total: the rows' counts added (an isolated body's: the field channels').
    total: whole.totalQuanta,
    decoherence: whole.decoherence,
    decoherenceTime: whole.decoherenceTime,
    margins: (environment?.margins ?? []).map(marginRow),
    hasEnvironment: environment !== null,
  };
}

function marginRow(margin: ChannelMargin): MarginRow {
  return {
    channel: margin.channel,
    channelWords: ENVIRONMENT_CHANNEL_WORDS[margin.channel],
    parameterWords: MARGIN_PARAMETER_WORDS[margin.parameter],
    current: margin.current,
    outcome: margin.outcome,
  };
}

/** A share as a percentage for the table: "63 %", "< 0.1 %", "0 %" for an exact zero. */
export function shareText(share: number | null): string {
  if (share === null || share === 0) return "0 %";
  const percent = share * 100;
  if (percent < 0.1) return "< 0.1 %";
  if (percent > 99.9 && share < 1) return "> 99.9 %";
  return `${Number(percent.toPrecision(percent < 10 ? 2 : 3))} %`;
}

/**
 * A sweep of a scenario with an environment, as curves: one per channel (the body's own fields together, then each
 * environmental channel) and the whole budget's total, each ⟨N⟩ against the swept parameter, for the Sweep's chart
 * and its exported figure alike. Each curve has its own colour (Okabe–Ito, so colour-blind readers tell them apart)
 * and its own dash, and is named in the legend: never colour alone. Pure.
 */
import type { EnvironmentChannel } from "@/physics/environment";
import type { Quantity } from "@/physics/result";
import type { SweepPoint } from "@/physics/sweeps";
import { ENVIRONMENT_CHANNEL_WORDS } from "./budget/channel-table";

export type SweepCurveKey = "fields" | EnvironmentChannel | "total";

export interface SweepCurve {
  key: SweepCurveKey;
  words: string;
  colour: string;
  /** Dash pattern in px (empty: solid). */
  dash: number[];
  width: number;
  /** ⟨N⟩ at each point of the sweep; null where it is exactly zero or beyond a double (a log axis has no place for it). */
  values: (number | null)[];
}

const LOOK: Record<SweepCurveKey, { colour: string; dash: number[]; width: number }> = {
  fields: { colour: "#0072B2", dash: [], width: 2 },
  gas: { colour: "#E69F00", dash: [8, 4], width: 2 },
  "thermal-scattering": { colour: "#56B4E9", dash: [2, 3], width: 2 },
  "thermal-absorption": { colour: "#009E73", dash: [8, 3, 2, 3], width: 2 },
  "thermal-emission": { colour: "#CC79A7", dash: [4, 4], width: 2 },
  surface: { colour: "#D55E00", dash: [12, 3, 2, 3, 2, 3], width: 2 },
  total: { colour: "#1c2024", dash: [], width: 3 },
};

const plotted = (q: Quantity | undefined): number | null => (q && q.value !== null && q.value > 0 && Number.isFinite(q.value) ? q.value : null);

/** The curves of a sweep, or an empty list when its points carry no environmental channel (an isolated body). */
export function sweepCurves(points: SweepPoint[]): SweepCurve[] {
  const channels = [...new Set(points.flatMap((p) => (p.environmentQuanta ?? []).map((e) => e.channel)))];
  if (channels.length === 0) return [];
  const curve = (key: SweepCurveKey, words: string, of: (p: SweepPoint) => Quantity | undefined): SweepCurve => ({ key, words, ...LOOK[key], values: points.map((p) => plotted(of(p))) });
  return [
    curve("fields", "body's own fields", (p) => p.totalQuanta),
    ...channels.map((channel) => curve(channel, ENVIRONMENT_CHANNEL_WORDS[channel].toLowerCase(), (p) => p.environmentQuanta.find((e) => e.channel === channel)?.quanta)),
    curve("total", "total", (p) => p.budgetTotalQuanta),
  ].filter((c) => c.values.some((v) => v !== null));
}

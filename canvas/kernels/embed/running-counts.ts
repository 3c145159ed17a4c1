/**
 * The embed's running counts: how the computed quanta build up along lab time (physics/estimators/accumulation.ts,
 * an approximation the embed flags as one), each beside its total in the Budget's words. The totals are the Budget's
 * own both-channels sums (kernels/budget/both-channels.ts), so the embed and the Budget cannot disagree.
 */
import { createQuantaAccumulation, type RunningQuanta } from "@/physics/estimators/accumulation";
import type { Quantity, ScenarioResult } from "@/physics/result";
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { bothChannels } from "../budget/both-channels";
import { compactNumber, numberFromLog10 } from "../diagram/labels";
import { profileHistory } from "../profile";

export type RunningCountKey = "ramp" | "hold" | "horizon" | "far-field";

export interface RunningCountRow {
  key: RunningCountKey;
  words: string;
  /** log10 of the count so far and of its total; −Infinity for none. */
  log10Now: number;
  log10Total: number;
}

export interface RunningCounts {
  totalSeconds: number;
  rows(tauSeconds: number): RunningCountRow[];
}

/** log10 of a total: −Infinity for an exact zero or a count the result does not give. */
const log10Of = (q: Quantity | null) => (q === null || q.log10 === null ? -Infinity : q.log10);

/** Both channels' totals, as the Budget sums them. */
function totals(result: ScenarioResult): Record<RunningCountKey, number> {
  const both = (pick: (c: ScenarioResult["electromagnetic"]) => Quantity | null) => log10Of(bothChannels(pick(result.electromagnetic), pick(result.gravitational)));
  return {
    ramp: both((c) => c.rampDrivenQuanta),
    hold: both((c) => c.holdDrivenQuanta),
    horizon: both((c) => c.holdDrivenQuanta),
    "far-field": both((c) => c.farFieldQuanta),
  };
}

function rowsAt(running: RunningQuanta, total: Record<RunningCountKey, number>): RunningCountRow[] {
  const row = (key: RunningCountKey, words: string, log10Now: number): RunningCountRow => ({ key, words, log10Now, log10Total: total[key] });
  switch (running.split) {
    case "ramps-and-horizon":
      return [row("ramp", "ramp-driven", running.log10RampDriven), row("horizon", "hold-driven, into H⁺", running.log10Horizon ?? -Infinity)];
    case "far-field-only":
      return [row("far-field", "to ℐ⁺", running.log10FarField ?? -Infinity)];
    case "single-spectral":
      return [row("ramp", "ramp-driven", running.log10RampDriven), row("hold", "hold-driven", running.log10HoldDriven)];
  }
}

/** The running counts of a computed result along its document's protocol, or null when the protocol cannot be read. */
export function createRunningCounts(document: Pick<ScenarioDocument, "protocol" | "separation">, result: ScenarioResult): RunningCounts | null {
  const history = profileHistory(document);
  if (!history) return null;
  const accumulate = createQuantaAccumulation(history, result);
  const total = totals(result);
  return { totalSeconds: history.totalDurationSeconds, rows: (tau) => rowsAt(accumulate(tau), total) };
}

/** A count for a line of text: plain between 10⁻³ and 10⁴, else in powers of ten; "0" for none. */
export function countText(log10: number): string {
  if (log10 === -Infinity) return "0";
  return log10 >= -3 && log10 < 4 ? compactNumber(10 ** log10, 3) : numberFromLog10(log10, 3);
}

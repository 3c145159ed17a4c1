/**
 * Protocol → branch paths. The history of the full separation d(t) = d₀σ(t) (one function for every protocol
 * kind), and the two branches' positions along the separation axis: symmetric splits put them at ±d/2, a split
 * in which one branch stays puts them at d and 0.
 */
import type { ScenarioDocument, SeparationSpec } from "../scenario/schema";
import { formulaHistory } from "./formula-profile";
import { sampledHistory } from "./sampled-profile";
import { segmentsHistory } from "./segments";
import type { SeparationHistory } from "./types";

export type { MotionWindow, SeparationHistory } from "./types";
export { rampShapes } from "./ramp-shapes";
export { compileProfileFormula } from "./formula";

export function separationHistory(document: Pick<ScenarioDocument, "protocol" | "separation">): SeparationHistory {
  const { protocol, separation } = document;
  switch (protocol.kind) {
    case "segments":
      return segmentsHistory(protocol, separation.distanceMetres);
    case "formula":
      return formulaHistory(protocol, separation.distanceMetres);
    case "sampled":
      return sampledHistory(protocol);
  }
}

export interface BranchPositions {
  /** Position of branch A and B along the separation axis, metres, as multiples of the full separation d(t). */
  aPerSeparation: number;
  bPerSeparation: number;
}

export function branchPositions(split: SeparationSpec["split"]): BranchPositions {
  return split === "symmetric" ? { aPerSeparation: 0.5, bPerSeparation: -0.5 } : { aPerSeparation: 1, bPerSeparation: 0 };
}

/** Largest speed of either branch, m/s. */
export function peakBranchSpeed(history: SeparationHistory, split: SeparationSpec["split"]): number {
  const { aPerSeparation, bPerSeparation } = branchPositions(split);
  return Math.max(Math.abs(aPerSeparation), Math.abs(bPerSeparation)) * history.peakSeparationMetres * history.peakRatePerSecond;
}

export interface BranchPathSample {
  timeSeconds: number;
  branchAMetres: number;
  branchBMetres: number;
}

/** The two branch paths sampled at `count` evenly spaced times over the protocol (for plots and the diagram). */
export function sampleBranchPaths(history: SeparationHistory, split: SeparationSpec["split"], count: number): BranchPathSample[] {
  const { aPerSeparation, bPerSeparation } = branchPositions(split);
  const samples: BranchPathSample[] = [];
  for (let i = 0; i < count; i++) {
    const t = (history.totalDurationSeconds * i) / Math.max(1, count - 1);
    const d = history.peakSeparationMetres * fractionAt(history, t);
    samples.push({ timeSeconds: t, branchAMetres: aPerSeparation * d, branchBMetres: bPerSeparation * d });
  }
  return samples;
}

/** σ(t) of a history: inside a window its profile, on a plateau the value the previous window ended at. */
export function fractionAt(history: SeparationHistory, tSeconds: number): number {
  let plateau = 0;
  for (const w of history.windows) {
    if (tSeconds < w.startSeconds) return plateau;
    if (tSeconds <= w.startSeconds + w.durationSeconds) return w.fraction((tSeconds - w.startSeconds) / w.durationSeconds);
    plateau = w.fraction(1);
  }
  return tSeconds > history.totalDurationSeconds ? 0 : plateau;
}

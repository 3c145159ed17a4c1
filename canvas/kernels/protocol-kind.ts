/**
 * Switching a document between the three protocol kinds (ramps, formula, measured profile) as one edit that keeps
 * the peak separation — the largest separation the branches reach — and, where the new kind can carry it, the
 * profile itself:
 * - ramps → formula: the same σ(t) written out as a formula (a conditional over the three segments), exact;
 * - any → measured profile: the history sampled (129 points per moving window, plus the plateau ends), cubic-spline
 *   interpolation, or linear where the history has kinks (a spline would round them off);
 * - formula or measured → ramps, measured → formula: minimum-jerk ramps of a tenth of the duration each and a
 *   hold between (a measured profile has no formula; the formula's shape is not a set of ramps).
 * With a measured profile, d is the profile's peak (physics/protocols/sampled-profile.ts measures σ in units of
 * it); withPeakSeparation rescales the samples so that a new d is honoured rather than ignored.
 */
import { fractionAt, rampShapes, separationHistory, type SeparationHistory } from "@/physics/protocols";
import { withSampledProtocol } from "@/canvas/kernels/document-edits";
import type { ProtocolSpec, ScenarioDocument } from "@/physics/scenario/schema";

export type ProtocolKind = ProtocolSpec["kind"];

const SAMPLES_PER_WINDOW = 129;
const RAMP_SHARE_OF_DURATION = 0.1;

type SegmentsProtocol = Extract<ProtocolSpec, { kind: "segments" }>;

/** A number as the formula grammar reads it, exactly (the shortest text that reads back as the same double). */
function formulaNumber(value: number): string {
  return String(value);
}

/** The ramps' σ(t) as a profile formula in t (seconds): separation ramp, hold at 1, recombination ramp. */
export function segmentsAsFormula(protocol: SegmentsProtocol): string {
  const a = protocol.separation.durationSeconds;
  const holdEnd = a + protocol.hold.durationSeconds;
  const r = protocol.recombination.durationSeconds;
  const up = rampShapes[protocol.separation.shape].formulaText(`(t / ${formulaNumber(a)})`);
  const down = rampShapes[protocol.recombination.shape].formulaText(`((t - ${formulaNumber(holdEnd)}) / ${formulaNumber(r)})`);
  return `t < ${formulaNumber(a)} ? ${up} : (t < ${formulaNumber(holdEnd)} ? 1 : 1 - ${down})`;
}

function defaultRamps(totalSeconds: number): SegmentsProtocol {
  const ramp = RAMP_SHARE_OF_DURATION * totalSeconds;
  return {
    kind: "segments",
    separation: { durationSeconds: ramp, shape: "minimum-jerk" },
    hold: { durationSeconds: totalSeconds - 2 * ramp },
    recombination: { durationSeconds: ramp, shape: "minimum-jerk" },
  };
}

/** Times at which to sample a history: every window at SAMPLES_PER_WINDOW points (plateaus need only their ends). */
function sampleTimes(history: SeparationHistory): number[] {
  const times = new Set<number>([0, history.totalDurationSeconds]);
  for (const w of history.windows) {
    for (let i = 0; i < SAMPLES_PER_WINDOW; i++) times.add(w.startSeconds + (w.durationSeconds * i) / (SAMPLES_PER_WINDOW - 1));
  }
  return [...times].filter((t) => t >= 0 && t <= history.totalDurationSeconds).sort((x, y) => x - y);
}

/**
 * The peak separation, metres: for ramps d itself, for a measured profile its largest |sample| (between samples a
 * spline may overshoot by a little; the samples are what was measured), for a formula the largest |d·σ(t)| probed.
 */
export function peakSeparationReached(history: SeparationHistory): number {
  if (history.protocolKind !== "formula") return history.peakSeparationMetres;
  let peak = 0;
  for (const t of sampleTimes(history)) peak = Math.max(peak, Math.abs(fractionAt(history, t)));
  return peak * history.peakSeparationMetres;
}

/** The document with a protocol of another kind, the peak separation kept; the same document when the kind is unchanged. */
export function withProtocolKind(document: ScenarioDocument, kind: ProtocolKind): ScenarioDocument {
  const current = document.protocol;
  if (current.kind === kind) return document;
  const history = separationHistory(document);
  const peakMetres = peakSeparationReached(history);
  const separation = peakMetres > 0 ? { ...document.separation, distanceMetres: peakMetres } : document.separation;
  switch (kind) {
    case "segments":
      return { ...document, separation, protocol: defaultRamps(history.totalDurationSeconds) };
    case "formula": {
      const ramps = current.kind === "segments" ? current : defaultRamps(history.totalDurationSeconds);
      return { ...document, separation, protocol: { kind: "formula", expression: segmentsAsFormula(ramps), durationSeconds: history.totalDurationSeconds } };
    }
    case "sampled": {
      const samples = sampleTimes(history).map((timeSeconds) => ({ timeSeconds, separationMetres: history.peakSeparationMetres * fractionAt(history, timeSeconds) }));
      const interpolation = history.kinks.some((k) => k.kind === "kink") ? "linear" : "cubic-spline";
      return withSampledProtocol(document, { kind: "sampled", samples, interpolation });
    }
  }
}

/**
 * The document with a new full separation d. With a measured profile, d is the profile's peak: the samples are
 * rescaled by d_new/d_old, so the profile keeps its shape and reaches the new peak.
 */
export function withPeakSeparation(document: ScenarioDocument, distanceMetres: number): ScenarioDocument {
  const protocol = document.protocol;
  if (protocol.kind !== "sampled") return { ...document, separation: { ...document.separation, distanceMetres } };
  const peak = protocol.samples.reduce((m, s) => Math.max(m, Math.abs(s.separationMetres)), 0);
  if (!(peak > 0)) return document;
  const scale = distanceMetres / peak;
  return withSampledProtocol(document, { ...protocol, samples: protocol.samples.map((s) => ({ timeSeconds: s.timeSeconds, separationMetres: s.separationMetres * scale })) });
}

/** A measured profile stretched (or squeezed) in time to a new duration, its shape and peak kept. */
export function withSampledDuration(document: ScenarioDocument, durationSeconds: number): ScenarioDocument {
  const protocol = document.protocol;
  if (protocol.kind !== "sampled") return document;
  const first = protocol.samples[0].timeSeconds;
  const span = protocol.samples[protocol.samples.length - 1].timeSeconds - first;
  if (!(span > 0)) return document;
  const scale = durationSeconds / span;
  return { ...document, protocol: { ...protocol, samples: protocol.samples.map((s) => ({ timeSeconds: (s.timeSeconds - first) * scale, separationMetres: s.separationMetres })) } };
}

/** A measured profile read with another interpolation. */
export function withInterpolation(document: ScenarioDocument, interpolation: Extract<ProtocolSpec, { kind: "sampled" }>["interpolation"]): ScenarioDocument {
  if (document.protocol.kind !== "sampled") return document;
  return { ...document, protocol: { ...document.protocol, interpolation } };
}

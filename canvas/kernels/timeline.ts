/**
 * The segment protocol on the lab's clock: where separation, hold and recombination begin and end, and where each
 * branch is at a given lab proper time. Pure; the separation shapes come from physics/protocols.
 */
import { branchPositions, rampShapes } from "@/physics/protocols";
import type { ProtocolSpec, ScenarioDocument, SeparationSpec } from "@/physics/scenario/schema";

export type SegmentsProtocol = Extract<ProtocolSpec, { kind: "segments" }>;

/** The four instants of a segment protocol, lab proper time in seconds. */
export interface SegmentTimes {
  separationStart: number;
  separationEnd: number;
  holdEnd: number;
  recombinationEnd: number;
}

export type SegmentName = "separation" | "hold" | "recombination";
export const SEGMENT_NAMES: readonly SegmentName[] = ["separation", "hold", "recombination"];

export function segmentTimes(protocol: SegmentsProtocol, originSeconds = 0): SegmentTimes {
  const separationEnd = originSeconds + protocol.separation.durationSeconds;
  const holdEnd = separationEnd + protocol.hold.durationSeconds;
  return {
    separationStart: originSeconds,
    separationEnd,
    holdEnd,
    recombinationEnd: holdEnd + protocol.recombination.durationSeconds,
  };
}

export function totalDurationSeconds(protocol: SegmentsProtocol): number {
  return protocol.separation.durationSeconds + protocol.hold.durationSeconds + protocol.recombination.durationSeconds;
}

/** The segments protocol of a document, or null when the document carries a formula or sampled profile. */
export function segmentsProtocolOf(document: Pick<ScenarioDocument, "protocol">): SegmentsProtocol | null {
  return document.protocol.kind === "segments" ? document.protocol : null;
}

/** σ(τ) ∈ [0, 1]: the fraction of the full separation reached at lab time τ (recombination runs its shape backwards). */
export function separationFraction(protocol: SegmentsProtocol, times: SegmentTimes, tauSeconds: number): number {
  if (tauSeconds <= times.separationStart || tauSeconds >= times.recombinationEnd) return 0;
  if (tauSeconds < times.separationEnd) {
    return rampShapes[protocol.separation.shape].fraction((tauSeconds - times.separationStart) / protocol.separation.durationSeconds);
  }
  if (tauSeconds <= times.holdEnd) return 1;
  return 1 - rampShapes[protocol.recombination.shape].fraction((tauSeconds - times.holdEnd) / protocol.recombination.durationSeconds);
}

/**
 * Where each branch sits along the separation axis, metres from the lab's rest position, for a fraction σ
 * (physics/protocols: symmetric split ±σd/2; one-branch-stays: branch A at σd, branch B at 0).
 */
export function branchOffsetsMetres(separation: SeparationSpec, fraction: number): { a: number; b: number } {
  const { aPerSeparation, bPerSeparation } = branchPositions(separation.split);
  const d = separation.distanceMetres * fraction;
  return { a: aPerSeparation * d, b: bPerSeparation * d };
}

/** Branch A's offset per metre of full separation at the hold: ½ for a symmetric split, 1 when branch B stays. */
export function branchAOffsetPerSeparation(separation: Pick<SeparationSpec, "split">): number {
  return branchPositions(separation.split).aPerSeparation;
}

/**
 * Lab times at which to sample the branch paths across [from, to]: `perSegment` points in each moving segment
 * (where the paths bend), the plateau corners exactly, so a polyline through them shows every ramp at any zoom.
 */
export function pathSampleTimes(times: SegmentTimes, from: number, to: number, perSegment = 48): number[] {
  const samples = new Set<number>([from, to, times.separationStart, times.separationEnd, times.holdEnd, times.recombinationEnd]);
  for (const [a, b] of [
    [times.separationStart, times.separationEnd],
    [times.holdEnd, times.recombinationEnd],
  ]) {
    for (let i = 1; i < perSegment; i++) samples.add(a + ((b - a) * i) / perSegment);
  }
  return [...samples].filter((t) => t >= from && t <= to).sort((x, y) => x - y);
}

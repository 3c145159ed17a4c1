/**
 * Segments protocol → separation history: a separation ramp from σ = 0 to 1, a hold at σ = 1, a recombination
 * ramp back to 0, each ramp of its own duration and shape (physics/protocols/ramp-shapes.ts).
 */
import type { KinkReport } from "../result-basics";
import type { ProtocolSpec } from "../scenario/schema";
import { rampShapes } from "./ramp-shapes";
import type { MotionWindow, SeparationHistory } from "./types";

type SegmentsProtocol = Extract<ProtocolSpec, { kind: "segments" }>;

export function segmentsHistory(protocol: SegmentsProtocol, distanceMetres: number): SeparationHistory {
  const up = rampShapes[protocol.separation.shape];
  const down = rampShapes[protocol.recombination.shape];
  const separationSeconds = protocol.separation.durationSeconds;
  const holdSeconds = protocol.hold.durationSeconds;
  const recombinationSeconds = protocol.recombination.durationSeconds;
  const recombinationStart = separationSeconds + holdSeconds;
  const totalDurationSeconds = recombinationStart + recombinationSeconds;

  const separation: MotionWindow = {
    startSeconds: 0,
    durationSeconds: separationSeconds,
    fraction: up.fraction,
    rate: up.rate,
    cacheKey: `segment:${protocol.separation.shape}:up`,
    smoothness: up.smoothness,
  };
  const recombination: MotionWindow = {
    startSeconds: recombinationStart,
    durationSeconds: recombinationSeconds,
    fraction: (u) => 1 - down.fraction(u),
    rate: (u) => -down.rate(u),
    cacheKey: `segment:${protocol.recombination.shape}:down`,
    smoothness: down.smoothness,
  };

  const kinkTimes = new Set<number>();
  if (up.smoothness === 0) [0, separationSeconds].forEach((t) => kinkTimes.add(t));
  if (down.smoothness === 0) [recombinationStart, totalDurationSeconds].forEach((t) => kinkTimes.add(t));
  const kinks: KinkReport[] = [...kinkTimes].sort((a, b) => a - b).map((timeSeconds) => ({ timeSeconds, kind: "kink" }));

  return {
    protocolKind: "segments",
    peakSeparationMetres: distanceMetres,
    totalDurationSeconds,
    windows: [separation, recombination],
    peakRatePerSecond: Math.max(up.peakRate / separationSeconds, down.peakRate / recombinationSeconds),
    kinks,
    interpolation: null,
  };
}

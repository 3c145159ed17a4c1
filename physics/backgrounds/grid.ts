/** Grid lines of a conformal diagram, for drawing: curves of constant static time and of constant radius. */
import type { Background, DiagramPoint } from "./types";

function sampleLinearly(from: number, to: number, samples: number): number[] {
  if (samples < 2) return [from];
  return Array.from({ length: samples }, (_, i) => from + ((to - from) * i) / (samples - 1));
}

/**
 * The slice t = tSeconds between two radii of the static region, `samples` points spaced evenly in the tortoise
 * coordinate r*, so the points crowd neither the horizon (where r* → −∞ or +∞) nor the far region.
 */
export function constantTimeCurve(
  background: Background,
  tSeconds: number,
  rRange: { fromMetres: number; toMetres: number },
  samples: number,
): DiagramPoint[] {
  const rStars = sampleLinearly(background.tortoiseMetres(rRange.fromMetres), background.tortoiseMetres(rRange.toMetres), samples);
  return rStars.flatMap((rStar) => {
    const r = background.radiusFromTortoiseMetres(rStar);
    return r === null ? [] : [background.conformal.toDiagram(tSeconds, r)];
  });
}

/** The static worldline r = rMetres between two times, `samples` points evenly spaced in t. */
export function constantRadiusCurve(
  background: Background,
  rMetres: number,
  tRange: { fromSeconds: number; toSeconds: number },
  samples: number,
): DiagramPoint[] {
  return sampleLinearly(tRange.fromSeconds, tRange.toSeconds, samples).map((t) => background.conformal.toDiagram(t, rMetres));
}

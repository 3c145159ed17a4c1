/**
 * The Offsets panel's axes: lab proper time across, offset along the separation axis up.
 *
 * The time axis is piecewise linear, one piece per segment plus a short lead-in and run-out, each moving segment
 * given at least MIN_SEGMENT_SHARE of the width: a 10 ms ramp beside a 1000 s hold stays wide enough to see and to
 * grab. Within a piece the scale is linear; the boundaries between pieces are labelled with their times.
 */
import type { SeparationSpec } from "@/physics/scenario/schema";
import { branchAOffsetPerSeparation, type SegmentTimes } from "../timeline";

export interface PlotRect {
  left: number;
  top: number;
  width: number;
  height: number;
}

export interface AxisPiece {
  fromSeconds: number;
  toSeconds: number;
  fromPx: number;
  toPx: number;
}

export interface OffsetsViewport {
  width: number;
  height: number;
  plot: PlotRect;
  /** Contiguous, increasing in time and in pixels. */
  pieces: AxisPiece[];
  metresAtTop: number;
  metresAtBottom: number;
}

export const OFFSETS_MARGINS = { left: 72, right: 20, top: 18, bottom: 46 } as const;
/** Share of the width each non-empty segment gets at least. */
export const MIN_SEGMENT_SHARE = 0.16;
/** Share of the width of the lead-in before the separation and the run-out after the recombination. */
const ROLL_SHARE = 0.06;
/** Lead-in and run-out duration, as a fraction of the whole protocol. */
const ROLL_DURATION_FRACTION = 0.08;
/** Separation used to scale the vertical axis when the document's is zero. */
const FALLBACK_SEPARATION_METRES = 1e-6;

function pieceScale(piece: AxisPiece): number {
  return (piece.toPx - piece.fromPx) / (piece.toSeconds - piece.fromSeconds);
}

function pieceForTime(viewport: OffsetsViewport, tSeconds: number): AxisPiece {
  const { pieces } = viewport;
  return pieces.find((p) => tSeconds <= p.toSeconds) ?? pieces[pieces.length - 1];
}

function pieceForPx(viewport: OffsetsViewport, x: number): AxisPiece {
  const { pieces } = viewport;
  return pieces.find((p) => x <= p.toPx) ?? pieces[pieces.length - 1];
}

/** Lab time → x pixel; outside the axis the first or last piece's scale carries on. */
export function timeToPx(viewport: OffsetsViewport, tSeconds: number): number {
  const piece = pieceForTime(viewport, tSeconds);
  return piece.fromPx + (tSeconds - piece.fromSeconds) * pieceScale(piece);
}

export function pxToTime(viewport: OffsetsViewport, x: number): number {
  const piece = pieceForPx(viewport, x);
  return piece.fromSeconds + (x - piece.fromPx) / pieceScale(piece);
}

/** Seconds per pixel at lab time t. */
export function secondsPerPxAt(viewport: OffsetsViewport, tSeconds: number): number {
  return 1 / pieceScale(pieceForTime(viewport, tSeconds));
}

export function metresToPx(viewport: OffsetsViewport, metres: number): number {
  const { plot, metresAtTop, metresAtBottom } = viewport;
  return plot.top + ((metresAtTop - metres) / (metresAtTop - metresAtBottom)) * plot.height;
}

export function pxToMetres(viewport: OffsetsViewport, y: number): number {
  const { plot, metresAtTop, metresAtBottom } = viewport;
  return metresAtTop - ((y - plot.top) / plot.height) * (metresAtTop - metresAtBottom);
}

export function metresPerPx(viewport: OffsetsViewport): number {
  return (viewport.metresAtTop - viewport.metresAtBottom) / viewport.plot.height;
}

/**
 * Width shares of the three segments (of the width left after the lead-in and run-out): each non-empty segment its
 * share of the time, raised to MIN_SEGMENT_SHARE where that is less, the rest shared in proportion among the others.
 */
export function segmentShares(durations: number[]): number[] {
  const available = 1 - 2 * ROLL_SHARE;
  const floor = MIN_SEGMENT_SHARE * available;
  const raised = new Set<number>();
  for (;;) {
    const free = durations.map((d, i) => (d > 0 && !raised.has(i) ? d : 0));
    const freeTotal = free.reduce((a, b) => a + b, 0);
    const left = available - raised.size * floor;
    const shares = durations.map((d, i) => (raised.has(i) ? floor : freeTotal > 0 ? (free[i] / freeTotal) * left : 0));
    const tooNarrow = shares.findIndex((s, i) => durations[i] > 0 && !raised.has(i) && s < floor);
    if (tooNarrow < 0) return shares;
    raised.add(tooNarrow);
  }
}

/** The viewport that shows the whole protocol and the full separation with room around both. */
export function fitOffsetsViewport(
  times: SegmentTimes,
  separation: Pick<SeparationSpec, "split" | "distanceMetres">,
  size: { width: number; height: number },
): OffsetsViewport {
  const m = OFFSETS_MARGINS;
  const plot: PlotRect = { left: m.left, top: m.top, width: Math.max(1, size.width - m.left - m.right), height: Math.max(1, size.height - m.top - m.bottom) };
  const boundaries = [times.separationStart, times.separationEnd, times.holdEnd, times.recombinationEnd];
  const durations = [boundaries[1] - boundaries[0], boundaries[2] - boundaries[1], boundaries[3] - boundaries[2]];
  const roll = ROLL_DURATION_FRACTION * (boundaries[3] - boundaries[0]);
  const shares = [ROLL_SHARE, ...segmentShares(durations), ROLL_SHARE];
  const edges = [boundaries[0] - roll, ...boundaries, boundaries[3] + roll];
  const pieces: AxisPiece[] = [];
  let px = plot.left;
  shares.forEach((share, i) => {
    const width = share * plot.width;
    if (edges[i + 1] > edges[i]) pieces.push({ fromSeconds: edges[i], toSeconds: edges[i + 1], fromPx: px, toPx: px + width });
    px += width;
  });
  const d = separation.distanceMetres > 0 ? separation.distanceMetres : FALLBACK_SEPARATION_METRES;
  const aAtHold = branchAOffsetPerSeparation(separation) * d;
  const [metresAtTop, metresAtBottom] = separation.split === "symmetric" ? [1.5 * aAtHold, -1.5 * aAtHold] : [1.25 * aAtHold, -0.25 * aAtHold];
  return { width: size.width, height: size.height, plot, pieces, metresAtTop, metresAtBottom };
}

/** Pixel positions where the scale changes from one piece to the next (drawn as small breaks on the axis). */
export function scaleBreaksPx(viewport: OffsetsViewport): number[] {
  const { pieces } = viewport;
  return pieces.slice(1).filter((p, i) => Math.abs(pieceScale(p) / pieceScale(pieces[i]) - 1) > 0.01).map((p) => p.fromPx);
}

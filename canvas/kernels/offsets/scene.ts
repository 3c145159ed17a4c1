/**
 * The Offsets figure as data in stage pixels: both branches' offsets along the separation axis against the lab's
 * proper time, the protocol's segments as bands, the ticks of both axes and every label, placed by the one label
 * layout of the Diagram (kernels/diagram/label-layout.ts) so that no two labels overlap and none crosses a branch.
 * Pure: no React, no Konva, no DOM; canvas/layers/OffsetsStage.tsx only draws what this returns, with the handles.
 */
import type { ScenarioDocument } from "@/physics/scenario/schema";
import { formatQuantity } from "@/physics/units";
import { compactQuantity } from "../diagram/labels";
import { layoutLabels, type LabelCandidate, type LabelObstacle, type PlacedLabel, type Px } from "../diagram/label-layout";
import { profilePaths } from "../profile";
import { branchOffsetsMetres, pathSampleTimes, segmentTimes, segmentsProtocolOf, separationFraction, SEGMENT_NAMES, type SegmentName } from "../timeline";
import { boundaryTicks, offsetTicks, OFFSETS_LABEL_GAP_PX, timeAxisLabelCandidates } from "./axis-ticks";
import { metresToPx, pxToTime, scaleBreaksPx, timeToPx, type OffsetsViewport, type PlotRect } from "./viewport";

export const OFFSETS_FONT_PX = 11;
/** Estimated advance per character, in ems: the monospace figures, and the sans words (a little wide, to be safe). */
export const MONO_EM = 0.61;
export const SANS_EM = 0.51;
export const TIME_AXIS_TITLE = "lab proper time";
/** Points per moving segment of a segments protocol, and along a formula or sampled profile. */
const SAMPLES_PER_SEGMENT = 64;
const PROFILE_SAMPLES = 400;
/** Room kept between a label and a branch, pixels. */
const BRANCH_CLEARANCE_PX = 2;
/** Where the offset axis' labels end, left of the plot, and where its title's line runs. */
const OFFSET_LABEL_GAP_PX = 6;
const OFFSET_TITLE_X_PX = 8;

/** Label priorities (the layout only compares them): the instants first, then the segments' names, the offsets, the titles. */
const PRIORITY = { instant: 20, segment: 18, offset: 15, title: 10 } as const;

export type OffsetsFace = "mono" | "sans";

export interface OffsetsLabel extends PlacedLabel {
  face: OffsetsFace;
}

export interface SegmentBand {
  name: SegmentName;
  left: number;
  width: number;
  /** The moving segments are shaded; the hold is left on paper. */
  shaded: boolean;
}

export interface OffsetsTick {
  px: number;
  valueSI: number;
}

export interface OffsetsScene {
  width: number;
  height: number;
  plot: PlotRect;
  /** Empty for a formula or sampled profile (it has no segments). */
  bands: SegmentBand[];
  /** Each branch as polylines [x0, y0, x1, y1, …], cut where it leaves the plot (a drag keeps the axes it started with). */
  branchA: number[][];
  branchB: number[][];
  /** Round offsets (horizontal grid lines) and the instants on the time axis. */
  offsetTicks: OffsetsTick[];
  timeTicks: OffsetsTick[];
  /** The zero offset (the lab's rest position), y. */
  zeroY: number;
  /** Where the time axis' scale changes (drawn as small breaks), x. */
  scaleBreaks: number[];
  labels: OffsetsLabel[];
}

export interface OffsetsSceneInput {
  document: Pick<ScenarioDocument, "protocol" | "separation">;
  viewport: OffsetsViewport;
  /** Lab time at which the separation starts on the axis (a drag of the first instant moves it); 0 otherwise. */
  originSeconds: number;
}

const plotRight = (plot: PlotRect) => plot.left + plot.width;
const plotBottom = (plot: PlotRect) => plot.top + plot.height;

/**
 * A polyline cut to a rectangle (Liang–Barsky on each piece): the parts inside, each as a flat point list. A curve
 * that leaves and comes back gives two parts; one entirely outside gives none.
 */
export function clipPolylineToRect(points: Px[], rect: PlotRect): number[][] {
  const [left, top, right, bottom] = [rect.left, rect.top, plotRight(rect), plotBottom(rect)];
  const parts: number[][] = [];
  let current: number[] = [];
  const close = () => {
    if (current.length >= 4) parts.push(current);
    current = [];
  };
  for (let i = 1; i < points.length; i++) {
    const p = points[i - 1];
    const q = points[i];
    const dx = q.x - p.x;
    const dy = q.y - p.y;
    let t0 = 0;
    let t1 = 1;
    let inside = true;
    for (const [denominator, distance] of [
      [-dx, p.x - left],
      [dx, right - p.x],
      [-dy, p.y - top],
      [dy, bottom - p.y],
    ] as const) {
      if (denominator === 0) {
        if (distance < 0) inside = false;
        continue;
      }
      const t = distance / denominator;
      if (denominator < 0) t0 = Math.max(t0, t);
      else t1 = Math.min(t1, t);
    }
    if (!inside || t0 > t1) {
      close();
      continue;
    }
    // Clamped onto the edges, so rounding never leaves a cut end a hair outside.
    const at = (t: number): [number, number] => [Math.min(right, Math.max(left, p.x + t * dx)), Math.min(bottom, Math.max(top, p.y + t * dy))];
    const [sx, sy] = at(t0);
    const [ex, ey] = at(t1);
    const last = current.length >= 2 ? [current[current.length - 2], current[current.length - 1]] : null;
    if (!last || last[0] !== sx || last[1] !== sy) {
      close();
      current.push(sx, sy);
    }
    current.push(ex, ey);
    if (t1 < 1) close();
  }
  close();
  return parts;
}

/** The branches' paths in stage pixels over the plot's time span. */
function branchPoints(input: OffsetsSceneInput): { a: Px[]; b: Px[] } {
  const { document, viewport, originSeconds } = input;
  const protocol = segmentsProtocolOf(document);
  const a: Px[] = [];
  const b: Px[] = [];
  if (protocol) {
    const times = segmentTimes(protocol, originSeconds);
    const from = pxToTime(viewport, viewport.plot.left);
    const to = pxToTime(viewport, plotRight(viewport.plot));
    for (const t of pathSampleTimes(times, from, to, SAMPLES_PER_SEGMENT)) {
      const x = timeToPx(viewport, t);
      const offsets = branchOffsetsMetres(document.separation, separationFraction(protocol, times, t));
      a.push({ x, y: metresToPx(viewport, offsets.a) });
      b.push({ x, y: metresToPx(viewport, offsets.b) });
    }
    return { a, b };
  }
  // A formula or sampled profile, as the physics library samples it (shown, not edited: it has no handles).
  for (const p of profilePaths(document, PROFILE_SAMPLES)) {
    const x = timeToPx(viewport, p.timeSeconds);
    a.push({ x, y: metresToPx(viewport, p.branchAMetres) });
    b.push({ x, y: metresToPx(viewport, p.branchBMetres) });
  }
  return { a, b };
}

/** The instants on the time axis: the protocol's four, or a profile's start and end. */
function instantTicks(input: OffsetsSceneInput): OffsetsTick[] {
  const { document, viewport, originSeconds } = input;
  const protocol = segmentsProtocolOf(document);
  if (protocol) return boundaryTicks(viewport, segmentTimes(protocol, originSeconds));
  const { pieces } = viewport;
  return [pieces[1].fromSeconds, pieces[pieces.length - 2].toSeconds].map((t) => ({ px: timeToPx(viewport, t), valueSI: t }));
}

function segmentBands(input: OffsetsSceneInput, instants: OffsetsTick[]): SegmentBand[] {
  if (!segmentsProtocolOf(input.document)) return [];
  const { plot } = input.viewport;
  const clamp = (x: number) => Math.min(plotRight(plot), Math.max(plot.left, x));
  return SEGMENT_NAMES.map((name, i) => {
    const left = clamp(instants[i].px);
    return { name, left, width: Math.max(0, clamp(instants[i + 1].px) - left), shaded: name !== "hold" };
  });
}

const labelWidth = (text: string, em: number) => [...text].length * OFFSETS_FONT_PX * em;

function labelCandidates(input: OffsetsSceneInput, bands: SegmentBand[], instants: OffsetsTick[], offsets: OffsetsTick[]): { candidates: LabelCandidate[]; faces: Map<string, OffsetsFace> } {
  const { viewport, document, originSeconds } = input;
  const { plot } = viewport;
  const faces = new Map<string, OffsetsFace>();
  const base = { fontSize: OFFSETS_FONT_PX, rotation: 0 as const };

  const time = timeAxisLabelCandidates({
    ticks: instants.map((t) => ({ px: t.px, text: formatQuantity(t.valueSI - originSeconds, "time") })),
    title: TIME_AXIS_TITLE,
    plot: { left: plot.left, width: plot.width, bottom: plotBottom(plot) },
    stage: { width: viewport.width, height: viewport.height },
    fontSize: OFFSETS_FONT_PX,
    monoEm: MONO_EM,
    sansEm: SANS_EM,
  }).map((c) => ({ ...c, priority: c.id === "time-title" ? PRIORITY.title : PRIORITY.instant }));
  for (const c of time) faces.set(c.id, c.id === "time-title" ? "sans" : "mono");

  // A segment's name at the top of its band, else at its foot, only where it fits inside the band.
  const segments = bands
    .filter((band) => labelWidth(band.name, SANS_EM) + OFFSETS_LABEL_GAP_PX <= band.width)
    .map((band): LabelCandidate => {
      const x = band.left + band.width / 2;
      return {
        ...base,
        id: `segment-${band.name}`,
        text: band.name,
        characterEm: SANS_EM,
        priority: PRIORITY.segment,
        tone: "faint",
        x,
        y: plot.top + 4,
        align: "center",
        verticalAlign: "top",
        alternatives: [{ x, y: plotBottom(plot) - 4, align: "center", verticalAlign: "bottom", rotation: 0 }],
      };
    });
  for (const c of segments) faces.set(c.id, "sans");

  const offsetLabels = offsets.map(
    (tick, i): LabelCandidate => ({
      ...base,
      id: `offset-${i}`,
      text: tick.valueSI === 0 ? "0" : compactQuantity(tick.valueSI, "length"),
      characterEm: MONO_EM,
      priority: PRIORITY.offset,
      tone: "soft",
      x: plot.left - OFFSET_LABEL_GAP_PX,
      y: tick.px,
      align: "right",
      verticalAlign: "middle",
    }),
  );
  for (const c of offsetLabels) faces.set(c.id, "mono");

  const offsetTitle: LabelCandidate = {
    fontSize: OFFSETS_FONT_PX,
    id: "offset-title",
    text: `offset along the ${document.separation.axis} axis`,
    characterEm: SANS_EM,
    priority: PRIORITY.title,
    tone: "faint",
    x: OFFSET_TITLE_X_PX,
    y: plot.top + plot.height / 2,
    align: "center",
    verticalAlign: "middle",
    rotation: -90,
  };
  faces.set(offsetTitle.id, "sans");

  return { candidates: [...time, ...segments, ...offsetLabels, offsetTitle], faces };
}

export function buildOffsetsScene(input: OffsetsSceneInput): OffsetsScene {
  const { viewport } = input;
  const { plot } = viewport;
  const points = branchPoints(input);
  const instants = instantTicks(input);
  const bands = segmentBands(input, instants);
  const offsets = offsetTicks(viewport);
  const obstacles: LabelObstacle[] = [points.a, points.b].map((p) => ({ points: p, clearance: BRANCH_CLEARANCE_PX }));
  const { candidates, faces } = labelCandidates(input, bands, instants, offsets);
  const placed = layoutLabels(candidates, { width: viewport.width, height: viewport.height }, { gapPx: OFFSETS_LABEL_GAP_PX, obstacles });
  return {
    width: viewport.width,
    height: viewport.height,
    plot,
    bands,
    branchA: clipPolylineToRect(points.a, plot),
    branchB: clipPolylineToRect(points.b, plot),
    offsetTicks: offsets,
    timeTicks: instants,
    zeroY: metresToPx(viewport, 0),
    scaleBreaks: scaleBreaksPx(viewport),
    labels: placed.map((label) => ({ ...label, face: faces.get(label.id) ?? "mono" })),
  };
}

/**
 * The Diagram as a list of shapes in stage pixels: what the Konva stage draws on screen and what the SVG and PNG
 * exports write, from one DiagramScene and one viewport, so that an exported figure is the figure on screen.
 * Pure: no Konva, no DOM.
 */
import { hatchTicks } from "../kernels/diagram/decorations";
import { LABEL_PRIORITY, layoutLabels, type LabelCandidate, type PlacedLabel } from "../kernels/diagram/label-layout";
import { memoizeLast } from "../kernels/memoize";
import type { DiagramBackdrop, DiagramScene, SceneBoundary } from "../kernels/diagram/scene";
import { fitDiagramViewport, flatPx, toPx, type DiagramViewport, type Padding } from "../kernels/diagram/viewport";
import { wavyLine } from "../kernels/diagram/decorations";
import { diagramLabelCandidates, diagramLabelObstacles, diagramLabelRegion, sliceLabelCandidates, sliceLabelObstacles } from "../layers/diagram-labels";
import { DASHES, type FigurePalette } from "../theme";
import { cutAtCursor, type TimeCursor } from "./time-cursor";

/** Room round the diagram for its labels; de Sitter's square needs more at the sides (time labels, the far pole). */
const PADDING: Padding = { left: 48, right: 48, top: 48, bottom: 48 };
const DE_SITTER_PADDING: Padding = { left: 100, right: 64, top: 44, bottom: 44 };

export type FigureFont = "serif" | "mono";

export type FigureShape =
  /** A closed, filled region (no outline). */
  | { kind: "area"; points: number[]; fill: string }
  /** An open polyline, stroked. */
  | { kind: "line"; points: number[]; stroke: string; width: number; dash: number[]; round: boolean }
  | { kind: "dot"; x: number; y: number; radius: number; stroke: string | null; width: number; fill: string }
  /**
   * A one-line label: (x, y) is the anchor, at the middle of the line's height and at the start, middle or end of
   * the text along its direction; rotation −90 runs the text upward, turning about the anchor.
   */
  | { kind: "text"; text: string; x: number; y: number; anchor: "start" | "middle" | "end"; rotation: 0 | -90; fontSize: number; font: FigureFont; fill: string };

/** Groups in drawing order; the two branches have their own, so an exported file names them. */
export type FigureGroupId =
  | "background"
  | "regions"
  | "radiation"
  | "grid"
  | "boundaries"
  | "lab-worldline"
  | "branch-b"
  | "branch-a"
  | "protocol-marks"
  | "time-cursor"
  /** The protocol's time-slice labels, laid out on every frame (the backdrop's "labels" are laid out once). */
  | "slice-labels"
  | "labels";

export interface FigureGroup {
  id: FigureGroupId;
  shapes: FigureShape[];
}

export interface DiagramFigure {
  width: number;
  height: number;
  viewport: DiagramViewport;
  groups: FigureGroup[];
}

export interface FigureOptions {
  /** Multiplies every label's size (1 on screen; larger for projection). */
  labelScale?: number;
  /** Draw the page and the lab's region in the paper colour (false: leave them transparent). Default true. */
  paperBackground?: boolean;
  /** Show the protocol only up to this instant of lab time (the embed's scrubber); null or absent: all of it. */
  cursor?: TimeCursor | null;
  /** Room at the stage's right and bottom edges kept clear of the figure and its labels (the embed's controls lie there). */
  inset?: FigureInset;
}

export interface FigureInset {
  right: number;
  bottom: number;
}

export const NO_INSET: FigureInset = { right: 0, bottom: 0 };

export function diagramPadding(scene: DiagramBackdrop, labelScale = 1, inset: FigureInset = NO_INSET): Padding {
  const base = scene.chart.background.kind === "de-sitter" ? DE_SITTER_PADDING : PADDING;
  const grow = (v: number) => Math.round(v * (1 + (labelScale - 1) * 0.6));
  return { left: grow(base.left), right: grow(base.right) + inset.right, top: grow(base.top), bottom: grow(base.bottom) + inset.bottom };
}

export function diagramViewport(scene: DiagramBackdrop, size: { width: number; height: number }, labelScale = 1, inset: FigureInset = NO_INSET): DiagramViewport {
  return fitDiagramViewport(scene.bounds, size, diagramPadding(scene, labelScale, inset));
}

/** Where labels may go: the stage less its insets. */
const labelStage = (width: number, height: number, inset: FigureInset) => ({ width: width - inset.right, height: height - inset.bottom });

const line = (points: number[], stroke: string, width: number, dash: number[] = [], round = false): FigureShape => ({ kind: "line", points, stroke, width, dash, round });

function boundaryShapes(boundary: SceneBoundary, viewport: DiagramViewport, palette: FigurePalette): FigureShape[] {
  const pts = boundary.points.map((p) => toPx(viewport, p));
  const context = !boundary.bordersLabRegion;
  switch (boundary.kind) {
    case "timelike-infinity":
    case "spatial-infinity":
      return [{ kind: "dot", x: pts[0].x, y: pts[0].y, radius: 3, stroke: palette.ink, width: 1.25, fill: palette.paper }];
    case "singularity":
      return [line(wavyLine(pts[0], pts[pts.length - 1], 2.5, 9), palette.ink, 1.5, [], true)];
    case "null-infinity":
      return [line(flatPx(viewport, boundary.points), context ? palette.inkSoft : palette.ink, 1, DASHES.nullInfinity)];
    case "centre":
      return [line(flatPx(viewport, boundary.points), context ? palette.inkFaint : palette.inkSoft, 1)];
    case "horizon": {
      const far = toPx(viewport, boundary.farSide);
      const ticks = context ? [] : hatchTicks(pts[0], pts[pts.length - 1], far, 7, 6);
      return [...ticks.map((t) => line(t, palette.inkFaint, 0.75)), line(flatPx(viewport, boundary.points), context ? palette.inkSoft : palette.ink, context ? 1 : 2)];
    }
  }
}

/** A placed label's anchor: mid-height, at its start, middle or end (see FigureShape "text"). */
export function labelShape(label: PlacedLabel, fill: string): FigureShape {
  const { box } = label;
  const anchor = label.align === "left" ? "start" : label.align === "center" ? "middle" : "end";
  if (label.rotation === 0) {
    const x = anchor === "start" ? box.left : anchor === "middle" ? box.left + box.width / 2 : box.left + box.width;
    return { kind: "text", text: label.text, x, y: box.top + box.height / 2, anchor, rotation: 0, fontSize: label.fontSize, font: "serif", fill };
  }
  // Running upward, the text starts at the bottom of its box.
  const y = anchor === "start" ? box.top + box.height : anchor === "middle" ? box.top + box.height / 2 : box.top;
  return { kind: "text", text: label.text, x: box.left + box.width / 2, y, anchor, rotation: -90, fontSize: label.fontSize, font: "serif", fill };
}

/**
 * Larger labels: the boundaries' by the whole scale; the grid's, which sit between close lines, by half as much
 * (at full scale they crowd each other out of the layout, and the boundaries are what a far audience must read).
 */
function scaled(candidates: LabelCandidate[], labelScale: number): LabelCandidate[] {
  if (labelScale === 1) return candidates;
  const gridScale = 1 + (labelScale - 1) / 2;
  return candidates.map((c) => ({ ...c, fontSize: c.fontSize * (c.priority >= LABEL_PRIORITY.contextBoundary ? labelScale : gridScale) }));
}

/** The groups that depend on the background and the lab only: under and over the protocol's. */
interface BackdropGroups {
  viewport: DiagramViewport;
  under: FigureGroup[];
  over: FigureGroup[];
  labels: FigureGroup;
  /** The labels laid out with the backdrop: the protocol's slice labels keep clear of them. */
  placed: PlacedLabel[];
  tone: Record<PlacedLabel["tone"], string>;
}

function backdropGroups(scene: DiagramBackdrop, width: number, height: number, palette: FigurePalette, labelScale: number, paper: boolean, inset: FigureInset): BackdropGroups {
  const size = { width, height };
  const viewport = diagramViewport(scene, size, labelScale, inset);
  const area = (points: number[], fill: string): FigureShape => ({ kind: "area", points, fill });
  const tone = { ink: palette.ink, soft: palette.inkSoft, faint: palette.inkFaint };
  const labels = layoutLabels(scaled(diagramLabelCandidates(scene, viewport), labelScale), labelStage(width, height, inset), {
    obstacles: diagramLabelObstacles(scene, viewport),
    within: diagramLabelRegion(scene, viewport),
  });
  return {
    viewport,
    under: [
      { id: "background", shapes: paper ? [area([0, 0, width, 0, width, height, 0, height], palette.paper)] : [] },
      {
        id: "regions",
        shapes: [area(flatPx(viewport, scene.outline), palette.contextPaper), ...(paper ? [area(flatPx(viewport, scene.labRegion), palette.paper)] : [])],
      },
    ],
    over: [
      { id: "grid", shapes: scene.grid.map((g) => line(flatPx(viewport, g.points), palette.rule, 0.75)) },
      { id: "boundaries", shapes: scene.boundaries.flatMap((b) => boundaryShapes(b, viewport, palette)) },
      { id: "lab-worldline", shapes: [line(flatPx(viewport, scene.labWorldline), palette.inkSoft, 1.25)] },
    ],
    labels: { id: "labels", shapes: labels.map((l) => labelShape(l, tone[l.tone])) },
    placed: labels,
    tone,
  };
}

/**
 * The backdrop's groups are laid out (grid, boundaries, label placement) once per backdrop, size and look: a drag,
 * which changes only the protocol, gets the very same groups back, so the stage can tell at once they are unchanged.
 * A scene's backdrop fields are shared by every scene built on it (canvas/kernels/diagram/scene.ts).
 */
const rememberedBackdrop = memoizeLast(
  (
    chart: DiagramBackdrop["chart"],
    outline: DiagramBackdrop["outline"],
    labRegion: DiagramBackdrop["labRegion"],
    bounds: DiagramBackdrop["bounds"],
    boundaries: DiagramBackdrop["boundaries"],
    grid: DiagramBackdrop["grid"],
    worldline: DiagramBackdrop["labWorldline"],
    width: number,
    height: number,
    palette: FigurePalette,
    labelScale: number,
    paper: boolean,
    insetRight: number,
    insetBottom: number,
  ) => backdropGroups({ chart, outline, labRegion, bounds, boundaries, grid, labWorldline: worldline }, width, height, palette, labelScale, paper, { right: insetRight, bottom: insetBottom }),
);

export function diagramFigure(scene: DiagramScene, size: { width: number; height: number }, palette: FigurePalette, options: FigureOptions = {}): DiagramFigure {
  const { width, height } = size;
  const labelScale = options.labelScale ?? 1;
  const paper = options.paperBackground ?? true;
  const inset = options.inset ?? NO_INSET;
  const backdrop = rememberedBackdrop(
    scene.chart, scene.outline, scene.labRegion, scene.bounds, scene.boundaries, scene.grid, scene.labWorldline, width, height, palette, labelScale, paper, inset.right, inset.bottom,
  );
  const { viewport } = backdrop;
  const area = (points: number[], fill: string): FigureShape => ({ kind: "area", points, fill });
  const protocol = scene.protocol && options.cursor ? cutAtCursor(scene, options.cursor) : scene.protocol;

  const groups: FigureGroup[] = [
    ...backdrop.under,
    {
      id: "radiation",
      shapes: (protocol?.strips ?? []).map((s) => area(flatPx(viewport, s.polygon), s.kind === "far-field" ? palette.farFieldTint : palette.horizonTint)),
    },
    ...backdrop.over,
  ];

  const samples = protocol?.branches ?? [];
  let sliceLabels: PlacedLabel[] = [];
  if (protocol && samples.length >= 2) {
    const points = samples.map((s) => toPx(viewport, s.point));
    const a = flatPx(viewport, samples.map((s) => s.pointA));
    const b = flatPx(viewport, samples.map((s) => s.pointB));
    groups.push({ id: "branch-b", shapes: [line(b, palette.branchB, 2, DASHES.branchB, true)] });
    groups.push({ id: "branch-a", shapes: [line(a, palette.branchA, 2, DASHES.branchA, true)] });
    groups.push({
      id: "protocol-marks",
      shapes: [
        ...protocol.slices.map((slice) => line(flatPx(viewport, slice.points), palette.inkFaint, 0.75, DASHES.context)),
        ...protocol.marks.map((m) => {
          const p = toPx(viewport, m);
          return line([p.x - 4, p.y, p.x + 4, p.y], palette.inkSoft, 1);
        }),
      ],
    });
    sliceLabels = layoutLabels(scaled(sliceLabelCandidates(protocol, viewport), labelScale), labelStage(width, height, inset), {
      obstacles: sliceLabelObstacles(scene, protocol, viewport),
      placed: backdrop.placed,
    });
    if (options.cursor) {
      const end = points[points.length - 1];
      const [ax, ay] = a.slice(-2);
      const [bx, by] = b.slice(-2);
      groups.push({
        id: "time-cursor",
        shapes: [
          line([end.x - 9, end.y, end.x + 9, end.y], palette.ink, 1),
          { kind: "dot", x: ax, y: ay, radius: 2.5, stroke: null, width: 0, fill: palette.branchA },
          { kind: "dot", x: bx, y: by, radius: 2.5, stroke: null, width: 0, fill: palette.branchB },
        ],
      });
    }
  }

  groups.push({ id: "slice-labels", shapes: sliceLabels.map((l) => labelShape(l, backdrop.tone[l.tone])) });
  groups.push(backdrop.labels);
  return { width, height, viewport, groups };
}

/**
 * The Diagram's labels for the one label layout (kernels/diagram/label-layout.ts): candidates with their spots, and
 * the obstacles they keep clear of, in stage pixels.
 *
 * Two passes. The backdrop's labels (boundaries, the lab's radius, the grid) are laid out once per background and
 * size, clear of the corridor round the lab's worldline that the branches never leave (protocol-path.ts), so that a
 * drag of the protocol cannot put a branch under them. The protocol's time slices are labelled on every frame, clear
 * of those labels, the lab's worldline and the two branches as drawn.
 */
import { branchCorridor, type ProtocolOnDiagram } from "../kernels/diagram/protocol-path";
import type { DiagramBackdrop } from "../kernels/diagram/scene";
import { labRadiusLabel } from "../kernels/diagram/labels";
import { LABEL_PRIORITY, type LabelCandidate, type LabelObstacle, type LabelSpot, type LayoutOptions, type Px } from "../kernels/diagram/label-layout";
import { toPx, type DiagramViewport } from "../kernels/diagram/viewport";

const BOUNDARY_OFFSETS_PX = [13, 24];
/** How far along a boundary its label may slide when the middle is taken, px. */
const BOUNDARY_SLIDES_PX = [0, -36, 36, -72, 72];
/** Room kept round the lab's worldline and the branches beyond their drawn width, px. */
const LINE_CLEARANCE_PX = 3;

const alignOf = (dx: number): LabelSpot["align"] => (dx > 0.35 ? "left" : dx < -0.35 ? "right" : "center");
const verticalOf = (dy: number): LabelSpot["verticalAlign"] => (dy > 0.35 ? "top" : dy < -0.35 ? "bottom" : "middle");

function withSpots(base: Omit<LabelCandidate, keyof LabelSpot | "alternatives">, spots: LabelSpot[]): LabelCandidate {
  const [first, ...rest] = spots;
  return { ...base, ...first, alternatives: rest };
}

function boundaryLabels(scene: DiagramBackdrop, viewport: DiagramViewport): LabelCandidate[] {
  return scene.boundaries.map((b, i) => {
    const at = toPx(viewport, b.labelAt);
    // labelDirection is on the diagram (T up); on screen y runs down.
    const dx = b.labelDirection.X;
    const dy = -b.labelDirection.T;
    const spots: LabelSpot[] = [];
    if (b.points.length === 1) {
      // A corner point: straight out from the diagram, then turned 40° either way.
      for (const turn of [0, 0.7, -0.7]) {
        const [ux, uy] = [dx * Math.cos(turn) - dy * Math.sin(turn), dx * Math.sin(turn) + dy * Math.cos(turn)];
        for (const d of BOUNDARY_OFFSETS_PX) spots.push({ x: at.x + ux * d, y: at.y + uy * d, align: alignOf(ux), verticalAlign: verticalOf(uy), rotation: 0 });
      }
    } else {
      for (const slide of BOUNDARY_SLIDES_PX) {
        for (const d of BOUNDARY_OFFSETS_PX) {
          // Along the edge is perpendicular to the label's direction.
          spots.push({ x: at.x + dx * d - dy * slide, y: at.y + dy * d + dx * slide, align: alignOf(dx), verticalAlign: verticalOf(dy), rotation: 0 });
        }
      }
    }
    return withSpots(
      {
        id: `boundary-${i}`,
        text: b.label,
        fontSize: b.kind === "singularity" ? 13 : 15,
        priority: b.bordersLabRegion ? LABEL_PRIORITY.labBoundary : LABEL_PRIORITY.contextBoundary,
        tone: b.bordersLabRegion ? "ink" : "soft",
      },
      spots,
    );
  });
}

/** Points of a polyline at fractions of its length in samples, in the order given. */
const pick = (points: Px[], fractions: number[]) => fractions.map((f) => points[Math.min(points.length - 1, Math.max(0, Math.round(f * (points.length - 1))))]);

/** The width in pixels of the corridor the branches stay in, either side of the lab's worldline. */
export function corridorPx(scene: DiagramBackdrop, viewport: DiagramViewport): number {
  return branchCorridor(scene.bounds) * viewport.scale;
}

const LAB_LABEL_PX = 11;

function labLabel(scene: DiagramBackdrop, viewport: DiagramViewport): LabelCandidate {
  const { background } = scene.chart;
  const worldline = scene.labWorldline.map((p) => toPx(viewport, p));
  const near = corridorPx(scene, viewport) + LINE_CLEARANCE_PX + 3;
  // Where the worldline leans (toward i± in de Sitter's lab-centred frame) it comes nearer above or below a label
  // than beside it: then a spot twice as far out, clear of the corridor kept on every side of the label.
  const points = pick(worldline, [0.3, 0.7, 0.22, 0.78, 0.4, 0.6, 0.15, 0.85]);
  const spots = [near, 2 * near + LAB_LABEL_PX * 1.2].flatMap((away) =>
    points.flatMap((p): LabelSpot[] => [
      { x: p.x + away, y: p.y, align: "left", verticalAlign: "middle", rotation: 0 },
      { x: p.x - away, y: p.y, align: "right", verticalAlign: "middle", rotation: 0 },
    ]),
  );
  return withSpots(
    { id: "lab-radius", text: labRadiusLabel(background.kind, background.labRadiusMetres, scene.chart.horizonRadiusMetres), fontSize: LAB_LABEL_PX, priority: LABEL_PRIORITY.labRadius, tone: "soft" },
    spots,
  );
}

function gridLabels(scene: DiagramBackdrop, viewport: DiagramViewport): LabelCandidate[] {
  return scene.grid.map((g, i) => {
    const points = g.points.map((p) => toPx(viewport, p));
    const at = toPx(viewport, g.labelAt);
    let nearest = 0;
    points.forEach((p, k) => {
      if (Math.hypot(p.x - at.x, p.y - at.y) < Math.hypot(points[nearest].x - at.x, points[nearest].y - at.y)) nearest = k;
    });
    const home = points.length > 1 ? nearest / (points.length - 1) : 0;
    const fractions = [0, -0.08, 0.08, -0.16, 0.16, -0.24, 0.24].map((d) => home + d).filter((f) => f >= 0 && f <= 1);
    // A radius label runs up beside its line.
    const spots = pick(points.length > 0 ? points : [at], fractions).map((p): LabelSpot => ({ x: p.x + 2, y: p.y - 4, align: "left", verticalAlign: "top", rotation: -90 }));
    return withSpots({ id: `grid-${i}`, text: g.label, fontSize: 10, priority: LABEL_PRIORITY.grid, tone: "faint" }, spots);
  });
}

/** The backdrop's label candidates: the boundaries', the lab's radius, the grid's. */
export function diagramLabelCandidates(scene: DiagramBackdrop, viewport: DiagramViewport): LabelCandidate[] {
  return [...boundaryLabels(scene, viewport), labLabel(scene, viewport), ...gridLabels(scene, viewport)];
}

/** The lab region's horizons (near a bifurcation point a label would sit across one). */
function horizonObstacles(scene: DiagramBackdrop, viewport: DiagramViewport): LabelObstacle[] {
  return scene.boundaries
    .filter((b) => b.kind === "horizon" && b.bordersLabRegion)
    .map((b) => ({ points: b.points.map((p) => toPx(viewport, p)), clearance: 1 }));
}

/**
 * The edges at null infinity around the lab's region: the grid's labels keep clear of them (a radius label across
 * ℐ⁺ reads as if the line ended there). The boundaries' names, the lab's and the time slices' are placed beside
 * their own marks and keep their spots.
 */
function nullInfinityObstacles(scene: DiagramBackdrop, viewport: DiagramViewport): LabelObstacle[] {
  return scene.boundaries
    .filter((b) => b.kind === "null-infinity" && b.bordersLabRegion)
    .map((b) => ({ points: b.points.map((p) => toPx(viewport, p)), clearance: 1, forPriorityBelow: LABEL_PRIORITY.timeSlice }));
}

/** The grid's labels lie inside the diagram's outline, never in the blank paper beyond null infinity. */
export function diagramLabelRegion(scene: DiagramBackdrop, viewport: DiagramViewport): NonNullable<LayoutOptions["within"]> {
  return { polygon: scene.outline.map((p) => toPx(viewport, p)), forPriorityBelow: LABEL_PRIORITY.timeSlice };
}

/**
 * What the backdrop's labels keep clear of: the horizons, null infinity (the grid's labels), and the lab's worldline
 * with the branches' whole corridor.
 */
export function diagramLabelObstacles(scene: DiagramBackdrop, viewport: DiagramViewport): LabelObstacle[] {
  return [
    ...horizonObstacles(scene, viewport),
    ...nullInfinityObstacles(scene, viewport),
    { points: scene.labWorldline.map((p) => toPx(viewport, p)), clearance: corridorPx(scene, viewport) + LINE_CLEARANCE_PX },
  ];
}

/** The branches as drawn, in stage pixels. */
export function branchPixels(protocol: ProtocolOnDiagram, viewport: DiagramViewport): { a: Px[]; b: Px[] } {
  return { a: protocol.branches.map((s) => toPx(viewport, s.pointA)), b: protocol.branches.map((s) => toPx(viewport, s.pointB)) };
}

/**
 * Labels of the protocol's time slices: first just beside the branches where the slice crosses the lab's worldline
 * (right, then left), then along the slice, just above it or just below.
 */
export function sliceLabelCandidates(protocol: ProtocolOnDiagram, viewport: DiagramViewport): LabelCandidate[] {
  const beside = protocol.corridor * viewport.scale + LINE_CLEARANCE_PX + 3;
  return protocol.slices.map((slice, i) => {
    const points = slice.points.map((p) => toPx(viewport, p));
    const mark = toPx(viewport, slice.labPoint);
    const nearLab: LabelSpot[] = [
      { x: mark.x + beside, y: mark.y, align: "left", verticalAlign: "middle", rotation: 0 },
      { x: mark.x - beside, y: mark.y, align: "right", verticalAlign: "middle", rotation: 0 },
    ];
    const spots = [...nearLab, ...pick(points, [0.5, 0.35, 0.65, 0.2, 0.8, 0.1, 0.9]).flatMap((p): LabelSpot[] => [
      { x: p.x + 3, y: p.y - 2, align: "left", verticalAlign: "bottom", rotation: 0 },
      { x: p.x + 3, y: p.y + 2, align: "left", verticalAlign: "top", rotation: 0 },
    ])];
    return withSpots({ id: `slice-${i}`, text: slice.label, fontSize: 10, priority: LABEL_PRIORITY.timeSlice, tone: "soft" }, spots);
  });
}

/** What the slice labels keep clear of: the horizons, the lab's worldline and the branches as drawn. */
export function sliceLabelObstacles(scene: DiagramBackdrop, protocol: ProtocolOnDiagram, viewport: DiagramViewport): LabelObstacle[] {
  const { a, b } = branchPixels(protocol, viewport);
  return [
    ...horizonObstacles(scene, viewport),
    { points: scene.labWorldline.map((p) => toPx(viewport, p)), clearance: LINE_CLEARANCE_PX },
    { points: a, clearance: LINE_CLEARANCE_PX },
    { points: b, clearance: LINE_CLEARANCE_PX },
  ];
}

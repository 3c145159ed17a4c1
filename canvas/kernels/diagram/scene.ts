/**
 * Everything the Diagram draws, in diagram coordinates, computed from the physics maps: the regions, the labelled
 * boundaries (with the side of each horizon away from the lab), the grid, the lab's worldline, the protocol on it
 * and its radiation, and the notes that say what is not to scale.
 */
import { diagramBoundaries, type DiagramBoundary, type DiagramPoint } from "@/physics/backgrounds";
import type { ScenarioDocument, SchemaIssue } from "@/physics/scenario/schema";
import { c } from "@/physics/constants";
import { formatQuantity } from "@/physics/units";
import { makeDiagramChart, minkowskiScaleSeconds, protocolDurationSeconds, type DiagramChart } from "./chart";
import { centroid, convexHull } from "./geometry";
import { compactNumber } from "./labels";
import { gridLines, labWorldline, type GridLine } from "./grid-lines";
import { protocolOnDiagram, type ProtocolOnDiagram } from "./protocol-path";
import { boundsOf, type DiagramBounds } from "./viewport";

export interface SceneBoundary extends DiagramBoundary {
  /** Where its label goes, and the unit direction (on the diagram) to push the label away from the boundary. */
  labelAt: DiagramPoint;
  labelDirection: DiagramPoint;
  /** A point on the side away from the lab (where a horizon's hatch goes). */
  farSide: DiagramPoint;
}

/** The part of the scene that depends on the background and lab only (kept while a drag changes the protocol). */
export interface DiagramBackdrop {
  chart: DiagramChart;
  /** The whole drawn diagram (convex), and the lab's static region inside it. */
  outline: DiagramPoint[];
  labRegion: DiagramPoint[];
  bounds: DiagramBounds;
  boundaries: SceneBoundary[];
  grid: GridLine[];
  labWorldline: DiagramPoint[];
}

export interface DiagramScene extends DiagramBackdrop {
  protocol: ProtocolOnDiagram | null;
  /** What is not drawn to scale, in words. */
  notes: string[];
}

export type SceneOutcome = { ok: true; scene: DiagramScene } | { ok: false; issue: SchemaIssue };

const unit = (d: DiagramPoint): DiagramPoint => {
  const n = Math.hypot(d.T, d.X) || 1;
  return { T: d.T / n, X: d.X / n };
};

/** Midpoint of the longest piece of a polyline (where a label reads best). */
function longestPieceMiddle(points: DiagramPoint[]): { at: DiagramPoint; along: DiagramPoint } {
  if (points.length === 1) return { at: points[0], along: { T: 0, X: 1 } };
  let best = 0;
  let bestLength = -1;
  for (let i = 0; i + 1 < points.length; i++) {
    const length = Math.hypot(points[i + 1].T - points[i].T, points[i + 1].X - points[i].X);
    if (length > bestLength) [best, bestLength] = [i, length];
  }
  const a = points[best];
  const b = points[best + 1];
  return { at: { T: (a.T + b.T) / 2, X: (a.X + b.X) / 2 }, along: unit({ T: b.T - a.T, X: b.X - a.X }) };
}

function placeBoundary(boundary: DiagramBoundary, reference: DiagramPoint): SceneBoundary {
  const { at, along } = longestPieceMiddle(boundary.points);
  let direction: DiagramPoint;
  if (boundary.points.length === 1) {
    direction = unit({ T: at.T - reference.T, X: at.X - reference.X });
  } else {
    direction = { T: along.X, X: -along.T };
    if (direction.T * (at.T - reference.T) + direction.X * (at.X - reference.X) < 0) direction = { T: -direction.T, X: -direction.X };
  }
  return { ...boundary, labelAt: at, labelDirection: direction, farSide: { T: at.T + direction.T * 0.1, X: at.X + direction.X * 0.1 } };
}

function notesFor(chart: DiagramChart, document: ScenarioDocument, protocol: ProtocolOnDiagram | null): string[] {
  const notes = [
    `Branch separation exaggerated (${formatQuantity(document.separation.distanceMetres, "length")}, ${document.separation.axis}${
      document.separation.axis === "tangential" ? ", out of the diagram's plane" : ""
    }).`,
  ];
  if (chart.background.kind === "minkowski") {
    notes.push(`Compactified with L = ${formatQuantity(chart.nullScaleMetres, "length")} (c × ${formatQuantity(chart.nullScaleMetres / c, "time")}).`);
  }
  if (protocol?.timeScale.warp) {
    notes.push("Ramps and hold drawn at readable lengths, not to scale: the τ labels give the lab's times.");
  }
  if (protocol?.timeScale.kind === "rescaled") {
    const { protocolEfolds, drawnEfolds, efoldSeconds } = protocol.timeScale;
    const how = protocolEfolds > drawnEfolds ? "compressed" : "stretched";
    notes.push(
      `Protocol time ${how}: it lasts ${compactNumber(protocolEfolds)} horizon e-folding times (1/κ = ${formatQuantity(efoldSeconds, "time")}), drawn as ${compactNumber(drawnEfolds)}.`,
    );
  }
  return notes;
}

export type BackdropOutcome = { ok: true; backdrop: DiagramBackdrop } | { ok: false; issue: SchemaIssue };

export function buildDiagramBackdrop(document: ScenarioDocument): BackdropOutcome {
  const made = makeDiagramChart(document);
  if (!made.ok) return made;
  const { chart } = made;
  const raw = diagramBoundaries(chart.background, 2);
  const outline = convexHull(raw.flatMap((b) => b.points));
  const labRegion = convexHull(raw.filter((b) => b.bordersLabRegion).flatMap((b) => b.points));
  const labCentre = centroid(labRegion);
  const outlineCentre = centroid(outline);
  return {
    ok: true,
    backdrop: {
      chart,
      outline,
      labRegion,
      bounds: boundsOf(outline),
      boundaries: raw.map((b) => placeBoundary(b, b.bordersLabRegion ? labCentre : outlineCentre)),
      grid: document.display.showGrid ? gridLines(chart) : [],
      labWorldline: labWorldline(chart),
    },
  };
}

export function sceneOnBackdrop(backdrop: DiagramBackdrop, document: ScenarioDocument): DiagramScene {
  const protocol = protocolOnDiagram(backdrop.chart, document, backdrop.outline);
  return { ...backdrop, protocol, notes: notesFor(backdrop.chart, document, protocol) };
}

export function buildDiagramScene(document: ScenarioDocument): SceneOutcome {
  const made = buildDiagramBackdrop(document);
  return made.ok ? { ok: true, scene: sceneOnBackdrop(made.backdrop, document) } : made;
}

/**
 * A scene builder for one Diagram: the backdrop is rebuilt only when the background, the lab, the grid switch or
 * (for Minkowski) the diagram's length scale change, not on every frame of a drag.
 */
export function createSceneBuilder(): (document: ScenarioDocument) => SceneOutcome {
  let last: { keys: unknown[]; made: BackdropOutcome } | null = null;
  return (document) => {
    const duration = protocolDurationSeconds(document);
    const scaleKey = document.background.kind === "minkowski" ? minkowskiScaleSeconds(duration) : 0;
    const keys = [document.background, document.lab, document.display.showGrid, scaleKey];
    if (!last || !keys.every((k, i) => Object.is(k, last!.keys[i]))) last = { keys, made: buildDiagramBackdrop(document) };
    const { made } = last;
    return made.ok ? { ok: true, scene: sceneOnBackdrop(made.backdrop, document) } : made;
  };
}

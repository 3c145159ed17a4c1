/** The label candidates of a diagram scene, in stage pixels, for the label layout. */
import type { DiagramScene } from "../kernels/diagram/scene";
import type { LabelCandidate } from "../kernels/diagram/decorations";
import { toPx, type DiagramViewport } from "../kernels/diagram/viewport";

const BOUNDARY_OFFSET_PX = 13;
const ROOM_FOR_TIME_LABELS_PX = 84;
/** Time labels beside the lab's worldline start past the branches drawn along it. */
const CLEAR_OF_BRANCHES_PX = 14;

export function diagramLabelCandidates(scene: DiagramScene, viewport: DiagramViewport): LabelCandidate[] {
  const boundaryLabels = scene.boundaries.map((b, i): LabelCandidate => {
    const at = toPx(viewport, b.labelAt);
    // labelDirection is on the diagram (T up); on screen y runs down.
    const dx = b.labelDirection.X;
    const dy = -b.labelDirection.T;
    return {
      id: `boundary-${i}`,
      text: b.label,
      x: at.x + dx * BOUNDARY_OFFSET_PX,
      y: at.y + dy * BOUNDARY_OFFSET_PX,
      align: dx > 0.35 ? "left" : dx < -0.35 ? "right" : "center",
      verticalAlign: dy > 0.35 ? "top" : dy < -0.35 ? "bottom" : "middle",
      rotation: 0,
      fontSize: b.kind === "singularity" ? 13 : 15,
      priority: b.bordersLabRegion ? 100 : 90,
      tone: b.bordersLabRegion ? "ink" : "soft",
    };
  });
  const gridLabels = scene.grid.map((g, i): LabelCandidate => {
    const at = toPx(viewport, g.labelAt);
    const timeAtCentre = g.family === "time" && (scene.chart.background.kind === "minkowski" || scene.chart.background.kind === "de-sitter");
    // Labels at the centre line go outside it where the stage leaves room, else just inside.
    const outside = timeAtCentre && toPx(viewport, { T: 0, X: scene.bounds.minX }).x > ROOM_FOR_TIME_LABELS_PX;
    if (g.family === "radius") {
      return { id: `grid-${i}`, text: g.label, x: at.x + 2, y: at.y - 4, align: "left", verticalAlign: "top", rotation: -90, fontSize: 10, priority: 10, tone: "faint" };
    }
    return {
      id: `grid-${i}`,
      text: g.label,
      x: outside ? at.x - 6 : at.x + CLEAR_OF_BRANCHES_PX,
      y: at.y,
      align: outside ? "right" : "left",
      verticalAlign: "middle",
      rotation: 0,
      fontSize: 10,
      priority: g.valueSI === 0 ? 20 : 15,
      tone: "faint",
    };
  });
  return [...boundaryLabels, ...gridLabels];
}

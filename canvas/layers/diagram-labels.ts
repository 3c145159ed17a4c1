/** The label candidates of a diagram scene, in stage pixels, for the label layout. */
import type { DiagramBackdrop } from "../kernels/diagram/scene";
import { labelBox, type LabelCandidate } from "../kernels/diagram/decorations";
import { toPx, type DiagramViewport } from "../kernels/diagram/viewport";

const BOUNDARY_OFFSET_PX = 13;
const ROOM_FOR_TIME_LABELS_PX = 84;
/** Time labels beside the lab's worldline start past the branches drawn along it. */
const CLEAR_OF_BRANCHES_PX = 14;

type Box = ReturnType<typeof labelBox>;
type Px = { x: number; y: number };

/** Whether the segment from p to q passes through the box (Liang–Barsky clipping against its four sides). */
function segmentCrossesBox(p: Px, q: Px, box: Box): boolean {
  const dx = q.x - p.x;
  const dy = q.y - p.y;
  let t0 = 0;
  let t1 = 1;
  const sides: [number, number][] = [
    [-dx, p.x - box.left],
    [dx, box.left + box.width - p.x],
    [-dy, p.y - box.top],
    [dy, box.top + box.height - p.y],
  ];
  for (const [denominator, distance] of sides) {
    if (denominator === 0) {
      if (distance < 0) return false;
      continue;
    }
    const t = distance / denominator;
    if (denominator < 0) t0 = Math.max(t0, t);
    else t1 = Math.min(t1, t);
    if (t0 > t1) return false;
  }
  return true;
}

/** Whether a label's box would cross one of the lab region's horizons (near a bifurcation point the room runs out). */
function crossesHorizon(label: LabelCandidate, scene: DiagramBackdrop, viewport: DiagramViewport): boolean {
  const box = labelBox(label);
  return scene.boundaries
    .filter((b) => b.kind === "horizon" && b.bordersLabRegion)
    .some((b) => b.points.slice(1).some((point, i) => segmentCrossesBox(toPx(viewport, b.points[i]), toPx(viewport, point), box)));
}

export function diagramLabelCandidates(scene: DiagramBackdrop, viewport: DiagramViewport): LabelCandidate[] {
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
  // A radius label runs up its line from the t = 0 slice; where that line nears a horizon there is no room for it.
  const roomy = gridLabels.filter((label, i) => scene.grid[i].family !== "radius" || !crossesHorizon(label, scene, viewport));
  return [...boundaryLabels, ...roomy];
}

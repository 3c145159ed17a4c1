/**
 * What the Diagram says about the point under the pointer: the static coordinates there (Killing time t and the
 * radius, with units), and, where the pointer is on the lab's worldline, the lab's own proper time τ from the start
 * of the separation, the time the protocol, the Offsets panel and the slices' labels count in.
 */
import { compactQuantity } from "./labels";
import { labProperTime } from "./protocol-path";
import type { DiagramScene } from "./scene";
import { toPx, type DiagramViewport } from "./viewport";

/** How near (pixels) the pointer must be to the lab's worldline to read the lab's clock. */
export const ON_WORLDLINE_PX = 6;

export function pointerReadout(scene: DiagramScene, viewport: DiagramViewport, pointerPx: { x: number; y: number }, coordinates: { tSeconds: number; rMetres: number } | null): string {
  if (!coordinates) return "outside the lab's static region";
  const background = scene.chart.background;
  const radius = background.kind === "rindler" ? "ξ" : background.kind === "minkowski" ? "x" : "r";
  const where = `t = ${compactQuantity(coordinates.tSeconds, "time")}   ${radius} = ${compactQuantity(coordinates.rMetres, "length")}`;
  const onLab = toPx(viewport, background.conformal.toDiagram(coordinates.tSeconds, background.labRadiusMetres));
  if (!scene.protocol || Math.hypot(onLab.x - pointerPx.x, onLab.y - pointerPx.y) > ON_WORLDLINE_PX) return where;
  const tau = labProperTime(scene.chart, scene.protocol.timeScale, scene.protocol.totalSeconds, coordinates.tSeconds);
  return `on the lab: τ = ${compactQuantity(tau, "time")}   ${where}`;
}

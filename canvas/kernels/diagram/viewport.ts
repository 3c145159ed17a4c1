/** Diagram coordinates ↔ stage pixels, with one scale for T and X so that light stays at 45° on screen. */
import type { DiagramPoint } from "@/physics/backgrounds";

export interface DiagramViewport {
  width: number;
  height: number;
  /** Pixels per diagram unit, the same across and up. */
  scale: number;
  /** Pixel position of the diagram origin. */
  originX: number;
  originY: number;
}

export interface DiagramBounds {
  minT: number;
  maxT: number;
  minX: number;
  maxX: number;
}

export function boundsOf(points: DiagramPoint[]): DiagramBounds {
  return {
    minT: Math.min(...points.map((p) => p.T)),
    maxT: Math.max(...points.map((p) => p.T)),
    minX: Math.min(...points.map((p) => p.X)),
    maxX: Math.max(...points.map((p) => p.X)),
  };
}

export interface Padding {
  left: number;
  right: number;
  top: number;
  bottom: number;
}

/** The largest uniform scale that fits `bounds` in the stage inside `padding`, centred in what is left. */
export function fitDiagramViewport(bounds: DiagramBounds, size: { width: number; height: number }, padding: Padding): DiagramViewport {
  const spanX = bounds.maxX - bounds.minX;
  const spanT = bounds.maxT - bounds.minT;
  const innerWidth = size.width - padding.left - padding.right;
  const innerHeight = size.height - padding.top - padding.bottom;
  const scale = Math.max(1e-6, Math.min(innerWidth / spanX, innerHeight / spanT));
  return {
    width: size.width,
    height: size.height,
    scale,
    originX: padding.left + innerWidth / 2 - ((bounds.minX + bounds.maxX) / 2) * scale,
    originY: padding.top + innerHeight / 2 + ((bounds.minT + bounds.maxT) / 2) * scale,
  };
}

export function toPx(viewport: DiagramViewport, p: DiagramPoint): { x: number; y: number } {
  return { x: viewport.originX + p.X * viewport.scale, y: viewport.originY - p.T * viewport.scale };
}

export function fromPx(viewport: DiagramViewport, x: number, y: number): DiagramPoint {
  return { X: (x - viewport.originX) / viewport.scale, T: (viewport.originY - y) / viewport.scale };
}

/** A polyline as Konva's flat [x0, y0, x1, y1, …]. */
export function flatPx(viewport: DiagramViewport, points: DiagramPoint[]): number[] {
  return points.flatMap((p) => {
    const q = toPx(viewport, p);
    return [q.x, q.y];
  });
}

/**
 * The one label layout of the Diagram and the Offsets panel (its time axis: kernels/offsets/axis-ticks.ts). Each label offers candidate spots (its preferred one first);
 * in priority order, each takes the first spot where its box stays on the stage, clear of every label already
 * placed and of every obstacle (worldlines, horizons: polylines in stage pixels, each with a clearance). A label
 * with no such spot is dropped, never drawn over another label or a worldline.
 */

export interface Px {
  x: number;
  y: number;
}

/** Where a label's text sits: the anchor point, the text's alignment about it, and its direction. */
export interface LabelSpot {
  x: number;
  y: number;
  align: "left" | "center" | "right";
  verticalAlign: "top" | "middle" | "bottom";
  /** 0, or −90 for text running upward. */
  rotation: 0 | -90;
}

export interface LabelCandidate extends LabelSpot {
  id: string;
  text: string;
  fontSize: number;
  /** Higher first: boundary labels, then the lab's radius, then grid labels, then the protocol's time slices. */
  priority: number;
  tone: "ink" | "soft" | "faint";
  /** Average advance of one character of its face, in ems (default: the figure's serif and mono faces). */
  characterEm?: number;
  /** Further spots to try, in order, when the preferred one (the candidate's own) is taken. */
  alternatives?: LabelSpot[];
}

export interface Box {
  left: number;
  top: number;
  width: number;
  height: number;
}

export interface PlacedLabel extends LabelCandidate {
  box: Box;
}

/** A polyline no label may touch, with the room (px) kept on either side of it. */
export interface LabelObstacle {
  points: Px[];
  clearance: number;
  /** Only labels of a lower priority keep clear of it (a boundary's own name is placed beside it by design). */
  forPriorityBelow?: number;
}

/** Priorities of the Diagram's label families (the layout itself only compares them). */
export const LABEL_PRIORITY = { labBoundary: 100, contextBoundary: 90, labRadius: 60, timeSlice: 30, grid: 10 } as const;

/** Average advance of a character, in ems, of the figure's serif and mono faces (a little generous, so boxes cover the ink). */
const EM_PER_CHARACTER = 0.56;

/** The text's box on screen; widths estimated from the font size. */
export function labelBox(label: LabelSpot & { text: string; fontSize: number; characterEm?: number }): Box {
  const along = [...label.text].length * label.fontSize * (label.characterEm ?? EM_PER_CHARACTER);
  const across = label.fontSize * 1.2;
  const [w, h] = label.rotation === 0 ? [along, across] : [across, along];
  const alignShift = label.align === "left" ? 0 : label.align === "center" ? 0.5 : 1;
  const verticalShift = label.verticalAlign === "top" ? 0 : label.verticalAlign === "middle" ? 0.5 : 1;
  if (label.rotation === 0) return { left: label.x - alignShift * w, top: label.y - verticalShift * h, width: w, height: h };
  // Rotated upward: "left" alignment means the text starts at the anchor and runs up.
  return { left: label.x - verticalShift * w, top: label.y - (1 - alignShift) * h, width: w, height: h };
}

export function boxesOverlap(a: Box, b: Box, gap = 0): boolean {
  return a.left < b.left + b.width + gap && b.left < a.left + a.width + gap && a.top < b.top + b.height + gap && b.top < a.top + a.height + gap;
}

const grown = (box: Box, by: number): Box => ({ left: box.left - by, top: box.top - by, width: box.width + 2 * by, height: box.height + 2 * by });

/** Whether the segment from p to q passes through the box (Liang–Barsky clipping against its four sides). */
export function segmentCrossesBox(p: Px, q: Px, box: Box): boolean {
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

/** Whether a polyline passes through the box (a lone point counts when it lies inside). */
export function polylineCrossesBox(points: Px[], box: Box): boolean {
  if (points.length === 1) return segmentCrossesBox(points[0], points[0], box);
  for (let i = 1; i < points.length; i++) if (segmentCrossesBox(points[i - 1], points[i], box)) return true;
  return false;
}

/** An obstacle with its bounding box, so most labels are cleared by one comparison (the broad phase). */
interface PreparedObstacle extends LabelObstacle {
  bounds: Box;
}

function prepare(obstacle: LabelObstacle): PreparedObstacle {
  const xs = obstacle.points.map((p) => p.x);
  const ys = obstacle.points.map((p) => p.y);
  const left = Math.min(...xs);
  const top = Math.min(...ys);
  return { ...obstacle, bounds: { left, top, width: Math.max(...xs) - left, height: Math.max(...ys) - top } };
}

function blockedBy(obstacle: PreparedObstacle, box: Box): boolean {
  const around = grown(box, obstacle.clearance);
  return boxesOverlap(obstacle.bounds, around) && polylineCrossesBox(obstacle.points, around);
}

export interface LayoutOptions {
  /** Room kept between two labels, px. */
  gapPx?: number;
  obstacles?: LabelObstacle[];
  /** A convex region (the figure's outline) that labels of a lower priority than given must lie inside. */
  within?: { polygon: Px[]; forPriorityBelow: number };
  /** Labels already on the stage (laid out earlier, e.g. once per background): the new ones keep clear of them. */
  placed?: PlacedLabel[];
}

/**
 * Greedy layout: in priority order (ties keep their order), each label takes its first spot that is on the stage
 * and clear of the labels kept so far and of the obstacles; an empty text (a grid line drawn for context only) is
 * no label. Returns the newly placed labels, each with the spot it took.
 */
/** Whether a box lies inside a convex polygon (its four corners do; the polygon's vertices in either turning order). */
export function boxInsideConvex(polygon: Px[], box: Box): boolean {
  if (polygon.length < 3) return false;
  const corners = [
    { x: box.left, y: box.top },
    { x: box.left + box.width, y: box.top },
    { x: box.left, y: box.top + box.height },
    { x: box.left + box.width, y: box.top + box.height },
  ];
  return corners.every((c) => {
    let sign = 0;
    for (let i = 0; i < polygon.length; i++) {
      const p = polygon[i];
      const q = polygon[(i + 1) % polygon.length];
      const cross = (q.x - p.x) * (c.y - p.y) - (q.y - p.y) * (c.x - p.x);
      if (cross === 0) continue;
      if (sign === 0) sign = Math.sign(cross);
      else if (Math.sign(cross) !== sign) return false;
    }
    return true;
  });
}

export function layoutLabels(candidates: LabelCandidate[], stage: { width: number; height: number }, options: LayoutOptions = {}): PlacedLabel[] {
  const gap = options.gapPx ?? 2;
  const obstacles = (options.obstacles ?? []).filter((o) => o.points.length > 0).map(prepare);
  const kept: PlacedLabel[] = [...(options.placed ?? [])];
  const placed: PlacedLabel[] = [];
  const ordered = candidates.map((c, i) => ({ c, i })).sort((a, b) => b.c.priority - a.c.priority || a.i - b.i);
  for (const { c: label } of ordered) {
    if (label.text === "") continue;
    for (const spot of [label, ...(label.alternatives ?? [])]) {
      const box = labelBox({ ...spot, text: label.text, fontSize: label.fontSize, characterEm: label.characterEm });
      const onStage = box.left >= 0 && box.top >= 0 && box.left + box.width <= stage.width && box.top + box.height <= stage.height;
      const outside = options.within !== undefined && label.priority < options.within.forPriorityBelow && !boxInsideConvex(options.within.polygon, box);
      if (!onStage || outside || kept.some((p) => boxesOverlap(p.box, box, gap)) || obstacles.some((o) => (o.forPriorityBelow === undefined || label.priority < o.forPriorityBelow) && blockedBy(o, box))) continue;
      const { alternatives: _unused, ...rest } = label;
      const chosen: PlacedLabel = { ...rest, x: spot.x, y: spot.y, align: spot.align, verticalAlign: spot.verticalAlign, rotation: spot.rotation, box };
      kept.push(chosen);
      placed.push(chosen);
      break;
    }
  }
  return placed;
}

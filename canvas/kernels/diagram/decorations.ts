/**
 * Drawing details worked out in stage pixels (their sizes are fixed on screen, not on the diagram): the wavy
 * singularity, the hatch on the far side of a horizon, branch paths drawn beside the lab's worldline, and a label
 * layout that drops labels which would overlap others.
 */

export interface Px {
  x: number;
  y: number;
}

/** A sine wave along the segment from → to, `amplitude` px either side, about `wavelength` px per period. */
export function wavyLine(from: Px, to: Px, amplitude: number, wavelength: number): number[] {
  const length = Math.hypot(to.x - from.x, to.y - from.y);
  if (length === 0) return [from.x, from.y];
  const periods = Math.max(1, Math.round(length / wavelength));
  const steps = periods * 12;
  const nx = -(to.y - from.y) / length;
  const ny = (to.x - from.x) / length;
  const points: number[] = [];
  for (let i = 0; i <= steps; i++) {
    const s = i / steps;
    const w = amplitude * Math.sin(2 * Math.PI * periods * s);
    points.push(from.x + (to.x - from.x) * s + nx * w, from.y + (to.y - from.y) * s + ny * w);
  }
  return points;
}

/** Short slanted ticks along from → to on the side of `farSide`, every `spacing` px, each `length` px long. */
export function hatchTicks(from: Px, to: Px, farSide: Px, spacing: number, length: number): number[][] {
  const len = Math.hypot(to.x - from.x, to.y - from.y);
  if (len === 0) return [];
  const tx = (to.x - from.x) / len;
  const ty = (to.y - from.y) / len;
  let nx = -ty;
  let ny = tx;
  if ((farSide.x - from.x) * nx + (farSide.y - from.y) * ny < 0) {
    nx = -nx;
    ny = -ny;
  }
  // Slant each tick 45° back along the line, the usual way to mark the side of a wall.
  const dx = (nx - tx) * Math.SQRT1_2 * length;
  const dy = (ny - ty) * Math.SQRT1_2 * length;
  const ticks: number[][] = [];
  for (let s = spacing / 2; s < len; s += spacing) {
    const x = from.x + tx * s;
    const y = from.y + ty * s;
    ticks.push([x, y, x + dx, y + dy]);
  }
  return ticks;
}

/**
 * A path beside the polyline `points`, `offsets[i]` px along the normal that points to +x (outward on every
 * diagram here: larger radius is to the right), as a flat array for Konva.
 */
export function offsetPolyline(points: Px[], offsets: number[]): number[] {
  return points.flatMap((p, i) => {
    const prev = points[Math.max(0, i - 1)];
    const next = points[Math.min(points.length - 1, i + 1)];
    const tx = next.x - prev.x;
    const ty = next.y - prev.y;
    const n = Math.hypot(tx, ty) || 1;
    let nx = -ty / n;
    let ny = tx / n;
    if (nx < 0) {
      nx = -nx;
      ny = -ny;
    }
    return [p.x + nx * offsets[i], p.y + ny * offsets[i]];
  });
}

export interface LabelCandidate {
  id: string;
  text: string;
  /** The anchor point, and where the text sits relative to it. */
  x: number;
  y: number;
  align: "left" | "center" | "right";
  verticalAlign: "top" | "middle" | "bottom";
  /** 0, or −90 for text running upward. */
  rotation: 0 | -90;
  fontSize: number;
  /** Higher first: boundary labels before grid labels. */
  priority: number;
  tone: "ink" | "soft" | "faint";
}

export interface PlacedLabel extends LabelCandidate {
  box: { left: number; top: number; width: number; height: number };
}

/** The text's box on screen; widths estimated from the font size (0.56 em per character, serif figures). */
export function labelBox(label: LabelCandidate): PlacedLabel["box"] {
  const along = [...label.text].length * label.fontSize * 0.56;
  const across = label.fontSize * 1.2;
  const [w, h] = label.rotation === 0 ? [along, across] : [across, along];
  const alignShift = label.align === "left" ? 0 : label.align === "center" ? 0.5 : 1;
  const verticalShift = label.verticalAlign === "top" ? 0 : label.verticalAlign === "middle" ? 0.5 : 1;
  if (label.rotation === 0) return { left: label.x - alignShift * w, top: label.y - verticalShift * h, width: w, height: h };
  // Rotated upward: "left" alignment means the text starts at the anchor and runs up.
  return { left: label.x - verticalShift * w, top: label.y - (1 - alignShift) * h, width: w, height: h };
}

const overlaps = (a: PlacedLabel["box"], b: PlacedLabel["box"], gap: number) =>
  a.left < b.left + b.width + gap && b.left < a.left + a.width + gap && a.top < b.top + b.height + gap && b.top < a.top + a.height + gap;

/**
 * Greedy layout: in priority order, keep each label that stays on the stage and clear of those already kept. An
 * empty text (a grid line drawn for context only) is no label.
 */
export function layoutLabels(candidates: LabelCandidate[], stage: { width: number; height: number }, gapPx = 2): PlacedLabel[] {
  const placed: PlacedLabel[] = [];
  for (const label of [...candidates].sort((a, b) => b.priority - a.priority)) {
    if (label.text === "") continue;
    const box = labelBox(label);
    const onStage = box.left >= 0 && box.top >= 0 && box.left + box.width <= stage.width && box.top + box.height <= stage.height;
    if (onStage && !placed.some((p) => overlaps(p.box, box, gapPx))) placed.push({ ...label, box });
  }
  return placed;
}

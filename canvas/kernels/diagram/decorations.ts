/**
 * Drawing details worked out in stage pixels (their sizes are fixed on screen, not on the diagram): the wavy
 * singularity and the hatch on the far side of a horizon. (The label layout is label-layout.ts.)
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


/** Plane geometry on diagram points (T up, X across): hulls, clipping, centroids, adaptive curve sampling. */
import type { DiagramPoint } from "@/physics/backgrounds";

export const point = (T: number, X: number): DiagramPoint => ({ T, X });
const cross = (o: DiagramPoint, a: DiagramPoint, b: DiagramPoint) => (a.X - o.X) * (b.T - o.T) - (a.T - o.T) * (b.X - o.X);

/** Convex hull, counter-clockwise in (X, T), collinear points dropped (Andrew's monotone chain). */
export function convexHull(points: DiagramPoint[]): DiagramPoint[] {
  const sorted = [...points].sort((a, b) => a.X - b.X || a.T - b.T);
  if (sorted.length < 3) return sorted;
  const build = (list: DiagramPoint[]) => {
    const chain: DiagramPoint[] = [];
    for (const p of list) {
      while (chain.length >= 2 && cross(chain[chain.length - 2], chain[chain.length - 1], p) <= 1e-12) chain.pop();
      chain.push(p);
    }
    chain.pop();
    return chain;
  };
  return [...build(sorted), ...build([...sorted].reverse())];
}

export function centroid(points: DiagramPoint[]): DiagramPoint {
  const n = Math.max(1, points.length);
  return { T: points.reduce((s, p) => s + p.T, 0) / n, X: points.reduce((s, p) => s + p.X, 0) / n };
}

/** Sutherland–Hodgman: the part of `subject` inside the convex, counter-clockwise polygon `clip`. */
export function clipToConvex(subject: DiagramPoint[], clip: DiagramPoint[]): DiagramPoint[] {
  let output = subject;
  for (let i = 0; i < clip.length && output.length > 0; i++) {
    const a = clip[i];
    const b = clip[(i + 1) % clip.length];
    const inside = (p: DiagramPoint) => cross(a, b, p) >= -1e-12;
    const input = output;
    output = [];
    for (let j = 0; j < input.length; j++) {
      const current = input[j];
      const previous = input[(j + input.length - 1) % input.length];
      const intersect = () => {
        const d1 = cross(a, b, previous);
        const d2 = cross(a, b, current);
        const s = d1 / (d1 - d2);
        return { T: previous.T + s * (current.T - previous.T), X: previous.X + s * (current.X - previous.X) };
      };
      if (inside(current)) {
        if (!inside(previous)) output.push(intersect());
        output.push(current);
      } else if (inside(previous)) {
        output.push(intersect());
      }
    }
  }
  return output;
}

export function distance(a: DiagramPoint, b: DiagramPoint): number {
  return Math.hypot(a.T - b.T, a.X - b.X);
}

const finite = (p: DiagramPoint | null): p is DiagramPoint => p !== null && Number.isFinite(p.T) && Number.isFinite(p.X);

/**
 * Points of the curve s ↦ curve(s) over [from, to], starting from `seeds` evenly spaced parameters and halving any
 * step longer than `maxStep` on the diagram (up to `maxDepth` times), so a curve that races into a corner of the
 * diagram is neither jagged nor oversampled. Parameters where the curve is undefined are skipped.
 */
export function sampleCurve(
  curve: (s: number) => DiagramPoint | null,
  from: number,
  to: number,
  options: { seeds?: number; maxStep?: number; maxDepth?: number } = {},
): DiagramPoint[] {
  const seeds = options.seeds ?? 48;
  const maxStep = options.maxStep ?? 0.01;
  const maxDepth = options.maxDepth ?? 7;
  const result: DiagramPoint[] = [];
  const refine = (s0: number, p0: DiagramPoint, s1: number, p1: DiagramPoint, depth: number) => {
    if (depth < maxDepth && distance(p0, p1) > maxStep) {
      const sm = (s0 + s1) / 2;
      const pm = curve(sm);
      if (finite(pm)) {
        refine(s0, p0, sm, pm, depth + 1);
        refine(sm, pm, s1, p1, depth + 1);
        return;
      }
    }
    result.push(p1);
  };
  let previous: { s: number; p: DiagramPoint } | null = null;
  for (let i = 0; i <= seeds; i++) {
    const s = from + ((to - from) * i) / seeds;
    const p = curve(s);
    if (!finite(p)) continue;
    if (previous) refine(previous.s, previous.p, s, p, 0);
    else result.push(p);
    previous = { s, p };
  }
  return result;
}

/** The root of a monotone function on [low, high] by bisection (the function need only change sign once). */
export function bisect(f: (x: number) => number, low: number, high: number, iterations = 80): number {
  let a = low;
  let b = high;
  const fa = f(a);
  for (let i = 0; i < iterations; i++) {
    const m = (a + b) / 2;
    if (Math.sign(f(m)) === Math.sign(fa)) a = m;
    else b = m;
  }
  return (a + b) / 2;
}

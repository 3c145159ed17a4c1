/**
 * Gauss–Legendre nodes and weights on [−1, 1], by Newton's iteration on the Legendre polynomial from the
 * Chebyshev-like first guess cos(π(i − 1/4)/(n + 1/2)) (Abramowitz & Stegun §25.4.29; common practice).
 */
export interface GaussLegendreRule {
  nodes: Float64Array;
  weights: Float64Array;
}

const rules = new Map<number, GaussLegendreRule>();

export function gaussLegendre(order: number): GaussLegendreRule {
  const cached = rules.get(order);
  if (cached) return cached;
  const nodes = new Float64Array(order);
  const weights = new Float64Array(order);
  for (let i = 0; i < order; i++) {
    let x = Math.cos((Math.PI * (i + 0.75)) / (order + 0.5));
    let derivative = 0;
    for (let iteration = 0; iteration < 100; iteration++) {
      let p0 = 1;
      let p1 = x;
      for (let k = 2; k <= order; k++) [p0, p1] = [p1, ((2 * k - 1) * x * p1 - (k - 1) * p0) / k];
      derivative = (order * (x * p1 - p0)) / (x * x - 1);
      const step = p1 / derivative;
      x -= step;
      if (Math.abs(step) < 1e-16) break;
    }
    nodes[i] = x;
    weights[i] = 2 / ((1 - x * x) * derivative * derivative);
  }
  const rule = { nodes, weights };
  rules.set(order, rule);
  return rule;
}

/** ∫_a^b f(x) dx by the Gauss–Legendre rule of the given order. */
export function integrateGaussLegendre(f: (x: number) => number, a: number, b: number, order = 16): number {
  const { nodes, weights } = gaussLegendre(order);
  const half = (b - a) / 2;
  const mid = (a + b) / 2;
  let sum = 0;
  for (let i = 0; i < order; i++) sum += weights[i] * f(mid + half * nodes[i]);
  return sum * half;
}

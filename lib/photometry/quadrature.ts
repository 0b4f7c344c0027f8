/** Numerical integration rules used by the photometry ring (pure, no allocation in hot loops). */

/** Simpson's rule for f over [a, b] with `intervals` (rounded up to even) panels. */
export function simpson(f: (x: number) => number, a: number, b: number, intervals = 2048): number {
  const count = Math.max(2, intervals + (intervals % 2));
  const step = (b - a) / count;
  let sum = f(a) + f(b);
  for (let index = 1; index < count; index += 1) {
    sum += f(a + index * step) * (index % 2 === 1 ? 4 : 2);
  }
  return (sum * step) / 3;
}

export interface GaussRule {
  /** Nodes on [−1, 1]. */
  readonly nodes: readonly number[];
  readonly weights: readonly number[];
}

const rules = new Map<number, GaussRule>();

/**
 * n-point Gauss–Legendre rule on [−1, 1], nodes found by Newton's method on the Legendre
 * polynomial P_n (Golub–Welsch gives the same values; exact for polynomials of degree 2n − 1).
 */
export function gaussLegendre(pointCount: number): GaussRule {
  const cached = rules.get(pointCount);
  if (cached) return cached;
  const nodes: number[] = [];
  const weights: number[] = [];
  for (let index = 1; index <= pointCount; index += 1) {
    let x = Math.cos((Math.PI * (index - 0.25)) / (pointCount + 0.5));
    let derivative = 0;
    for (let iteration = 0; iteration < 100; iteration += 1) {
      let previous = 1;
      let current = x;
      for (let order = 2; order <= pointCount; order += 1) {
        const next = ((2 * order - 1) * x * current - (order - 1) * previous) / order;
        previous = current;
        current = next;
      }
      derivative = (pointCount * (x * current - previous)) / (x * x - 1);
      const stepX = current / derivative;
      x -= stepX;
      if (Math.abs(stepX) < 1e-15) break;
    }
    nodes.push(x);
    weights.push(2 / ((1 - x * x) * derivative * derivative));
  }
  const rule = { nodes, weights };
  rules.set(pointCount, rule);
  return rule;
}

/** Composite Gauss–Legendre over [a, b] split into `panels` equal panels. */
export function compositeGauss(
  f: (x: number) => number,
  a: number,
  b: number,
  panels: number,
  pointCount = 8,
): number {
  const { nodes, weights } = gaussLegendre(pointCount);
  const width = (b - a) / panels;
  let sum = 0;
  for (let panel = 0; panel < panels; panel += 1) {
    const middle = a + (panel + 0.5) * width;
    for (let index = 0; index < nodes.length; index += 1) {
      sum += weights[index] * f(middle + (nodes[index] * width) / 2);
    }
  }
  return (sum * width) / 2;
}

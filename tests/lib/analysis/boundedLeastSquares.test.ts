import { describe, expect, it } from 'vitest';
import { boundedLeastSquares } from '@/lib/analysis';
import { seededRandom } from '@/lib/seededRandom';

describe('least squares with bounds', () => {
  it('separate unknowns are each clamped to their bounds (by hand: x = (0.3, 1))', () => {
    const { x } = boundedLeastSquares({
      matrix: [
        [1, 0],
        [0, 1],
      ],
      rhs: [0.3, 1.7],
      lower: [0, 0],
      upper: [1, 1],
      start: [0.5, 0.5],
    });
    expect(x[0]).toBeCloseTo(0.3, 7);
    expect(x[1]).toBe(1);
  });

  it('coupled unknowns inside the bounds solve exactly (by hand: x + y = 1, x − y = 0.2 → 0.6, 0.4)', () => {
    const { x, residualNorm } = boundedLeastSquares({
      matrix: [
        [1, 1],
        [1, -1],
      ],
      rhs: [1, 0.2],
      lower: [0, 0],
      upper: [1, 1],
      start: [0, 0],
    });
    expect(x[0]).toBeCloseTo(0.6, 7);
    expect(x[1]).toBeCloseTo(0.4, 7);
    expect(residualNorm).toBeLessThan(1e-6);
  });

  it('both unknowns held at their upper bounds (by hand: x = 1, y = 1)', () => {
    // Minimise (x − 2)² + (x + y − 2.5)² with 0 ≤ x, y ≤ 1. Unbounded: x = 2, y = 0.5. x is held at 1;
    // then y minimises (y − 1.5)², so y = 1 at its bound; both bounds are active; residual √(1 + 0.25).
    const { x, residualNorm } = boundedLeastSquares({
      matrix: [
        [1, 0],
        [1, 1],
      ],
      rhs: [2, 2.5],
      lower: [0, 0],
      upper: [1, 1],
      start: [0.5, 0.5],
    });
    expect(x).toEqual([1, 1]);
    expect(residualNorm).toBeCloseTo(Math.sqrt(1.25), 9);
  });

  it('an upper bound active and the other unknown free inside (by hand: x = 1, y = 0.5)', () => {
    // (x − 2)² + (x + y − 1.5)²: x held at 1, then y = 0.5 (inside).
    const { x } = boundedLeastSquares({
      matrix: [
        [1, 0],
        [1, 1],
      ],
      rhs: [2, 1.5],
      lower: [0, 0],
      upper: [1, 1],
      start: [0, 0],
    });
    expect(x[0]).toBe(1);
    expect(x[1]).toBeCloseTo(0.5, 7);
  });
});

describe('least squares with bounds on a larger problem', () => {
  it('200 unknowns sharing one target finish quickly and meet it (one equation, many ways)', () => {
    // Σ x_j = 50 with 0 ≤ x_j ≤ 1: any split meets it; the pull toward the start (all 0.1) spreads it
    // evenly, so every x_j = 0.25 (by hand: 0.1 + (50 − 20)/200).
    const n = 200;
    const started = performance.now();
    const { x, residualNorm } = boundedLeastSquares({
      matrix: [Array.from({ length: n }, () => 1)],
      rhs: [50],
      lower: Array.from({ length: n }, () => 0),
      upper: Array.from({ length: n }, () => 1),
      start: Array.from({ length: n }, () => 0.1),
    });
    expect(performance.now() - started).toBeLessThan(2000);
    expect(residualNorm).toBeLessThan(1e-6);
    for (const value of x) expect(value).toBeCloseTo(0.25, 6);
  });
});

/**
 * Reference by exhaustion: every way of holding each unknown at its lower bound, its upper bound or
 * free; the free ones solved from their normal equations by Cramer's rule (n ≤ 3); the best feasible
 * point. Independent of the solver's method (no pull: the matrices here have full column rank).
 */
function exhaustiveBounded(matrix: number[][], rhs: number[], upper: number): number[] {
  const n = matrix[0].length;
  const objective = (x: number[]) =>
    matrix.reduce((sum, row, i) => sum + (row.reduce((t, a, j) => t + a * x[j], 0) - rhs[i]) ** 2, 0);
  const det = (m: number[][]): number =>
    m.length === 1
      ? m[0][0]
      : m[0].reduce((sum, value, column) => {
          const minor = m.slice(1).map((row) => row.filter((_, k) => k !== column));
          return sum + (column % 2 === 0 ? 1 : -1) * value * det(minor);
        }, 0);
  let best: number[] | null = null;
  for (let code = 0; code < 3 ** n; code += 1) {
    const state = Array.from({ length: n }, (_, j) => Math.floor(code / 3 ** j) % 3); // 0 low, 1 high, 2 free
    const x = state.map((kind) => (kind === 1 ? upper : 0));
    const freeIds = state.flatMap((kind, j) => (kind === 2 ? [j] : []));
    if (freeIds.length > 0) {
      const gram = freeIds.map((j) =>
        freeIds.map((k) => matrix.reduce((sum, row) => sum + row[j] * row[k], 0)),
      );
      const right = freeIds.map((j) =>
        matrix.reduce((sum, row, i) => {
          const held = row.reduce((t, a, k) => (state[k] === 2 ? t : t + a * x[k]), 0);
          return sum + row[j] * (rhs[i] - held);
        }, 0),
      );
      const d = det(gram);
      if (Math.abs(d) < 1e-12) continue;
      freeIds.forEach((j, index) => {
        x[j] = det(gram.map((row, r) => row.map((value, c) => (c === index ? right[r] : value)))) / d;
      });
      if (freeIds.some((j) => x[j] < -1e-12 || x[j] > upper + 1e-12)) continue;
    }
    if (!best || objective(x) < objective(best) - 1e-15) best = x;
  }
  if (!best) throw new Error('no feasible point');
  return best;
}

describe('least squares with bounds against an exhaustive search', () => {
  it('agrees on 200 random problems of 1 to 3 unknowns and up to 4 equations', () => {
    const random = seededRandom(20261202);
    for (let trial = 0; trial < 200; trial += 1) {
      const n = 1 + Math.floor(random() * 3);
      const m = n + Math.floor(random() * 2);
      const matrix = Array.from({ length: m }, () => Array.from({ length: n }, () => random() * 2 - 0.5));
      const rhs = Array.from({ length: m }, () => random() * 3 - 1);
      const expected = exhaustiveBounded(matrix, rhs, 1);
      const { x } = boundedLeastSquares({
        matrix,
        rhs,
        lower: Array(n).fill(0),
        upper: Array(n).fill(1),
        start: Array.from({ length: n }, () => random()),
      });
      x.forEach((value, j) => expect(value).toBeCloseTo(expected[j], 5));
    }
  });
});

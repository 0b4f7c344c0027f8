/** Isolux lines: the outlines where a light map crosses chosen levels (marching squares by d3-contour). */
import { contours } from 'd3-contour';
import type { GridSpec } from './grid';

export interface IsoluxLine {
  readonly levelLx: number;
  /** Closed rings in plan metres. */
  readonly rings: readonly (readonly { readonly x: number; readonly y: number }[])[];
}

/** Isolux rings of `values` on `grid` at each level (lx). */
export function isoluxLines(grid: GridSpec, values: Float64Array, levelsLx: readonly number[]): IsoluxLine[] {
  const generator = contours()
    .size([grid.columns, grid.rows])
    .thresholds([...levelsLx]);
  // d3-contour puts cell (c, r) between c and c + 1: plan x = minX + X·spacing, likewise y.
  return generator(Array.from(values)).map((multiPolygon) => ({
    levelLx: multiPolygon.value,
    rings: multiPolygon.coordinates.flatMap((polygon) =>
      polygon.map((ring) =>
        ring.map(([x, y]) => ({ x: grid.minX + x * grid.spacingM, y: grid.minY + y * grid.spacingM })),
      ),
    ),
  }));
}

/** Round levels for labels: 1, 2, 5 × 10ⁿ lx between the map's low and high values, at most `count`. */
export function niceLevels(lowLx: number, highLx: number, count = 6): number[] {
  if (!(highLx > 0)) return [];
  const low = Math.max(lowLx, highLx / 1000, 1);
  const steps: number[] = [];
  for (let power = Math.floor(Math.log10(low)); power <= Math.ceil(Math.log10(highLx)); power += 1) {
    for (const mantissa of [1, 2, 5]) {
      const level = mantissa * 10 ** power;
      if (level >= low && level < highLx) steps.push(level);
    }
  }
  if (steps.length <= count) return steps;
  const stride = Math.ceil(steps.length / count);
  return steps.filter((_, index) => (steps.length - 1 - index) % stride === 0);
}

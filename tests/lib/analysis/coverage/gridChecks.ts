/** Checks shared by the light-map tests. */
import { expect } from 'vitest';

interface Grid {
  readonly values: Float64Array;
  readonly overlaps: Uint16Array;
}

/** Every cell the same number (the sign of zero included) and the same beam-angle count. */
export function expectSameBits(a: Grid, b: Grid): void {
  expect(a.values.length).toBe(b.values.length);
  let differing = 0;
  for (let index = 0; index < a.values.length; index += 1) {
    if (!Object.is(a.values[index], b.values[index]) || a.overlaps[index] !== b.overlaps[index])
      differing += 1;
  }
  expect(differing).toBe(0);
}

/**
 * The criterion: within 1e-9 relative of the reference on every cell above 0.1 lx, and within
 * 1e-10 lx where the reference is darker. Returns how many cells were compared relatively.
 */
export function expectNearReference(values: Float64Array, reference: Float64Array): number {
  let compared = 0;
  for (let index = 0; index < values.length; index += 1) {
    if (reference[index] > 0.1) {
      compared += 1;
      expect(Math.abs(values[index] - reference[index]) / reference[index]).toBeLessThanOrEqual(1e-9);
    } else expect(Math.abs(values[index] - reference[index])).toBeLessThanOrEqual(1e-10);
  }
  return compared;
}

import { describe, expect, it } from 'vitest';
import { approximately, clampedAcos, clampedAsin, requireFinite, requirePositive } from '@/lib/numeric';

describe('numeric helpers', () => {
  it('clampedAcos tolerates rounding just past 1 and -1', () => {
    expect(clampedAcos(1 + 1e-15)).toBe(0);
    expect(clampedAcos(-1 - 1e-15)).toBeCloseTo(Math.PI, 15);
    expect(clampedAsin(1 + 1e-15)).toBeCloseTo(Math.PI / 2, 15);
  });

  it('approximately compares by absolute or relative tolerance, and never equates NaN', () => {
    expect(approximately(1, 1 + 1e-10)).toBe(true);
    expect(approximately(1, 1.001)).toBe(false);
    expect(approximately(Number.NaN, Number.NaN)).toBe(false);
    expect(approximately(Infinity, Infinity)).toBe(true);
  });

  it.each([Number.NaN, Infinity, -Infinity])(
    'requireFinite rejects %s with a message naming the value',
    (value) => {
      expect(() => requireFinite(value, 'throw')).toThrow(/throw must be a finite number/);
    },
  );

  it('requirePositive rejects zero and negatives', () => {
    expect(() => requirePositive(0, 'distance')).toThrow(/distance must be greater than zero/);
    expect(() => requirePositive(-2, 'distance')).toThrow(RangeError);
    expect(requirePositive(2, 'distance')).toBe(2);
  });
});

import { describe, expect, it } from 'vitest';
import { seededRandom } from '@/lib/seededRandom';

describe('seededRandom', () => {
  it('repeats for the same seed, differs for another, and stays in [0, 1)', () => {
    const a = seededRandom(42);
    const b = seededRandom(42);
    const c = seededRandom(43);
    const first = Array.from({ length: 1000 }, () => a());
    expect(Array.from({ length: 1000 }, () => b())).toEqual(first);
    expect(Array.from({ length: 1000 }, () => c())).not.toEqual(first);
    expect(first.every((value) => value >= 0 && value < 1)).toBe(true);
    // Roughly uniform: the mean of 1000 draws is within 0.05 of ½.
    expect(Math.abs(first.reduce((sum, value) => sum + value, 0) / 1000 - 0.5)).toBeLessThan(0.05);
  });
});

import { describe, expect, it } from 'vitest';
import { formatRatio, lightingRatio, ratioToStops, stopsToRatio } from '@/lib/units';

describe('stops and ratios', () => {
  // REFERENCE-CHECKS §6 [DER]: stops = log2(ratio).
  it.each([
    [2, 1],
    [3, 1.584962500721156],
    [4, 2],
    [8, 3],
    [1.5, 0.5849625007211562],
  ])('%f:1 is %f stops', (ratio, stops) => {
    expect(ratioToStops(ratio)).toBeCloseTo(stops, 12);
    expect(stopsToRatio(stops)).toBeCloseTo(ratio, 12);
  });

  // REFERENCE-CHECKS §6: photographers' (key + fill) : fill; key 800 lx, fill 400 lx → 3:1 (common practice).
  it('key 800 lx with fill 400 lx is a 3:1 lighting ratio', () => {
    expect(lightingRatio(800, 400)).toBe(3);
    expect(ratioToStops(lightingRatio(800, 400))).toBeCloseTo(1.585, 3);
    expect(lightingRatio(400, 400)).toBe(2);
  });

  it('refuses ratios and fills that are not positive', () => {
    expect(() => ratioToStops(0)).toThrow(RangeError);
    expect(() => ratioToStops(-2)).toThrow(RangeError);
    expect(() => lightingRatio(100, 0)).toThrow(/fill illuminance/);
  });

  it('formats ratios', () => {
    expect(formatRatio(3)).toBe('3:1');
    expect(formatRatio(1.5)).toBe('1.5:1');
    expect(formatRatio(Number.NaN)).toBe('—');
  });
});

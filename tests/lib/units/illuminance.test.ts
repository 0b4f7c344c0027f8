import { describe, expect, it } from 'vitest';
import { LUX_PER_FOOTCANDLE, footcandlesToLux, formatIlluminance, luxToFootcandles } from '@/lib/units';

describe('lux and foot-candles', () => {
  // NIST SP 811 App. B: 1 fc = 1.076 391 E+01 lx; exactly 1/0.3048² = 10.763 910 416 709 72.
  it('one foot-candle is 10.763 910 416 709 72 lx', () => {
    expect(LUX_PER_FOOTCANDLE).toBeCloseTo(10.76391041670972, 12);
    expect(footcandlesToLux(10)).toBeCloseTo(107.639104167097, 9);
  });

  // REFERENCE-CHECKS §1 [DER]: 500 lx = 46.451 52 fc; 1 lx = 0.092 903 04 fc (exact).
  it('500 lx is 46.451 52 fc', () => {
    expect(luxToFootcandles(500)).toBeCloseTo(46.45152, 9);
    expect(luxToFootcandles(1)).toBeCloseTo(0.09290304, 14);
  });

  it('formats for display in either system and never shows NaN', () => {
    expect(formatIlluminance(538.2, 'metric')).toBe('538 lx');
    expect(formatIlluminance(footcandlesToLux(50), 'imperial')).toBe('50.0 fc');
    expect(formatIlluminance(Number.NaN, 'metric')).toBe('—');
  });
});

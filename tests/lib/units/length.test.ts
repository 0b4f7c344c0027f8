import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { feetToMetres, formatFeetInches, formatLength, metresToFeet, parseLength } from '@/lib/units';

describe('metres and feet', () => {
  // NIST SP 811 App. B: 1 international foot = 0.3048 m exactly (1959 agreement).
  it('one foot is 0.3048 m exactly', () => {
    expect(feetToMetres(1)).toBe(0.3048);
    expect(metresToFeet(3.048)).toBeCloseTo(10, 12);
  });

  it('feet → metres → feet round-trips', () => {
    fc.assert(
      fc.property(fc.double({ min: -1e4, max: 1e4, noNaN: true }), (feet) => {
        expect(metresToFeet(feetToMetres(feet))).toBeCloseTo(feet, 9);
      }),
    );
  });
});

describe('parseLength', () => {
  // Expected values: 1 ft = 0.3048 m, 1 in = 0.0254 m (NIST SP 811), worked by hand.
  it.each([
    ['3.81 m', 3.81],
    ['3.81m', 3.81],
    ['381 cm', 3.81],
    ['150 mm', 0.15],
    [`12' 6"`, 12 * 0.3048 + 6 * 0.0254],
    [`12'6"`, 3.81],
    [`12'6`, 3.81],
    ['12 ft 6 in', 3.81],
    ['12 feet', 3.6576],
    [`6"`, 0.1524],
    ['6 in', 0.1524],
    [`12.5'`, 3.81],
    ['-2 m', -2],
    [`-1' 6"`, -0.4572],
    ['3 m 20 cm', 3.2],
  ])('%s is %f m', (text, expectedM) => {
    const result = parseLength(text);
    expect(result.ok).toBe(true);
    if (result.ok) expect(result.valueM).toBeCloseTo(expectedM, 10);
  });

  it('a bare number is read in the display system', () => {
    const metric = parseLength('4');
    const imperial = parseLength('4', 'imperial');
    expect(metric.ok && metric.valueM).toBe(4);
    expect(imperial.ok && imperial.valueM).toBeCloseTo(1.2192, 12);
  });

  it.each(['', '   ', 'abc', '12 6', '3 m x', '--3', `12' -6"`, '1e999 m'])(
    '%j gives a message, not a number',
    (text) => {
      const result = parseLength(text);
      expect(result.ok).toBe(false);
      if (!result.ok) expect(result.message.length).toBeGreaterThan(5);
    },
  );
});

describe('formatting lengths', () => {
  it('3.81 m is 12\' 6"', () => {
    expect(formatFeetInches(3.81)).toBe(`12' 6"`);
  });

  it('rounds to the nearest inch and carries into feet', () => {
    // 11' 11.8" rounds to 12' 0"
    expect(formatFeetInches(feetToMetres(11) + 11.8 * 0.0254)).toBe(`12' 0"`);
    expect(formatFeetInches(-0.4572)).toBe(`-1' 6"`);
  });

  it('format then parse returns the length to within half an inch', () => {
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), (lengthM) => {
        const parsed = parseLength(formatFeetInches(lengthM));
        expect(parsed.ok).toBe(true);
        if (parsed.ok) expect(Math.abs(parsed.valueM - lengthM)).toBeLessThanOrEqual(0.0127 + 1e-12);
      }),
    );
  });

  it('never shows NaN', () => {
    expect(formatLength(Number.NaN, 'metric')).toBe('—');
    expect(formatFeetInches(Infinity)).toBe('—');
    expect(formatLength(2.5, 'metric')).toBe('2.50 m');
  });
});

describe('regressions', () => {
  // fast-check counterexample −0.0127 m: formatted as -0' 1", it read back as +1" because −0 is not < 0.
  it(`-0' 1" is minus one inch`, () => {
    const parsed = parseLength(`-0' 1"`);
    expect(parsed.ok && parsed.valueM).toBeCloseTo(-0.0254, 12);
  });
});

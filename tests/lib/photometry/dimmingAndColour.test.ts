import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  DIMMING_CURVES,
  applyMiredShift,
  combineFilters,
  kelvinToMired,
  levelForLightFraction,
  lightFractionAtLevel,
  miredShiftBetween,
  miredToKelvin,
  tungstenColourTemperatureK,
} from '@/lib/photometry';

describe('dimming curves', () => {
  // REFERENCE-CHECKS §8 [DER]: linear-voltage dimmer on a V^3.4 lamp → 50 % level gives 9.47 % light.
  it('an incandescent lamp on a linear-voltage dimmer gives 9.47 % light at 50 %', () => {
    expect(lightFractionAtLevel(50, 'incandescent')).toBeCloseTo(0.0947, 4);
  });

  // REFERENCE-CHECKS §8 [MEM]: the conventional square-law curve gives 25 % light at 50 %.
  it('the square-law curve gives 25 % light at 50 %', () => {
    expect(lightFractionAtLevel(50, 'square')).toBeCloseTo(0.25, 12);
    expect(lightFractionAtLevel(50, 'linear')).toBeCloseTo(0.5, 12);
  });

  // REFERENCE-CHECKS §8: 81 % voltage gives 48.8 % light (a design text's "81 % voltage, 50 % light").
  it('81 % on the incandescent curve gives 48.8 % light', () => {
    expect(lightFractionAtLevel(81, 'incandescent')).toBeCloseTo(0.488, 3);
  });

  it.each(DIMMING_CURVES)('%s: 0 → 0, 100 → 1, monotone, and level ↔ light round-trips', (curve) => {
    expect(lightFractionAtLevel(0, curve)).toBe(0);
    expect(lightFractionAtLevel(100, curve)).toBe(1);
    fc.assert(
      fc.property(fc.double({ min: 0, max: 99, noNaN: true }), (level) => {
        expect(lightFractionAtLevel(level + 1, curve)).toBeGreaterThan(lightFractionAtLevel(level, curve));
        expect(levelForLightFraction(lightFractionAtLevel(level, curve), curve)).toBeCloseTo(level, 8);
      }),
    );
  });

  it('clamps levels outside 0–100 and refuses NaN', () => {
    expect(lightFractionAtLevel(150, 'linear')).toBe(1);
    expect(lightFractionAtLevel(-5, 'square')).toBe(0);
    expect(() => lightFractionAtLevel(Number.NaN, 'linear')).toThrow(/level must be a finite number/);
  });

  // REFERENCE-CHECKS §8 [DER]: CCT ∝ V^0.42; at 81 % voltage a 3200 K lamp is 2929 K.
  it('a 3200 K lamp dimmed to 48.8 % light runs at about 2929 K', () => {
    const lightAt81PercentVolts = 0.81 ** 3.4;
    expect(tungstenColourTemperatureK(3200, lightAt81PercentVolts)).toBeCloseTo(2929, 0);
  });
});

describe('colour temperature and filters', () => {
  // REFERENCE-CHECKS §7 [DER]: mired = 10⁶/K.
  it.each([
    [2700, 370.37],
    [3200, 312.5],
    [4300, 232.56],
    [5500, 181.82],
    [5600, 178.57],
    [6500, 153.85],
  ])('%i K is %f mired', (kelvin, mired) => {
    expect(kelvinToMired(kelvin)).toBeCloseTo(mired, 2);
    expect(miredToKelvin(kelvinToMired(kelvin))).toBeCloseTo(kelvin, 9);
  });

  // REFERENCE-CHECKS §7 [DER]: ideal conversions.
  it.each([
    [5600, 3200, 133.9],
    [5500, 3200, 130.7],
    [6500, 3200, 158.7],
    [3200, 5500, -130.7],
  ])('%i K → %i K needs %f mired', (from, to, shift) => {
    expect(miredShiftBetween(from, to)).toBeCloseTo(shift, 1);
  });

  // REFERENCE-CHECKS §7 [DER]: 5600 K + 159 mired → 2962 K; 3200 K − 131 mired → 5510 K.
  it('shifting 5600 K by +159 mired gives 2962 K, and 3200 K by −131 gives 5510 K', () => {
    expect(applyMiredShift(5600, 159)).toBeCloseTo(2962, 0);
    expect(applyMiredShift(3200, -131)).toBeCloseTo(5510, 0);
  });

  it('a shift that leaves no real temperature is refused', () => {
    expect(() => applyMiredShift(3200, -400)).toThrow(/no real colour temperature/);
    expect(() => kelvinToMired(0)).toThrow(RangeError);
  });

  it('stacked filters multiply transmission and add mireds', () => {
    const stack = combineFilters([
      { transmission: 0.55, miredShift: 150 },
      { transmission: 0.8, miredShift: -20 },
    ]);
    expect(stack.transmission).toBeCloseTo(0.44, 12);
    expect(stack.miredShift).toBe(130);
    expect(combineFilters([])).toEqual({ transmission: 1, miredShift: 0 });
    expect(() => combineFilters([{ transmission: 1.2, miredShift: 0 }])).toThrow(/between 0 and 1/);
  });
});

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { angleForSpreadDeg, chooseAngle, spreadDiameterM, spreadFactor } from '@/lib/photometry';

describe('spread at a throw', () => {
  // REFERENCE-CHECKS §3 [DER] (± 5e-5): multiplying factors 2·tan(a/2); "beam × throw" is common practice.
  it.each([
    [5, 0.0873],
    [10, 0.175],
    [14, 0.2456],
    [19, 0.3347],
    [26, 0.4617],
    [36, 0.6498],
    [50, 0.9326],
    [70, 1.4004],
    [90, 2.0],
  ])('a %i° angle spreads %f m per metre of throw', (angle, factor) => {
    expect(Math.abs(spreadFactor(angle) - factor)).toBeLessThanOrEqual(5e-5);
  });

  it('spreadDiameterM(10, 26) is 4.617 m', () => {
    expect(spreadDiameterM(10, 26)).toBeCloseTo(4.6174, 4);
  });

  // REFERENCE-CHECKS §3 [DER]: 26° at a 30 ft throw gives 13.852 ft (the ratio is unit-free).
  it('26° at 30 ft covers 13.852 ft', () => {
    expect(spreadDiameterM(30 * 0.3048, 26) / 0.3048).toBeCloseTo(13.852, 3);
  });

  // REFERENCE-CHECKS §11 [DER]: angles to cover 8, 10, 12 ft areas at 8.4853 m: 16.35°, 20.36°, 24.33°.
  it.each([
    [8, 16.35],
    [10, 20.36],
    [12, 24.33],
  ])('a %i ft area at the 45°/45° throw needs %f°', (feet, angle) => {
    expect(angleForSpreadDeg(6 * Math.SQRT2, feet * 0.3048)).toBeCloseTo(angle, 2);
  });

  it('angle → diameter → angle round-trips', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.1, max: 60, noNaN: true }),
        fc.double({ min: 0.5, max: 170, noNaN: true }),
        (throwM, angle) => {
          expect(angleForSpreadDeg(throwM, spreadDiameterM(throwM, angle))).toBeCloseTo(angle, 8);
        },
      ),
    );
  });

  it.each([
    [0, 26],
    [-3, 26],
    [Number.NaN, 26],
    [10, 0],
    [10, 180],
  ])('spreadDiameterM(%s, %s) is refused', (throwM, angle) => {
    expect(() => spreadDiameterM(throwM, angle)).toThrow(RangeError);
  });

  it('a zero or negative pool is refused', () => {
    expect(() => angleForSpreadDeg(10, 0)).toThrow(/pool diameter/);
    expect(() => angleForSpreadDeg(0, 3)).toThrow(/throw/);
  });
});

describe('the lens picker', () => {
  it('picks the nearest fixed angle and says what pool it gives', () => {
    const choice = chooseAngle(10, 3, { angles: [10, 19, 26, 36, 50] });
    expect(choice.neededDeg).toBeCloseTo(17.06, 2); // 2·atan(3/20)
    expect(choice.nearestDeg).toBe(19);
    expect(choice.nearestDiameterM).toBeCloseTo(spreadDiameterM(10, 19), 12);
    expect(choice.exact).toBe(false);
  });

  it('sets a zoom exactly when the needed angle is in range, else the nearest end', () => {
    expect(chooseAngle(10, 3, { zoomRange: [15, 30] })).toMatchObject({ exact: true });
    expect(chooseAngle(10, 3, { zoomRange: [15, 30] }).nearestDeg).toBeCloseTo(17.06, 2);
    expect(chooseAngle(10, 3, { zoomRange: [25, 50] })).toMatchObject({ nearestDeg: 25, exact: false });
  });

  it('says so when nothing is available', () => {
    expect(chooseAngle(10, 3, {})).toMatchObject({ nearestDeg: null, nearestDiameterM: null });
  });
});

import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  type BeamSpread,
  beamIntensityTowardCd,
  profileEdgeAngleRad,
  profileExponent,
  relativeIntensity,
  spreadProfile,
  validateBeamAngles,
} from '@/lib/photometry';
import { vec3 } from '@/lib/geometry';

describe('the beam model from beam and field angles', () => {
  // Definitions (REFERENCE-CHECKS §3 [SEC]): beam angle at 50 % of peak, field angle at 10 %.
  it.each([
    [26, 40],
    [19, 30],
    [10, 60],
    [50, 70],
    [5, 6],
  ])('a %i°/%i° beam is at 50 %% at half the beam angle and 10 %% at half the field angle', (beam, field) => {
    expect(relativeIntensity(0, beam, field)).toBe(1);
    expect(relativeIntensity(beam / 2, beam, field)).toBeCloseTo(0.5, 12);
    expect(relativeIntensity(field / 2, beam, field)).toBeCloseTo(0.1, 12);
  });

  // REFERENCE-CHECKS §4 [DER]: a Gaussian has field/beam = √(ln10/ln2) = 1.822 616, i.e. exponent 2.
  it('a field/beam ratio of 1.822 616 makes the profile Gaussian (exponent 2)', () => {
    expect(profileExponent(13, 13 * 1.822616)).toBeCloseTo(2, 5);
    const sigmaDeg = 11.0412; // beam 26° → σ = 11.0412° (REFERENCE-CHECKS §4)
    const gaussian = Math.exp(-(20 ** 2) / (2 * sigmaDeg ** 2));
    expect(relativeIntensity(20, 26, 2 * 13 * Math.sqrt(Math.LN10 / Math.LN2))).toBeCloseTo(gaussian, 5);
  });

  it('falls monotonically off axis and is symmetric', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 80, noNaN: true }),
        fc.double({ min: 1.01, max: 3, noNaN: true }),
        fc.double({ min: 0, max: 89, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        (beam, ratio, angle, step) => {
          const field = Math.min(beam * ratio, 179);
          fc.pre(field > beam);
          const here = relativeIntensity(angle, beam, field);
          expect(relativeIntensity(angle + step, beam, field)).toBeLessThanOrEqual(here);
          expect(relativeIntensity(-angle, beam, field)).toBe(here);
          expect(here).toBeGreaterThanOrEqual(0);
          expect(here).toBeLessThanOrEqual(1);
        },
      ),
    );
  });

  it('ends where it falls to 0.1 % of peak: a 26°/40° beam stops at 29.7° off axis', () => {
    // Bisection on 0.5^((θ/13)^p) = 0.001 with p = ln(ln10/ln2)/ln(20/13), the model's definition.
    const p = Math.log(Math.LN10 / Math.LN2) / Math.log(20 / 13);
    let low = 13;
    let high = 89;
    for (let step = 0; step < 80; step += 1) {
      const middle = (low + high) / 2;
      if (0.5 ** ((middle / 13) ** p) > 0.001) low = middle;
      else high = middle;
    }
    expect(low).toBeCloseTo(29.664, 3);
    expect(relativeIntensity(low - 0.01, 26, 40)).toBeGreaterThan(0.001);
    expect(relativeIntensity(low + 0.01, 26, 40)).toBe(0);
    expect((profileEdgeAngleRad((13 * Math.PI) / 180, (20 * Math.PI) / 180) * 180) / Math.PI).toBeCloseTo(
      low,
      9,
    );
  });

  it('emits nothing 90° or more off axis (the housing)', () => {
    expect(relativeIntensity(90, 100, 170)).toBe(0);
    expect(relativeIntensity(135, 100, 170)).toBe(0);
  });

  it.each([
    [0, 40, /beam angle must be greater than 0/],
    [-10, 40, /beam angle must be greater than 0/],
    [30, 30, /must be wider than beam angle/],
    [40, 30, /must be wider than beam angle/],
    [30, 180, /field angle must be less than 180/],
    [30, 400, /field angle must be less than 180/],
    [Number.NaN, 40, /beam angle must be a finite number/],
    [30, Infinity, /field angle must be a finite number/],
  ])('beam %s° with field %s° is refused', (beam, field, message) => {
    expect(() => validateBeamAngles(beam, field)).toThrow(message);
    expect(() => relativeIntensity(5, beam, field)).toThrow(RangeError);
  });

  it('refuses off-axis angles beyond 180°', () => {
    expect(() => relativeIntensity(181, 26, 40)).toThrow(/within 180/);
  });
});

describe('oval beams', () => {
  const oval: BeamSpread = {
    kind: 'oval',
    beamAngleXDeg: 28,
    fieldAngleXDeg: 40,
    beamAngleYDeg: 12,
    fieldAngleYDeg: 20,
    rotationDeg: 0,
  };
  const rad = (deg: number) => (deg * Math.PI) / 180;

  it('meets 50 % and 10 % at each axis’ own half-angles', () => {
    expect(spreadProfile(oval, rad(14), 0)).toBeCloseTo(0.5, 12);
    expect(spreadProfile(oval, rad(20), Math.PI)).toBeCloseTo(0.1, 12);
    expect(spreadProfile(oval, rad(6), Math.PI / 2)).toBeCloseTo(0.5, 12);
    expect(spreadProfile(oval, rad(10), -Math.PI / 2)).toBeCloseTo(0.1, 12);
  });

  it('turning the oval by 90° swaps its axes', () => {
    const turned = { ...oval, rotationDeg: 90 };
    expect(spreadProfile(turned, rad(6), 0)).toBeCloseTo(0.5, 12);
    expect(spreadProfile(turned, rad(14), Math.PI / 2)).toBeCloseTo(0.5, 12);
  });

  it('with equal axes is the round beam', () => {
    const round: BeamSpread = { kind: 'round', beamAngleDeg: 20, fieldAngleDeg: 32 };
    const equal: BeamSpread = {
      ...oval,
      beamAngleXDeg: 20,
      beamAngleYDeg: 20,
      fieldAngleXDeg: 32,
      fieldAngleYDeg: 32,
    };
    for (const azimuth of [0, 0.3, 1.2, 2.5]) {
      expect(spreadProfile(equal, rad(12), azimuth)).toBeCloseTo(spreadProfile(round, rad(12), azimuth), 14);
    }
  });
});

describe('intensity toward a point in the world', () => {
  it('a unit aimed straight down sends its peak straight down and half its peak at half the beam angle', () => {
    const spread: BeamSpread = { kind: 'round', beamAngleDeg: 26, fieldAngleDeg: 40 };
    const mount = vec3(0, 0, 6);
    const down = vec3(0, 0, -1);
    expect(beamIntensityTowardCd(mount, down, 20000, spread, vec3(0, 0, 0))).toBeCloseTo(20000, 9);
    const sideways = 6 * Math.tan((13 * Math.PI) / 180);
    expect(beamIntensityTowardCd(mount, down, 20000, spread, vec3(sideways, 0, 0))).toBeCloseTo(10000, 6);
    expect(beamIntensityTowardCd(mount, down, 20000, spread, vec3(0, -sideways, 0))).toBeCloseTo(10000, 6);
  });
});
